import 'server-only';
import { getDb } from '@/db/client';
import type { Executor } from '@/db/queries/executor';
import { auditEvents } from '@/db/schema';

/**
 * One audit event. `action` is a dotted verb such as `member.role-changed` or
 * `dataset.version-added`; `subject` names the thing acted on (`user:12`, `memo:7`);
 * `detail` holds small JSON facts (old and new role, a file name). Never put secrets,
 * tokens or passwords in an event.
 */
export interface AuditEvent {
  labId: number | null;
  actorId: number | null;
  action: string;
  subject: string;
  detail?: Record<string, unknown>;
}

/**
 * Appends an event to the audit trail. Pass the open transaction as `db` when the event
 * belongs to a change, so both commit or neither does.
 */
export async function recordAudit(event: AuditEvent, db: Executor = getDb()): Promise<void> {
  await db.insert(auditEvents).values({
    labId: event.labId,
    actorId: event.actorId,
    action: event.action.slice(0, 64),
    subject: event.subject.slice(0, 200),
    detail: event.detail ?? null,
  });
}
