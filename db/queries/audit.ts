import 'server-only';
import { and, desc, eq, isNull, lt } from 'drizzle-orm';
import { getDb } from '../client';
import { auditEvents, users } from '../schema';

export interface AuditListOptions {
  limit: number;
  /** Only events with an id below this (for paging back). */
  beforeId?: number;
}

const columns = {
  id: auditEvents.id,
  labId: auditEvents.labId,
  actorId: auditEvents.actorId,
  actorName: users.name,
  actorEmail: users.email,
  action: auditEvents.action,
  subject: auditEvents.subject,
  detail: auditEvents.detail,
  createdAt: auditEvents.createdAt,
};

export async function listLabAudit(labId: number, opts: AuditListOptions) {
  return getDb()
    .select(columns)
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.actorId))
    .where(and(eq(auditEvents.labId, labId), opts.beforeId ? lt(auditEvents.id, opts.beforeId) : undefined))
    .orderBy(desc(auditEvents.id))
    .limit(opts.limit);
}

/** A person's own account events (sign-ins, password changes), newest first. */
export async function listAccountAudit(userId: number, opts: AuditListOptions) {
  return getDb()
    .select(columns)
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.actorId))
    .where(and(eq(auditEvents.actorId, userId), isNull(auditEvents.labId), opts.beforeId ? lt(auditEvents.id, opts.beforeId) : undefined))
    .orderBy(desc(auditEvents.id))
    .limit(opts.limit);
}

export type AuditListItem = Awaited<ReturnType<typeof listLabAudit>>[number];
