// Serves the built app on 127.0.0.1:3000 with its companion services, until Ctrl-C.
// Used by `npm run up` after the database is started, migrated and seeded.
import { spawn, type ChildProcess } from 'node:child_process';
import { appEnv } from './lib/env';
import { DEMO_PASSWORD, DEMO_PEOPLE } from '../lib/demo/people';

const port = Number(process.env.PORT ?? 3000);
const env = appEnv('dev', { port });
const children: ChildProcess[] = [];

function run(name: string, args: string[]) {
  const child = spawn(process.execPath, args, { env, stdio: 'inherit' });
  child.on('exit', (code, signal) => {
    if (!stopping) {
      console.error(`${name} exited (${signal ?? code}); stopping`);
      stop(1);
    }
  });
  children.push(child);
  return child;
}

let stopping = false;
function stop(code = 0) {
  if (stopping) return;
  stopping = true;
  for (const c of children) c.kill('SIGTERM');
  setTimeout(() => process.exit(code), 500);
}
process.on('SIGINT', () => stop(0));
process.on('SIGTERM', () => stop(0));

// Companion services (mail catcher, collaboration server) are listed in scripts/services.ts.
const { services } = await import('./services');
for (const s of services) run(s.name, s.args);
run('web', ['node_modules/next/dist/bin/next', 'start', '-H', '127.0.0.1', '-p', String(port)]);

console.log(`\nMargin is running at http://127.0.0.1:${port}`);
console.log(`Demo lab sign-in (password "${DEMO_PASSWORD}"):`);
for (const p of DEMO_PEOPLE) console.log(`  ${p.role.padEnd(9)} ${p.email}`);
console.log('Press Ctrl-C to stop.\n');
