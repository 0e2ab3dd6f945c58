/**
 * Command line: `npm run -s compute -- FILE` (FILE a request JSON, `-` for stdin) prints
 * one JSON response on stdout. Bad input prints `{"error":{"code","message","path"}}` on
 * stdout and exits 1 (2 for a usage error, 3 for an internal error). Options:
 * `--threads N` (worker threads besides this one, which draws too; 0 = this thread only;
 * default one per core but one), `--pretty`, `--progress` (progress lines on stderr).
 * Bundled to dist/engine/cli.cjs and started by scripts/compute.cjs.
 */
import { readFileSync } from 'node:fs';
import { EngineError } from '@/lib/resampling/errors';
import { takeEarlyRequest } from './early-worker.cjs';
import { defaultWorkers, looksLarge, prewarmCompute } from './shared-pool';
import { trace } from './trace';

function usage(message: string): never {
  process.stdout.write(`${JSON.stringify({ error: { code: 'bad_request:usage', message, path: '' } })}\n`);
  process.stderr.write('usage: npm run -s compute -- FILE|- [--threads N] [--pretty] [--progress]\n');
  process.exit(2);
}

function finish(text: string, code: number): void {
  process.stdout.write(`${text}\n`, () => process.exit(code));
}

export async function main(argv: string[]): Promise<void> {
  let file: string | null = null;
  let threads: number | undefined;
  let pretty = false;
  let progress = false;
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    if (a === '--pretty') pretty = true;
    else if (a === '--progress') progress = true;
    else if (a === '--threads') {
      threads = Number(argv[++i]);
      if (!Number.isInteger(threads) || threads < 0) usage('--threads needs a whole number ≥ 0');
    } else if (file === null) file = a;
    else usage(`unexpected argument ${a}`);
  }
  if (file === null) usage('give a request file, or - to read the request from standard input');

  trace('cli:start');
  let input: unknown;
  let large: boolean | undefined;
  // The launcher may have parsed the file already (early-worker.cjs).
  const early = file === '-' ? null : takeEarlyRequest(file);
  if (early) {
    input = early.input;
    large = early.large;
    trace('cli:request-from-launcher');
  } else {
    let text: string;
    try {
      text = readFileSync(file === '-' ? 0 : file, 'utf8');
    } catch (e) {
      return finish(JSON.stringify({ error: { code: 'bad_request:file', message: `cannot read ${file}: ${(e as Error).message}`, path: '' } }), 2);
    }
    try {
      input = JSON.parse(text);
    } catch (e) {
      return finish(JSON.stringify({ error: { code: 'bad_request:json', message: `the request is not valid JSON: ${(e as Error).message}`, path: '' } }), 1);
    }
  }
  // A large request goes to worker threads: start them now, so that they start up while
  // this thread loads the engine (a separate chunk of the bundle, imported only now) and
  // validates and prepares the request.
  if (threads !== 0 && (large ?? looksLarge(input))) prewarmCompute(threads ?? defaultWorkers(true));
  try {
    trace('cli:workers-started');
    const { compute } = await import('./index');
    trace('cli:engine-loaded');
    const response = await compute(input, {
      threads,
      callerDraws: true,
      releaseWorkers: true,
      onProgress: progress ? (done, total) => process.stderr.write(`progress ${done}/${total}\n`) : undefined,
    });
    finish(pretty ? JSON.stringify(response, null, 2) : JSON.stringify(response), 0);
  } catch (e) {
    if (e instanceof EngineError) return finish(JSON.stringify(e.toJSON()), 1);
    process.stderr.write(`${(e as Error).stack ?? String(e)}\n`);
    finish(JSON.stringify({ error: { code: 'internal:engine', message: 'the engine failed unexpectedly', path: '' } }), 3);
  }
}

// Not a top-level await: the bundle is CommonJS (build-engine.mjs), and main reports its own errors.
void main(process.argv.slice(2));
