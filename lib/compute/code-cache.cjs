'use strict';
// Runs a CommonJS bundle with V8's code cache: the bytecode of every function compiled during a
// warm-up run, saved next to the bundle by the build (build-engine.mjs), so that a later start
// neither parses the bundle nor compiles the functions the warm-up reached. Node 20 keeps no
// compile cache of its own for user code (module.enableCompileCache came in Node 22), and the
// command line is a short process where compiling the engine was ~30–50 ms of its start.
//
// A cache that V8 rejects (another Node or V8 version, other V8 flags, a changed bundle) is
// ignored and the bundle compiles as usual: the cache can make a start faster, never wrong.
//
// CommonJS, as the launcher that loads it (scripts/compute.cjs).
//
//   node lib/compute/code-cache.cjs --write BUNDLE CACHE [ARGS…]
//     runs BUNDLE with ARGS as its command line and, when it exits, writes CACHE.
const { readFileSync, writeFileSync } = require('node:fs');
const { createRequire } = require('node:module');
const path = require('node:path');
const vm = require('node:vm');

/**
 * Runs `bundle` (CommonJS) in this context with its own module object, using `cacheFile` when
 * it is given and there. Returns the compiled script, whose createCachedData() includes
 * whatever has been compiled by the time it is called.
 */
function runWithCodeCache(bundle, cacheFile) {
  const file = path.resolve(bundle);
  const source = readFileSync(file, 'utf8');
  let cachedData;
  try {
    cachedData = cacheFile ? readFileSync(cacheFile) : undefined;
  } catch {
    cachedData = undefined;
  }
  // The same wrapper Node puts around a CommonJS module.
  const wrapped = `(function (exports, require, module, __filename, __dirname) { ${source}\n});`;
  const script = new vm.Script(wrapped, { filename: file, cachedData });
  const module = { exports: {}, filename: file, id: file, loaded: false };
  script.runInThisContext().call(module.exports, module.exports, createRequire(file), module, file, path.dirname(file));
  module.loaded = true;
  return script;
}

module.exports = { runWithCodeCache };

if (require.main === module) {
  const [flag, bundle, cache, ...args] = process.argv.slice(2);
  if (flag !== '--write' || !bundle || !cache) {
    process.stderr.write('usage: node lib/compute/code-cache.cjs --write BUNDLE CACHE [ARGS…]\n');
    process.exit(2);
  }
  // The bundle reads its arguments from process.argv.slice(2), as when it is started itself.
  process.argv = [process.argv[0], bundle, ...args];
  // No cache to start from: the one written at exit must hold this run's compilation alone.
  const script = runWithCodeCache(bundle, null);
  process.on('exit', (code) => {
    if (code === 0) writeFileSync(cache, script.createCachedData());
  });
}
