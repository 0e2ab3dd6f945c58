// Builds the datasets worker bundle with esbuild: dist/datasets/worker.mjs, plain JavaScript
// as worker threads need it (under `next start`, vitest, scripts and the benchmark alike).
// The bundle is rebuilt when any file it was built from changed: esbuild's metafile lists the
// inputs, and dist/datasets/stamp.json keeps them with a signature of their sizes and mtimes.
// Builds go to a temporary folder and are renamed into place (lib/build/bundle-on-demand.mjs).
//
//   node lib/datasets/build-worker.mjs            build if stale, print the bundle path
//   node lib/datasets/build-worker.mjs --force    always rebuild
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

export const ENTRY = 'lib/datasets/worker-entry.ts';
export const BUNDLE_DIR = 'dist/datasets';
const ALWAYS = ['package-lock.json', 'tsconfig.json', 'lib/datasets/build-worker.mjs', 'lib/build/bundle-on-demand.mjs'];

/** Project root: the folder holding lib/datasets/build-worker.mjs. */
export function projectRoot() {
  return path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
}

export function bundlePaths(root = projectRoot()) {
  const dir = path.join(root, BUNDLE_DIR);
  return { dir, worker: path.join(dir, 'worker.mjs'), stamp: path.join(dir, 'stamp.json') };
}

/** Signature of the given files: changes when one is modified, added or removed. */
function signature(root, files) {
  const h = createHash('sha256');
  for (const f of [...new Set([...files, ...ALWAYS])].sort()) {
    const full = path.join(root, f);
    if (!existsSync(full)) {
      h.update(`${f}:missing\n`);
      continue;
    }
    const s = statSync(full);
    h.update(`${f}:${s.size}:${s.mtimeMs}\n`);
  }
  return h.digest('hex');
}

export function isFresh(root = projectRoot()) {
  const p = bundlePaths(root);
  if (!existsSync(p.worker) || !existsSync(p.stamp)) return false;
  // Without sources (a deployment of dist/ only) the bundle is all there is.
  if (!existsSync(path.join(root, ENTRY))) return true;
  try {
    const stamp = JSON.parse(readFileSync(p.stamp, 'utf8'));
    return stamp.signature === signature(root, stamp.inputs);
  } catch {
    return false;
  }
}

export async function build(root = projectRoot()) {
  const esbuild = await import('esbuild');
  const { buildInPlace, nodeBundleOptions, serverOnlyEmpty } = await import('../build/bundle-on-demand.mjs');
  const p = bundlePaths(root);
  await buildInPlace(root, 'datasets', p.dir, async (tmp) => {
    const result = await esbuild.build({
      ...nodeBundleOptions(root, tmp),
      entryPoints: { worker: ENTRY },
      outExtension: { '.js': '.mjs' },
      format: 'esm',
      // Bundled CommonJS dependencies (papaparse) may call require at run time.
      banner: { js: "import { createRequire as __marginCreateRequire } from 'node:module'; const require = __marginCreateRequire(import.meta.url);" },
      plugins: [serverOnlyEmpty],
    });
    const inputs = Object.keys(result.metafile.inputs).filter((f) => !f.includes(':'));
    return { files: ['worker.mjs'], stamp: { inputs, signature: signature(root, inputs) } };
  });
  return p;
}

export async function ensureBuilt(root = projectRoot()) {
  if (isFresh(root)) return bundlePaths(root);
  return build(root);
}

if (process.argv[1] && pathToFileURL(path.resolve(process.argv[1])).href === import.meta.url) {
  const p = process.argv.includes('--force') ? await build() : await ensureBuilt();
  process.stdout.write(`${p.worker}\n`);
}
