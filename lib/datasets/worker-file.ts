import 'server-only';
import { execFile } from 'node:child_process';
import { existsSync } from 'node:fs';
import path from 'node:path';
import { promisify } from 'node:util';

const run = promisify(execFile);
let cached: Promise<string> | null = null;

/**
 * Path of the datasets worker bundle (plain JS). Resolution, in order: MARGIN_DATASETS_WORKER;
 * else <cwd>/dist/datasets/worker.mjs, first rebuilt by `node lib/datasets/build-worker.mjs`
 * when the sources are there and changed (a child process, so no bundler ever sees esbuild).
 * The same under vitest, scripts and `next start`. Checked once per process.
 */
export function datasetsWorkerFile(): Promise<string> {
  cached ??= locate().catch((e) => {
    cached = null;
    throw e;
  });
  return cached;
}

async function locate(): Promise<string> {
  const fromEnv = process.env.MARGIN_DATASETS_WORKER;
  if (fromEnv && existsSync(fromEnv)) return fromEnv;
  const root = process.cwd();
  const builder = path.join(root, 'lib', 'datasets', 'build-worker.mjs');
  const bundle = path.join(root, 'dist', 'datasets', 'worker.mjs');
  if (existsSync(builder)) await run(process.execPath, [builder], { cwd: root, timeout: 120_000 });
  if (!existsSync(bundle)) throw new Error(`the datasets worker bundle ${bundle} is missing; run \`node lib/datasets/build-worker.mjs\``);
  return bundle;
}
