import 'server-only';
import { desc, eq } from 'drizzle-orm';
import { getDb } from '../client';
import { devMail } from '../schema';

export async function insertDevMail(row: { messageId: string | null; fromAddress: string; toAddresses: string; subject: string; text: string | null; html: string | null }): Promise<number> {
  const [r] = await getDb().insert(devMail).values(row).$returningId();
  return r.id;
}

export async function listDevMail(limit = 100) {
  return getDb()
    .select({ id: devMail.id, fromAddress: devMail.fromAddress, toAddresses: devMail.toAddresses, subject: devMail.subject, receivedAt: devMail.receivedAt })
    .from(devMail)
    .orderBy(desc(devMail.id))
    .limit(limit);
}

export async function findDevMail(id: number) {
  const [row] = await getDb().select().from(devMail).where(eq(devMail.id, id)).limit(1);
  return row;
}
