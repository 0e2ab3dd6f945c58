// Gives one test file a database of its own on the test MariaDB instance, with every
// committed migration applied, so test files (and developers running them at the same
// time) never see each other's rows.
import { randomBytes } from 'node:crypto';
import mysql from 'mysql2/promise';
import { afterAll, beforeAll } from 'vitest';
import { instance, urlFor } from '../../scripts/lib/mariadb';

export function useTestDatabase(): { url: () => string } {
  const db = instance('test');
  const name = `margin_t_${process.pid}_${randomBytes(3).toString('hex')}`;
  let url = '';
  beforeAll(async () => {
    const conn = await mysql.createConnection({ host: '127.0.0.1', port: db.port, user: db.user, password: db.password });
    await conn.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
    await conn.end();
    url = urlFor(db, name);
    process.env.DATABASE_URL = url;
    const { runMigrations } = await import('../../db/migrate');
    await runMigrations();
  });
  afterAll(async () => {
    const { closeDb } = await import('../../db/client');
    await closeDb();
    const conn = await mysql.createConnection({ host: '127.0.0.1', port: db.port, user: db.user, password: db.password });
    await conn.query(`DROP DATABASE IF EXISTS \`${name}\``);
    await conn.end();
  });
  return { url: () => url };
}
