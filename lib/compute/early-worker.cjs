'use strict';
// Starting the engine's worker thread as early as possible on the command line, and reading the
// request only once. A worker
// thread takes ~50–80 ms to start here (Node's own start-up in the new thread, then the worker
// bundle), and on the benchmark request the main thread is drawing replicates ~55 ms after the
// engine bundle starts; a worker started by the bundle joined late and drew only a few chunks.
// So the launcher (scripts/compute.cjs) starts it first thing, before it checks that the
// bundles are fresh and loads the engine, when the request file looks large; the pool
// (pool.ts) adopts it as its first worker. The request it parsed to decide is handed to the
// command line (cli.ts), which would otherwise read and parse it again (for a large file,
// parsing is most of a second). Plain JavaScript because the launcher runs it
// before anything is built, and CommonJS because the launcher is (scripts/compute.cjs);
// shared-pool.ts takes INLINE_DRAWS and looksLarge from here too.
const { readFileSync } = require('node:fs');
const { availableParallelism } = require('node:os');
const { Worker } = require('node:worker_threads');

/** Below this many index draws a job runs on the calling thread (starting workers would cost more). */
const INLINE_DRAWS = 2_000_000;

/**
 * A cheap guess, before validation, whether a request will go to worker threads: B times
 * the longest data column against INLINE_DRAWS. Only decides whether to start workers
 * early; compute() decides from the prepared request.
 */
function looksLarge(input) {
  if (!input || typeof input !== 'object') return false;
  const { B, data } = input;
  if (typeof B !== 'number' || !data || typeof data !== 'object') return false;
  let n = 0;
  for (const column of Object.values(data)) if (Array.isArray(column)) n = Math.max(n, column.length);
  return n * B >= INLINE_DRAWS;
}

// The launcher and the engine bundle share no module instance: the worker and the request wait here.
const KEY = Symbol.for('margin.engine.earlyWorker');
const REQUEST_KEY = Symbol.for('margin.engine.earlyRequest');

/**
 * The launcher: reads and parses the command line's request file (not standard input) and
 * keeps it for the command line (takeEarlyRequest); when it looks large and the command line
 * is not run with `--threads 0`, starts a worker on `workerFile`. Anything unusual — an
 * unreadable file, broken JSON — keeps and starts nothing: the command line then reads the
 * request itself and reports what is wrong, as before.
 */
function startEarly(argv, workerFile) {
  let file = null;
  let noWorkers = false;
  for (let i = 0; i < argv.length; i++) {
    if (argv[i] === '--threads') noWorkers = argv[++i] === '0';
    else if (!argv[i].startsWith('--') && file === null) file = argv[i];
  }
  if (file === null || file === '-') return;
  let input;
  try {
    input = JSON.parse(readFileSync(file, 'utf8'));
  } catch {
    return;
  }
  globalThis[REQUEST_KEY] = { file, input };
  if (noWorkers || !looksLarge(input) || availableParallelism() < 2) return;
  const worker = new Worker(workerFile);
  worker.unref();
  let ready = false;
  worker.on('message', (m) => {
    if (m && m.type === 'ready') ready = true;
  });
  // Until the pool adopts it (it then listens too); unadopted, it only ends with the process.
  worker.on('error', () => {});
  globalThis[KEY] = { file: workerFile, worker, isReady: () => ready };
  // A phase mark as lib/compute/trace.ts writes them (MARGIN_TRACE=1).
  if (process.env.MARGIN_TRACE === '1') process.stderr.write(`launcher:early-worker ${(performance.timeOrigin + performance.now()).toFixed(1)}\n`);
}

/** The launcher: the worker bundle is not the one the early worker runs (it was rebuilt). */
function dropEarlyWorker() {
  const early = globalThis[KEY];
  globalThis[KEY] = undefined;
  if (early) void early.worker.terminate();
}

/** The command line: the request the launcher parsed from `file`, as { input } (once), else null. */
function takeEarlyRequest(file) {
  const early = globalThis[REQUEST_KEY];
  globalThis[REQUEST_KEY] = undefined;
  return early && early.file === file ? { input: early.input } : null;
}

/** The pool: the early worker when it runs this worker bundle (once), else null. */
function takeEarlyWorker(file) {
  const early = globalThis[KEY];
  if (!early || early.file !== file) return null;
  globalThis[KEY] = undefined;
  return early;
}

module.exports = { INLINE_DRAWS, looksLarge, startEarly, dropEarlyWorker, takeEarlyRequest, takeEarlyWorker };
