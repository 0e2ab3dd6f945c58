import 'server-only';
import path from 'node:path';
import { migrate } from 'drizzle-orm/mysql2/migrator';
import { getDb } from './client';

/** Applies the committed migrations in drizzle/ to the database at DATABASE_URL. */
export async function runMigrations(): Promise<void> {
  await migrate(getDb(), { migrationsFolder: path.join(process.cwd(), 'drizzle') });
}
