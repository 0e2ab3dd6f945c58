// Seeds the demo lab into the database at DATABASE_URL (idempotent).
import { closeDb } from '../db/client';
import { DEMO_PASSWORD } from '../lib/demo/people';
import { seedDemo } from '../lib/demo/seed';

try {
  const r = await seedDemo();
  console.log(r.created ? 'demo lab seeded' : 'demo lab already present');
  console.log(`demo sign-in (password "${DEMO_PASSWORD}" for each):`);
  for (const u of r.users) console.log(`  ${u.role.padEnd(9)} ${u.email}`);
} catch (e) {
  console.error(`seed: ${(e as Error).message}`);
  process.exitCode = 1;
} finally {
  await closeDb();
}
