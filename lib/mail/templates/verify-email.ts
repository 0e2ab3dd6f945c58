import { renderMail, type MailParts } from './layout';

export function verifyEmailMail(input: { name: string; url: string; expiresAt: Date }): MailParts {
  return renderMail({
    subject: 'Confirm your e-mail address for Margin',
    heading: 'Confirm your address',
    paragraphs: [`Hello ${input.name},`, 'Confirm that this address is yours to finish setting up your Margin account. Until then you cannot invite others to a lab.'],
    action: { label: 'Confirm my address', url: input.url },
    footnote: `The link expires on ${input.expiresAt.toUTCString()} and works once. If you did not create an account, ignore this message.`,
  });
}
