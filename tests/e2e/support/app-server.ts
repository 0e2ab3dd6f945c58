// Starts the built app (NEXT_DIST_DIR=.next-test) for the browser tests, on a free
// loopback port, against a fresh, migrated and seeded database on the test instance.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, openSync } from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import mysql from 'mysql2/promise';
import type { TestProject } from 'vitest/node';
import { appEnv } from '../../../scripts/lib/env';
import { instance } from '../../../scripts/lib/mariadb';

declare module 'vitest' {
  export interface ProvidedContext {
    baseURL: string;
    databaseUrl: string;
  }
}

export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = net.createServer();
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as net.AddressInfo;
      s.close(() => resolve(port));
    });
    s.on('error', reject);
  });
}

export default async function setup(project: TestProject) {
  const distDir = process.env.NEXT_DIST_DIR ?? '.next-test';
  if (!existsSync(path.join(distDir, 'BUILD_ID'))) {
    throw new Error(`no production build in ${distDir}: run "NEXT_DIST_DIR=${distDir} npx next build" (npm test does this)`);
  }
  const db = instance('test');
  const database = `margin_e2e_${randomBytes(3).toString('hex')}`;
  const root = await mysql.createConnection({ host: '127.0.0.1', port: db.port, user: db.user, password: db.password });
  await root.query(`CREATE DATABASE \`${database}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  await root.end();

  const port = await freePort();
  const smtpPort = await freePort();
  const env: NodeJS.ProcessEnv = { ...appEnv("test", { port, database, smtpPort }), NEXT_DIST_DIR: distDir, NEXTAUTH_SECRET: randomBytes(16).toString("hex") };
  for (const script of ['scripts/migrate.ts', 'scripts/seed.ts']) {
    const r = spawnSync(process.execPath, ['--conditions=react-server', '--import', 'tsx', script], { env, encoding: 'utf8' });
    if (r.status !== 0) throw new Error(`${script} failed:\n${r.stdout}\n${r.stderr}`);
  }

  mkdirSync('test-results', { recursive: true });
  const log = openSync('test-results/app-server.log', 'w');
  const children: ChildProcess[] = [];
  const { services } = await import('../../../scripts/services');
  for (const s of services) children.push(spawn(process.execPath, s.args, { env, stdio: ['ignore', log, log] }));
  children.push(spawn(process.execPath, ['node_modules/next/dist/bin/next', 'start', '-H', '127.0.0.1', '-p', String(port)], { env, stdio: ['ignore', log, log] }));

  const baseURL = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 60_000;
  for (;;) {
    try {
      const res = await fetch(`${baseURL}/api/health`);
      if (res.ok) break;
    } catch {
      /* not up yet */
    }
    if (Date.now() > deadline) throw new Error('the app did not answer /api/health within 60 s; see test-results/app-server.log');
    await new Promise((r) => setTimeout(r, 250));
  }
  project.provide('baseURL', baseURL);
  project.provide('databaseUrl', env.DATABASE_URL!);
  process.env.MARGIN_E2E_SMTP_PORT = String(smtpPort);

  return async () => {
    for (const c of children) c.kill('SIGTERM');
    const conn = await mysql.createConnection({ host: '127.0.0.1', port: db.port, user: db.user, password: db.password });
    await conn.query(`DROP DATABASE IF EXISTS \`${database}\``);
    await conn.end();
  };
}
