#!/usr/bin/env node
'use strict';
// `npm run -s compute -- FILE`: runs the engine's command line from its prebuilt bundle
// (dist/engine/cli.cjs) with V8's code cache of it (lib/compute/code-cache.cjs), rebuilding
// both first when lib/resampling or lib/compute changed (lib/compute/engine-bundle.cjs).
// Plain JS on purpose: starting TypeScript through tsx would cost ~0.3 s per call; and
// CommonJS, with only CommonJS modules on the way to the bundle: an ES module entry costs Node
// 20 its module loader before the first statement runs (~10 ms here), which would delay the
// worker thread's start by as much. The npm script clears NODE_EXTRA_CA_CERTS for this
// process: the engine opens no network connection, and Node reads and parses that certificate
// bundle at every start (~40 ms here). It also gives V8 one background thread instead of four
// (--v8-pool-size=1, a Node option, so V8's code caches still apply): the command line keeps
// every core busy drawing, and more background threads only competed with it (~10 ms, medians
// of 2 × 16–20 interleaved runs here).
const { dropEarlyWorker, startEarly } = require('../lib/compute/early-worker.cjs');
const { bundlePaths, isFresh } = require('../lib/compute/engine-bundle.cjs');

// First the request file, read once for the command line, and for a large request the
// engine's worker thread (lib/compute/early-worker.cjs): it starts up while this thread checks
// the bundles and loads the engine (-7 ms on the benchmark, medians of 30 interleaved runs).
const paths = bundlePaths();
startEarly(process.argv.slice(2), paths.worker);

if (isFresh()) run(paths);
else {
  // The early worker runs the bundle being replaced.
  dropEarlyWorker();
  import('../lib/compute/build-engine.mjs')
    .then(({ build }) => build())
    .then(run, (e) => {
      process.stderr.write(`${e && e.stack ? e.stack : String(e)}\n`);
      process.stdout.write(`${JSON.stringify({ error: { code: 'internal:build', message: 'the engine bundle could not be built', path: '' } })}\n`, () => process.exit(3));
    });
}

function run(p) {
  process.env.MARGIN_ENGINE_WORKER = p.worker;
  require('../lib/compute/code-cache.cjs').runWithCodeCache(p.cli, p.cliCache);
}
