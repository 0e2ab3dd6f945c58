// Builds the engine's plain-JavaScript bundles with esbuild, for worker threads and the
// command line: dist/engine/worker.cjs (the worker entry) and dist/engine/cli.mjs (with the
// engine in a chunk of its own, chunk-*.mjs, that the command line imports only after it has
// started its workers). Worker threads need plain JS found at run time (under vitest, the
// CLI and `next start` alike), so the bundle is resolved from the project root and rebuilt
// when any source file under lib/resampling or lib/compute changed (a signature of paths,
// sizes and mtimes is kept in dist/engine/stamp.json). Builds go to a temporary folder and
// are renamed into place, so concurrent builders never leave a half-written file.
//
// Start-up cost is what the two shapes are for: a worker thread starts faster from
// CommonJS (no ES module loader to set up in the new thread), and without zod — requests are
// validated on the main thread, so in the worker bundle zod's exports are inert stand-ins that
// only build unused schemas (and throw if anything ever parses with one there).
//
//   node lib/compute/build-engine.mjs            build if stale, print the bundle folder
//   node lib/compute/build-engine.mjs --force    always rebuild
import { existsSync, mkdirSync, readdirSync, readFileSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const SOURCE_DIRS = ['lib/resampling', 'lib/compute'];
const EXTRA_FILES = ['package-lock.json', 'tsconfig.json'];
export const BUNDLE_DIR = 'dist/engine';
export const ENTRIES = { worker: 'lib/compute/worker-entry.ts', cli: 'lib/compute/cli.ts' };
const WORKER_FILE = 'worker.cjs';
/** Chunks of an older build are removed once they are this old (a process started earlier may still import one). */
const STALE_CHUNK_MS = 60 * 60 * 1000;

/** Project root: the folder holding lib/compute/build-engine.mjs. */
export function projectRoot() {
  return path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
}

function listSources(root) {
  const files = [];
  const walk = (dir) => {
    let entries;
    try {
      entries = readdirSync(path.join(root, dir), { withFileTypes: true });
    } catch {
      return;
    }
    for (const e of entries) {
      const rel = `${dir}/${e.name}`;
      if (e.isDirectory()) walk(rel);
      else if (/\.(ts|mjs|js|json)$/.test(e.name) && !/\.test\.ts$/.test(e.name)) files.push(rel);
    }
  };
  for (const d of SOURCE_DIRS) walk(d);
  for (const f of EXTRA_FILES) if (existsSync(path.join(root, f))) files.push(f);
  return files.sort();
}

/**
 * Signature of the sources: one line of path, size and mtime per file, so it changes whenever
 * a file is added, removed or modified. Kept as text (a few kilobytes) and compared whole —
 * exact, and no hash module to load on each start of the command line.
 */
export function sourceSignature(root = projectRoot()) {
  let text = '';
  for (const f of listSources(root)) {
    const s = statSync(path.join(root, f));
    text += `${f}:${s.size}:${s.mtimeMs}\n`;
  }
  return text;
}

export function bundlePaths(root = projectRoot()) {
  const dir = path.join(root, BUNDLE_DIR);
  return { dir, worker: path.join(dir, WORKER_FILE), cli: path.join(dir, 'cli.mjs'), stamp: path.join(dir, 'stamp.json') };
}

export function isFresh(root = projectRoot()) {
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

const serverOnlyEmpty = {
  name: 'server-only-empty',
  setup(b) {
    b.onResolve({ filter: /^server-only$/ }, () => ({ path: 'server-only', namespace: 'empty' }));
    b.onLoad({ filter: /.*/, namespace: 'empty' }, () => ({ contents: '', loader: 'js' }));
  },
};

/** zod for the worker bundle: every export of the real package, each an inert chainable stand-in. */
async function inertZod() {
  const names = Object.keys(await import('zod')).filter((n) => n !== 'default');
  const contents = `const refuse = () => { throw new Error('zod is not loaded in the engine worker: requests are validated on the main thread'); };
const inert = new Proxy(function () {}, { get: (_t, key) => (key === 'parse' || key === 'safeParse' || key === 'parseAsync' || key === 'safeParseAsync' ? refuse : inert), apply: () => inert });
export { ${names.map((n) => `inert as ${n}`).join(', ')} };
export default inert;`;
  return {
    name: 'inert-zod',
    setup(b) {
      b.onResolve({ filter: /^zod$/ }, () => ({ path: 'zod', namespace: 'inert-zod' }));
      b.onLoad({ filter: /.*/, namespace: 'inert-zod' }, () => ({ contents, loader: 'js' }));
    },
  };
}

/** Builds both bundles (always). Returns the bundle paths. */
export async function build(root = projectRoot()) {
  const esbuild = await import('esbuild');
  const p = bundlePaths(root);
  const signature = sourceSignature(root);
  const tmp = path.join(root, 'dist', `.engine-build-${process.pid}-${Date.now()}`);
  mkdirSync(tmp, { recursive: true });
  try {
    const common = {
      absWorkingDir: root,
      outdir: tmp,
      bundle: true,
      platform: 'node',
      target: 'node20',
      sourcemap: false,
      minify: true,
      legalComments: 'none',
      logLevel: 'error',
      tsconfig: path.join(root, 'tsconfig.json'),
      metafile: true,
    };
    const cli = await esbuild.build({
      ...common,
      entryPoints: { cli: ENTRIES.cli },
      format: 'esm',
      splitting: true,
      chunkNames: 'chunk-[hash]',
      outExtension: { '.js': '.mjs' },
      // Bundled CommonJS dependencies (seedrandom) may call require at run time.
      banner: { js: "import { createRequire as __marginCreateRequire } from 'node:module'; const require = __marginCreateRequire(import.meta.url);" },
      plugins: [serverOnlyEmpty],
    });
    const worker = await esbuild.build({
      ...common,
      entryPoints: { worker: ENTRIES.worker },
      format: 'cjs',
      outExtension: { '.js': '.cjs' },
      plugins: [serverOnlyEmpty, await inertZod()],
    });
    const files = [...Object.keys(cli.metafile.outputs), ...Object.keys(worker.metafile.outputs)].map((f) => path.basename(f));
    writeFileSync(path.join(tmp, 'stamp.json'), JSON.stringify({ signature, files, builtAt: new Date().toISOString() }));
    mkdirSync(p.dir, { recursive: true });
    // Chunks first, the entry files and the stamp last: a reader never sees an entry whose chunk is missing.
    const ordered = [...files.filter((f) => f.startsWith('chunk-')), ...files.filter((f) => !f.startsWith('chunk-')), 'stamp.json'];
    for (const f of ordered) renameSync(path.join(tmp, f), path.join(p.dir, f));
    for (const f of readdirSync(p.dir)) {
      if (f.startsWith('chunk-') && !files.includes(f) && Date.now() - statSync(path.join(p.dir, f)).mtimeMs > STALE_CHUNK_MS) rmSync(path.join(p.dir, f), { force: true });
    }
  } finally {
    rmSync(tmp, { recursive: true, force: true });
  }
  return p;
}

/** Builds when stale; returns the bundle paths. */
export async function ensureBuilt(root = projectRoot()) {
  if (isFresh(root)) return bundlePaths(root);
  return build(root);
}

if (process.argv[1] && pathToFileURL(path.resolve(process.argv[1])).href === import.meta.url) {
  const force = process.argv.includes('--force');
  const p = force ? await build() : await ensureBuilt();
  process.stdout.write(`${p.dir}\n`);
}
