import { renderMail, type MailParts } from './layout';

const ROLE_WORDS = {
  owner: 'an Owner (manages members and reading links, and can do everything else)',
  author: 'an Author (writes memos, uploads data, adds blocks)',
  reviewer: 'a Reviewer (reads and leaves margin notes)',
  reader: 'a Reader (reads only)',
} as const;

export function invitationMail(input: { labName: string; inviterName: string; role: keyof typeof ROLE_WORDS; url: string; expiresAt: Date }): MailParts {
  return renderMail({
    subject: `${input.inviterName} invited you to ${input.labName} on Margin`,
    heading: `Join ${input.labName}`,
    paragraphs: [
      `${input.inviterName} invited you to the lab "${input.labName}" on Margin as ${ROLE_WORDS[input.role]}.`,
      'Margin is where the lab writes memos around live estimates, each with its standard error and confidence interval.',
      'The link works whether or not you already have an account, but only for this e-mail address.',
    ],
    action: { label: 'Accept the invitation', url: input.url },
    footnote: `The invitation expires on ${input.expiresAt.toUTCString()} and can be used once. If you did not expect it, ignore this message.`,
  });
}
