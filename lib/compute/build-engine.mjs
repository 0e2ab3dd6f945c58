// Builds the engine's plain-JavaScript bundles with esbuild, for worker threads and the
// command line: dist/engine/worker.mjs (the worker entry) and dist/engine/cli.mjs.
// Worker threads need plain JS found at run time (under vitest, the CLI and `next start`
// alike), so the bundle is resolved from the project root and rebuilt when any source file
// under lib/resampling or lib/compute changed (a signature of paths, sizes and mtimes is
// kept in dist/engine/stamp.json). Builds go to a temporary folder and are renamed into
// place, so concurrent builders never leave a half-written file.
//
//   node lib/compute/build-engine.mjs            build if stale, print the bundle folder
//   node lib/compute/build-engine.mjs --force    always rebuild
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readdirSync, readFileSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const SOURCE_DIRS = ['lib/resampling', 'lib/compute'];
const EXTRA_FILES = ['package-lock.json', 'tsconfig.json'];
export const BUNDLE_DIR = 'dist/engine';
export const ENTRIES = { worker: 'lib/compute/worker-entry.ts', cli: 'lib/compute/cli.ts' };

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

/** Signature of the sources: changes whenever a file is added, removed or modified. */
export function sourceSignature(root = projectRoot()) {
  const h = createHash('sha256');
  for (const f of listSources(root)) {
    const s = statSync(path.join(root, f));
    h.update(`${f}:${s.size}:${s.mtimeMs}\n`);
  }
  return h.digest('hex');
}

export function bundlePaths(root = projectRoot()) {
  const dir = path.join(root, BUNDLE_DIR);
  return { dir, worker: path.join(dir, 'worker.mjs'), cli: path.join(dir, 'cli.mjs'), stamp: path.join(dir, 'stamp.json') };
}

export function isFresh(root = projectRoot()) {
  const p = bundlePaths(root);
  if (!existsSync(p.worker) || !existsSync(p.cli) || !existsSync(p.stamp)) return false;
  // Without sources (a deployment of dist/ only) the bundle is all there is.
  if (!existsSync(path.join(root, ENTRIES.worker))) return true;
  try {
    return JSON.parse(readFileSync(p.stamp, 'utf8')).signature === sourceSignature(root);
  } catch {
    return false;
  }
}

/** Builds both bundles (always). Returns the bundle paths. */
export async function build(root = projectRoot()) {
  const esbuild = await import('esbuild');
  const p = bundlePaths(root);
  const signature = sourceSignature(root);
  const tmp = path.join(root, 'dist', `.engine-build-${process.pid}-${Date.now()}`);
  mkdirSync(tmp, { recursive: true });
  try {
    await esbuild.build({
      absWorkingDir: root,
      entryPoints: { worker: ENTRIES.worker, cli: ENTRIES.cli },
      outdir: tmp,
      outExtension: { '.js': '.mjs' },
      bundle: true,
      platform: 'node',
      format: 'esm',
      target: 'node20',
      sourcemap: false,
      minify: true,
      legalComments: 'none',
      logLevel: 'error',
      tsconfig: path.join(root, 'tsconfig.json'),
      // Bundled CommonJS dependencies (seedrandom) may call require at run time.
      banner: { js: "import { createRequire as __marginCreateRequire } from 'node:module'; const require = __marginCreateRequire(import.meta.url);" },
      plugins: [
        {
          name: 'server-only-empty',
          setup(b) {
            b.onResolve({ filter: /^server-only$/ }, () => ({ path: 'server-only', namespace: 'empty' }));
            b.onLoad({ filter: /.*/, namespace: 'empty' }, () => ({ contents: '', loader: 'js' }));
          },
        },
      ],
    });
    writeFileSync(path.join(tmp, 'stamp.json'), JSON.stringify({ signature, builtAt: new Date().toISOString() }));
    mkdirSync(p.dir, { recursive: true });
    for (const f of ['worker.mjs', 'cli.mjs', 'stamp.json']) renameSync(path.join(tmp, f), path.join(p.dir, f));
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
