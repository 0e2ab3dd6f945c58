import 'server-only';
import { addMember, createLab } from '@/db/queries/labs';
import { findUserByEmail, insertUser } from '@/db/queries/users';
import { hashPassword } from '@/lib/auth/password';
import { seedDatasets } from '@/lib/datasets/seed';
import { seedMemos } from '@/lib/memos/seed';
import { DEMO_LAB, DEMO_PASSWORD, DEMO_PEOPLE } from './people';

export interface SeedResult {
  created: boolean;
  labId?: number;
  users: { email: string; role: string }[];
}

/**
 * Seeds the demo lab once: its members (one per role) and, through the hooks that later
 * features register in `seedSteps`, its datasets and memos. Running it again changes nothing.
 */
export async function seedDemo(): Promise<SeedResult> {
  const users = DEMO_PEOPLE.map((p) => ({ email: p.email, role: p.role }));
  if (await findUserByEmail(DEMO_PEOPLE[0].email)) return { created: false, users };
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const ids: number[] = [];
  for (const p of DEMO_PEOPLE) ids.push(await insertUser({ email: p.email, name: p.name, passwordHash, emailVerified: true }));
  const labId = await createLab(DEMO_LAB, ids[0]);
  for (let k = 1; k < DEMO_PEOPLE.length; k++) await addMember(labId, ids[k], DEMO_PEOPLE[k].role);
  for (const step of seedSteps) await step({ labId, userIds: ids });
  return { created: true, labId, users };
}

export type SeedStep = (ctx: { labId: number; userIds: number[] }) => Promise<void>;

/** Later features (datasets, memos) append their demo content here. */
export const seedSteps: SeedStep[] = [seedDatasets, seedMemos];
