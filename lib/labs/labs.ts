import 'server-only';
import { getDb } from '@/db/client';
import { createLab, findLab, renameLab } from '@/db/queries/labs';
import { recordAudit } from '../audit';

/** Creates a lab with the user as its first Owner. */
export async function createLabFor(userId: number, name: string): Promise<{ id: number; name: string }> {
  const id = await getDb().transaction(async (tx) => {
    const labId = await createLab(name, userId, tx);
    await recordAudit({ labId, actorId: userId, action: 'lab.created', subject: `lab:${labId}`, detail: { name } }, tx);
    return labId;
  });
  return { id, name };
}

export async function renameLabAs(actorId: number, labId: number, name: string): Promise<{ id: number; name: string }> {
  const before = await findLab(labId);
  await getDb().transaction(async (tx) => {
    await renameLab(labId, name, tx);
    await recordAudit({ labId, actorId, action: 'lab.renamed', subject: `lab:${labId}`, detail: { from: before?.name ?? null, to: name } }, tx);
  });
  return { id: labId, name };
}
