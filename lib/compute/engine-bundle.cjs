'use strict';
// Where the engine's bundles live (dist/engine) and whether they are fresh: the signature of the
// sources they were built from, kept in dist/engine/stamp.json by the build (build-engine.mjs),
// against the sources now. The command line's launcher (scripts/compute.cjs) checks this on
// every start before it runs the bundle, so it is CommonJS with nothing but node:fs and
// node:path: an ES module would cost the launcher Node's module loader first (~10 ms here), and
// the builder (esbuild, the warm-up run) is loaded only when a build is due.
const { existsSync, readdirSync, readFileSync, statSync } = require('node:fs');
const path = require('node:path');

const SOURCE_DIRS = ['lib/resampling', 'lib/compute', 'lib/build'];
const EXTRA_FILES = ['package-lock.json', 'tsconfig.json'];
const BUNDLE_DIR = 'dist/engine';
const ENTRIES = { worker: 'lib/compute/worker-entry.ts', cli: 'lib/compute/cli.ts' };
const WORKER_FILE = 'worker.cjs';
const CLI_FILE = 'cli.cjs';
const CLI_CACHE = 'cli.cjs.cache';
/** Files of older layouts (an ES-module command line in chunks) are removed once they are this old. */
const STALE_FILE_MS = 60 * 60 * 1000;

/** Project root: the folder holding lib/compute. */
function projectRoot() {
  return path.resolve(__dirname, '..', '..');
}

function listSources(root) {
  const files = [];
  const walk = (dir) => {
    let entries;
    try {
      entries = readdirSync(`${root}/${dir}`, { withFileTypes: true });
    } catch {
      return;
    }
    for (const e of entries) {
      const rel = `${dir}/${e.name}`;
      if (e.isDirectory()) walk(rel);
      else if (/\.(ts|mjs|cjs|js|json)$/.test(e.name) && !/\.test\.ts$/.test(e.name)) files.push(rel);
    }
  };
  for (const d of SOURCE_DIRS) walk(d);
  for (const f of EXTRA_FILES) if (existsSync(`${root}/${f}`)) files.push(f);
  return files.sort();
}

/**
 * Signature of the sources: one line of path, size and mtime per file, so it changes whenever
 * a file is added, removed or modified. Kept as text (a few kilobytes) and compared whole —
 * exact, and no hash module to load on each start of the command line.
 */
function sourceSignature(root = projectRoot()) {
  let text = '';
  // Paths joined as text, not with path.join: the command line runs this on every start, and
  // path.join's normalization, called for each of ~160 files, was hot enough for V8 to compile
  // it optimized on its one background thread (~20 ms of CPU there, beside the draws).
  for (const f of listSources(root)) {
    const s = statSync(`${root}/${f}`);
    text += `${f}:${s.size}:${s.mtimeMs}\n`;
  }
  return text;
}

function bundlePaths(root = projectRoot()) {
  const dir = path.join(root, BUNDLE_DIR);
  return { dir, worker: path.join(dir, WORKER_FILE), cli: path.join(dir, CLI_FILE), cliCache: path.join(dir, CLI_CACHE), stamp: path.join(dir, 'stamp.json') };
}

function isFresh(root = projectRoot()) {
  const p = bundlePaths(root);
  let stamp;
  try {
    stamp = JSON.parse(readFileSync(p.stamp, 'utf8'));
  } catch {
    return false;
  }
  if (!Array.isArray(stamp.files) || !stamp.files.every((f) => existsSync(path.join(p.dir, f)))) return false;
  // Without sources (a deployment of dist/ only) the bundle is all there is.
  if (!existsSync(path.join(root, ENTRIES.worker))) return true;
  return stamp.signature === sourceSignature(root);
}

// What build-engine.mjs and the launcher use.
module.exports = { BUNDLE_DIR, ENTRIES, CLI_FILE, CLI_CACHE, STALE_FILE_MS, projectRoot, sourceSignature, bundlePaths, isFresh };
