#!/usr/bin/env node
// `npm run -s compute -- FILE`: runs the engine's command line from its prebuilt bundle
// (dist/engine/cli.cjs) with V8's code cache of it (lib/compute/code-cache.mjs), rebuilding
// both first when lib/resampling or lib/compute changed.
// Plain JS on purpose: starting TypeScript through tsx would cost ~0.3 s per call. The npm
// script clears NODE_EXTRA_CA_CERTS for this process: the engine opens no network connection,
// and Node reads and parses that certificate bundle at every start (~40 ms here). It also gives
// V8 one background thread instead of four (--v8-pool-size=1, a Node option, so V8's code
// caches still apply): the command line keeps every core busy drawing, and more background
// threads only competed with it (~10 ms, medians of 2 × 16–20 interleaved runs here).
import { fileURLToPath } from 'node:url';
import { dropEarlyWorker, startEarly } from '../lib/compute/early-worker.mjs';

// First the request file, read once for the command line, and for a large request the
// engine's worker thread (lib/compute/early-worker.mjs): it starts up while this thread checks
// the bundles and loads the engine (-7 ms on the benchmark, medians of 30 interleaved runs).
// The rest is imported only after it has been started.
const workerFile = fileURLToPath(new URL('../dist/engine/worker.cjs', import.meta.url));
startEarly(process.argv.slice(2), workerFile);

const { build, bundlePaths, isFresh } = await import('../lib/compute/build-engine.mjs');
const { runWithCodeCache } = await import('../lib/compute/code-cache.mjs');
let paths = bundlePaths();
if (!isFresh()) {
  // The early worker runs the bundle being replaced.
  dropEarlyWorker();
  paths = await build();
}
if (paths.worker !== workerFile) dropEarlyWorker();
process.env.MARGIN_ENGINE_WORKER = paths.worker;
runWithCodeCache(paths.cli, paths.cliCache);
