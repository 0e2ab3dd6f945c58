import { ROLE_LABEL } from '@/lib/labs/schema';

type Detail = Record<string, unknown> | null;
const role = (r: unknown) => (typeof r === 'string' && r in ROLE_LABEL ? ROLE_LABEL[r as keyof typeof ROLE_LABEL] : String(r ?? ''));

/**
 * Plain-language lines for the audit events this area records. Events from other areas
 * (datasets, memos) fall back to their action name and detail, so a new kind of event shows
 * up at once, if less prettily.
 */
export function describeEvent(action: string, subjectName: string | null, detail: Detail): string {
  const d = detail ?? {};
  switch (action) {
    case 'lab.created':
      return `created the lab “${String(d.name ?? '')}”`;
    case 'lab.renamed':
      return `renamed the lab from “${String(d.from ?? '')}” to “${String(d.to ?? '')}”`;
    case 'member.role-changed':
      return `changed the role of ${subjectName ?? 'a member'} from ${role(d.from)} to ${role(d.to)}`;
    case 'member.removed':
      return `removed ${subjectName ?? 'a member'} (${role(d.role)})`;
    case 'member.left':
      return `left the lab (was ${role(d.role)})`;
    case 'invitation.sent':
      return `invited ${String(d.email ?? '')} as ${role(d.role)}`;
    case 'invitation.revoked':
      return `revoked the invitation for ${String(d.email ?? '')}`;
    case 'invitation.accepted':
      return `accepted the invitation as ${role(d.role)}`;
    default:
      return `${action}${detail ? ` ${JSON.stringify(detail)}` : ''}`;
  }
}
