import 'server-only';
import { execFile } from 'node:child_process';
import { existsSync } from 'node:fs';
import path from 'node:path';
import { promisify } from 'node:util';

const run = promisify(execFile);
let cached: Promise<string> | null = null;

/**
 * Path of the engine's worker bundle (plain JS, as worker threads need). Resolution, in
 * order: MARGIN_ENGINE_WORKER (the CLI sets it after building); else
 * <cwd>/dist/engine/worker.cjs, first rebuilt by `node lib/compute/build-engine.mjs` when
 * the sources are there and changed (run as a child process, so no bundler ever sees
 * esbuild). Works the same under vitest, the CLI and `next start`. Cached per process.
 */
export function workerFile(): Promise<string> {
  cached ??= locate().catch((e) => {
    cached = null;
    throw e;
  });
  return cached;
}

async function locate(): Promise<string> {
  const fromEnv = process.env.MARGIN_ENGINE_WORKER;
  if (fromEnv && existsSync(fromEnv)) return fromEnv;
  const root = process.cwd();
  const builder = path.join(root, 'lib', 'compute', 'build-engine.mjs');
  const bundle = path.join(root, 'dist', 'engine', 'worker.cjs');
  if (existsSync(builder)) await run(process.execPath, [builder], { cwd: root, timeout: 120_000 });
  if (!existsSync(bundle)) throw new Error(`the engine worker bundle ${bundle} is missing; run \`npm run build:engine\``);
  return bundle;
}
