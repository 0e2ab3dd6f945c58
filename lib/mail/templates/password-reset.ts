import { renderMail, type MailParts } from './layout';

export function passwordResetMail(input: { name: string; url: string; expiresAt: Date }): MailParts {
  return renderMail({
    subject: 'Reset your Margin password',
    heading: 'Choose a new password',
    paragraphs: [`Hello ${input.name},`, 'Someone (we hope you) asked to reset the password of your Margin account. Follow the link to choose a new one; every other session will be signed out.'],
    action: { label: 'Choose a new password', url: input.url },
    footnote: `The link expires on ${input.expiresAt.toUTCString()} and works once. If you did not ask for it, ignore this message: your password stays as it is.`,
  });
}
