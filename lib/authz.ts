import 'server-only';
import { membershipOf } from '@/db/queries/labs';
import type { Role } from '@/db/schema';
import { AppError } from './errors';

/**
 * What each role may do in a Lab (PRODUCT.md): Owner — members, links, everything;
 * Author — write memos, data, blocks; Reviewer — read and leave margin notes;
 * Reader — read only. This table is the single source of truth: route handlers and
 * server actions ask `authorize`, the client only hides what this already forbids.
 */
export const ACTIONS = [
  'lab:read',
  'lab:rename',
  'lab:manage-members',
  'lab:read-audit',
  'memo:read',
  'memo:write',
  'memo:comment',
  'memo:sign',
  'memo:witness',
  'dataset:read',
  'dataset:write',
  'run:compute',
  'link:manage',
] as const;
export type Action = (typeof ACTIONS)[number];

const READ: Action[] = ['lab:read', 'memo:read', 'dataset:read'];
const REVIEW: Action[] = [...READ, 'memo:comment', 'memo:witness'];
const AUTHOR: Action[] = [...REVIEW, 'memo:write', 'memo:sign', 'dataset:write', 'run:compute'];
const OWNER: Action[] = [...AUTHOR, 'lab:rename', 'lab:manage-members', 'lab:read-audit', 'link:manage'];

export const ALLOWED: Record<Role, ReadonlySet<Action>> = {
  reader: new Set(READ),
  reviewer: new Set(REVIEW),
  author: new Set(AUTHOR),
  owner: new Set(OWNER),
};

export function can(role: Role | null | undefined, action: Action): boolean {
  return !!role && ALLOWED[role].has(action);
}

/**
 * Throws unless the user is a member of the lab whose role allows the action.
 * Non-members get not_found rather than forbidden, so a lab's existence does not leak.
 */
export async function authorize(userId: number, labId: number, action: Action) {
  const m = await membershipOf(userId, labId);
  if (!m) throw new AppError('not_found:lab', 'No such lab, or you are not a member of it.');
  if (!can(m.role, action)) throw new AppError(`forbidden:${action.split(':')[0]}`, `Your role in this lab (${m.role}) does not allow this.`);
  return m;
}
