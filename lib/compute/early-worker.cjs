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
 * The command line (which draws on its own thread too) uses a worker thread from this many
 * index draws up. Its worker starts cold (~50–70 ms of Node's start-up in the new thread, on
 * a core the main thread shares here), so it pays only for work that takes the main thread
 * longer than that: on the benchmark's median (n = 10⁴, 2 vCPUs), medians of 21 interleaved
 * runs with and without the worker: B = 3,000 (3·10⁷ draws) even, 6,000 −47 ms, 10,000
 * −56 ms; the cluster median and mean of 500 clusters, B = 10⁴ (2·10⁷ by the schemes' own
 * work estimate), +30 and +50 ms with it.
 */
const COMMAND_LINE_WORKER_DRAWS = 30_000_000;

/**
 * A cheap guess, before validation, of a request's work in index draws, as compute() counts
 * it from the prepared request (drawsOf in index.ts): B replicates, each costing the longest
 * data column's n draws or what the scheme states instead (workPerReplicate: 4 per cluster for
 * the mean, median and difference of means under first-stage cluster resampling, 4 per block
 * for the mean and difference of means under block schemes with a given block length), times
 * 1 + the inner work of a studentized interval (innerB, or n for the jackknife).
 * compute.test.ts checks that the two agree on such requests.
 */
function guessDraws(input) {
  if (!input || typeof input !== 'object') return 0;
  const { B, data, scheme, statistic, intervals } = input;
  if (typeof B !== 'number' || !data || typeof data !== 'object') return 0;
  let n = 0;
  for (const column of Object.values(data)) if (Array.isArray(column)) n = Math.max(n, column.length);
  const stat = statistic && typeof statistic === 'object' ? statistic.name : undefined;
  let perReplicate = n;
  if (scheme && typeof scheme === 'object') {
    if (scheme.name === 'cluster' && scheme.secondStage !== true && (stat === 'mean' || stat === 'median' || stat === 'mean-difference') && Array.isArray(data[scheme.by])) {
      perReplicate = 4 * new Set(data[scheme.by]).size;
    }
    const l = scheme.name === 'moving-block' ? scheme.blockLength : scheme.name === 'stationary' ? scheme.meanBlockLength : undefined;
    if (typeof l === 'number' && l > 0 && (stat === 'mean' || stat === 'mean-difference')) perReplicate = 4 * Math.ceil(n / l);
  }
  let inner = 0;
  if (intervals && typeof intervals === 'object' && Array.isArray(intervals.methods) && intervals.methods.includes('studentized')) {
    const st = intervals.studentized && typeof intervals.studentized === 'object' ? intervals.studentized : {};
    inner = st.se === 'bootstrap' ? (typeof st.innerB === 'number' ? st.innerB : 50) : n;
  }
  return perReplicate * B * (1 + inner);
}

/**
 * Whether the command line should start a worker thread for this request (guessDraws against
 * COMMAND_LINE_WORKER_DRAWS). Only decides whether to start one early; compute() decides from
 * the prepared request.
 */
function looksLarge(input) {
  return guessDraws(input) >= COMMAND_LINE_WORKER_DRAWS;
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
  const large = looksLarge(input);
  globalThis[REQUEST_KEY] = { file, input, large };
  if (noWorkers || !large || availableParallelism() < 2) return;
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

/**
 * The command line: the request the launcher parsed from `file`, and whether it looked large
 * (looksLarge, so the guess is not made twice), as { input, large } (once), else null.
 */
function takeEarlyRequest(file) {
  const early = globalThis[REQUEST_KEY];
  globalThis[REQUEST_KEY] = undefined;
  return early && early.file === file ? { input: early.input, large: early.large } : null;
}

/** The pool: the early worker when it runs this worker bundle (once), else null. */
function takeEarlyWorker(file) {
  const early = globalThis[KEY];
  if (!early || early.file !== file) return null;
  globalThis[KEY] = undefined;
  return early;
}

module.exports = { INLINE_DRAWS, COMMAND_LINE_WORKER_DRAWS, guessDraws, looksLarge, startEarly, dropEarlyWorker, takeEarlyRequest, takeEarlyWorker };
