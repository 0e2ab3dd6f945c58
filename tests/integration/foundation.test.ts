// Integration: the real MariaDB test instance through Drizzle + mysql2.
import { describe, expect, it } from 'vitest';
import { useTestDatabase } from '../support/database';

useTestDatabase();

describe('database foundation', () => {
  it('applies the committed migrations: users, labs and memberships exist', async () => {
    const { getPool } = await import('@/db/client');
    const [rows] = await getPool().query('SHOW TABLES');
    const names = (rows as Record<string, string>[]).map((r) => Object.values(r)[0]);
    expect(names).toEqual(expect.arrayContaining(['users', 'labs', 'memberships']));
  });

  it('creates a lab whose creator is its Owner, and lists it for that user only', async () => {
    const { insertUser } = await import('@/db/queries/users');
    const { createLab, labsForUser, membershipOf } = await import('@/db/queries/labs');
    const a = await insertUser({ email: 'A.Person@Example.org', name: 'A', passwordHash: 'x' });
    const b = await insertUser({ email: 'b@example.org', name: 'B', passwordHash: 'x' });
    const labId = await createLab('Estuary team', a);
    expect(await labsForUser(a)).toEqual([{ id: labId, name: 'Estuary team', role: 'owner' }]);
    expect(await labsForUser(b)).toEqual([]);
    expect(await membershipOf(b, labId)).toBeUndefined();
  });

  it('stores e-mail addresses lower-cased and refuses a second account for the same address', async () => {
    const { insertUser, findUserByEmail } = await import('@/db/queries/users');
    await insertUser({ email: 'Case@Example.org', name: 'C', passwordHash: 'x' });
    expect((await findUserByEmail('case@example.ORG'))?.name).toBe('C');
    await expect(insertUser({ email: 'case@example.org', name: 'D', passwordHash: 'x' })).rejects.toThrow();
  });

  it('refuses a second membership row for the same user and lab (one role each)', async () => {
    const { insertUser } = await import('@/db/queries/users');
    const { createLab, addMember } = await import('@/db/queries/labs');
    const u = await insertUser({ email: 'dup@example.org', name: 'Dup', passwordHash: 'x' });
    const labId = await createLab('Dup lab', u);
    await expect(addMember(labId, u, 'reader')).rejects.toThrow();
  });

  it('reports the database as up', async () => {
    const { checkHealth } = await import('@/lib/health');
    const h = await checkHealth();
    expect(h.status).toBe('ok');
    expect(h.database.status).toBe('up');
  });

  it('seeds the demo lab once, with one member per role', async () => {
    const { seedDemo } = await import('@/lib/demo/seed');
    const { membersOf } = await import('@/db/queries/labs');
    const first = await seedDemo();
    expect(first.created).toBe(true);
    const again = await seedDemo();
    expect(again.created).toBe(false);
    const roles = (await membersOf(first.labId!)).map((m) => m.role).sort();
    expect(roles).toEqual(['author', 'owner', 'reader', 'reviewer']);
  });
});
