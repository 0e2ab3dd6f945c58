// What the project's on-demand esbuild bundles share (lib/compute/build-engine.mjs for the
// engine, lib/datasets/build-worker.mjs for the datasets worker): the common esbuild options,
// `server-only` as an empty module, and building into a temporary folder whose results are then
// renamed into place with the stamp last, so concurrent builders never leave a half-written file
// and a reader never sees a fresh stamp beside old bundles. Imported only when a build is
// needed, so the freshness checks that run on every start do not load it.
import { mkdirSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';

/** `import 'server-only'` (a Next.js guard) → an empty module: these bundles run outside Next. */
export const serverOnlyEmpty = {
  name: 'server-only-empty',
  setup(b) {
    b.onResolve({ filter: /^server-only$/ }, () => ({ path: 'server-only', namespace: 'empty' }));
    b.onLoad({ filter: /.*/, namespace: 'empty' }, () => ({ contents: '', loader: 'js' }));
  },
};

/** esbuild options every bundle here uses: Node 20, minified, a metafile of inputs and outputs. */
export function nodeBundleOptions(root, outdir) {
  return {
    absWorkingDir: root,
    outdir,
    bundle: true,
    platform: 'node',
    target: 'node20',
    sourcemap: false,
    minify: process.env.MARGIN_PROFILE_BUILD !== '1',
    legalComments: 'none',
    logLevel: 'error',
    tsconfig: path.join(root, 'tsconfig.json'),
    metafile: true,
  };
}

/**
 * Runs `build(tmp)` in a new temporary folder under <root>/dist, then renames the files it
 * returns into `dir`, in the order given, and writes `stamp` (as stamp.json) last.
 * `build` resolves to { files, stamp }; the temporary folder is removed whatever happens.
 */
export async function buildInPlace(root, name, dir, build) {
  const tmp = path.join(root, 'dist', `.${name}-build-${process.pid}-${Date.now()}`);
  mkdirSync(tmp, { recursive: true });
  try {
    const { files, stamp } = await build(tmp);
    writeFileSync(path.join(tmp, 'stamp.json'), JSON.stringify({ ...stamp, builtAt: new Date().toISOString() }));
    mkdirSync(dir, { recursive: true });
    for (const f of [...files, 'stamp.json']) renameSync(path.join(tmp, f), path.join(dir, f));
  } finally {
    rmSync(tmp, { recursive: true, force: true });
  }
}
