// The environment the app runs with under `npm run up` (dev instance) or the tests.
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { instance, urlFor } from './mariadb';

/** A per-install secret for signing sessions, kept in .data (git-ignored). */
function localSecret(): string {
  const file = path.join(process.cwd(), '.data', 'auth-secret');
  if (!existsSync(file)) {
    mkdirSync(path.dirname(file), { recursive: true });
    writeFileSync(file, randomBytes(32).toString('hex'), { mode: 0o600 });
  }
  return readFileSync(file, 'utf8').trim();
}

export function appEnv(kind: 'dev' | 'test', opts: { port: number; database?: string; smtpPort?: number }): NodeJS.ProcessEnv {
  const db = instance(kind);
  return {
    ...process.env,
    NODE_ENV: 'production',
    DATABASE_URL: urlFor(db, opts.database),
    NEXTAUTH_URL: `http://127.0.0.1:${opts.port}`,
    NEXTAUTH_SECRET: process.env.NEXTAUTH_SECRET ?? localSecret(),
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(opts.smtpPort ?? (kind === 'dev' ? 2525 : 2526)),
    MARGIN_DEV_MAILBOX: '1',
    MARGIN_ENV: kind,
  };
}
