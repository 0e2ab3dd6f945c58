// Runs drizzle-orm's migrator directly (drizzle-kit migrate hides SQL errors).
import { closeDb, databaseUrl } from '../db/client';
import { runMigrations } from '../db/migrate';

try {
  await runMigrations();
  console.log(`migrations applied to ${databaseUrl().replace(/\/\/[^@]*@/, '//')}`);
} catch (e) {
  console.error(`migrate: ${(e as Error).message}`);
  process.exitCode = 1;
} finally {
  await closeDb();
}
