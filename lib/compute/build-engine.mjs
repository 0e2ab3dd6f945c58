// Builds the engine's plain-JavaScript bundles with esbuild, for worker threads and the
// command line: dist/engine/worker.cjs (the worker entry) and dist/engine/cli.cjs (the command
// line, whose engine modules are evaluated only once it has started its workers), plus
// dist/engine/cli.cjs.cache, V8's code cache of the command line after a small warm-up request
// (code-cache.cjs; scripts/compute.cjs runs the bundle with it). Worker threads need plain JS
// found at run time (under vitest, the CLI and `next start` alike), so the bundle is resolved
// from the project root and rebuilt when any source file under lib/resampling, lib/compute or
// lib/build changed (a signature of paths, sizes and mtimes is kept in dist/engine/stamp.json;
// engine-bundle.cjs, which the launcher checks on every start).
// Builds go to a temporary folder and are renamed into place (lib/build/bundle-on-demand.mjs).
//
// Start-up cost is what the shapes are for: CommonJS starts faster than an ES module (no
// module loader to set up, and only a script can use a code cache on Node 20); the worker
// bundle has no zod — requests are validated on the main thread, so there zod's exports are
// inert stand-ins that only build unused schemas (and throw if anything ever parses with one);
// and seedrandom's `require('crypto')`, only used to seed from entropy (the engine always
// passes a seed), gets an empty module instead of loading node:crypto.
//
//   node lib/compute/build-engine.mjs            build if stale, print the bundle folder
//   node lib/compute/build-engine.mjs --force    always rebuild
import { existsSync, readdirSync, rmSync, statSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import bundle from './engine-bundle.cjs';

const { BUNDLE_DIR, ENTRIES, CLI_FILE, CLI_CACHE, STALE_FILE_MS, projectRoot, sourceSignature, bundlePaths, isFresh } = bundle;
export { BUNDLE_DIR, ENTRIES, projectRoot, sourceSignature, bundlePaths, isFresh };

/**
 * zod for the worker bundle: every export of the real package (zod/mini and zod/locales, as the
 * engine imports them), each an inert chainable stand-in.
 */
async function inertZod() {
  const specifiers = ['zod', 'zod/mini', 'zod/locales'];
  const names = Object.fromEntries(await Promise.all(specifiers.map(async (spec) => [spec, Object.keys(await import(spec)).filter((n) => n !== 'default')])));
  const contents = (spec) => `const refuse = () => { throw new Error('zod is not loaded in the engine worker: requests are validated on the main thread'); };
const inert = new Proxy(function () {}, { get: (_t, key) => (key === 'parse' || key === 'safeParse' || key === 'parseAsync' || key === 'safeParseAsync' ? refuse : inert), apply: () => inert });
export { ${names[spec].map((n) => `inert as ${n}`).join(', ')} };
export default inert;`;
  return {
    name: 'inert-zod',
    setup(b) {
      b.onResolve({ filter: /^zod(\/mini|\/locales)?$/ }, (args) => ({ path: args.path, namespace: 'inert-zod' }));
      b.onLoad({ filter: /.*/, namespace: 'inert-zod' }, (args) => ({ contents: contents(args.path), loader: 'js' }));
    },
  };
}

/** seedrandom's optional `require('crypto')` (entropy seeding, never used by the engine) → an empty module. */
const seedrandomWithoutCrypto = {
  name: 'seedrandom-without-crypto',
  setup(b) {
    b.onResolve({ filter: /^crypto$/ }, (args) => (/[\\/]seedrandom[\\/]/.test(args.importer) ? { path: 'crypto', namespace: 'no-crypto' } : undefined));
    b.onLoad({ filter: /.*/, namespace: 'no-crypto' }, () => ({ contents: 'module.exports = {};', loader: 'js' }));
  },
};

/**
 * A typical request (an Estimate block's median with percentile and BCa intervals) that the
 * command line runs once after a build, to fill its code cache with what such a run compiles.
 * 3,000 values, so that the paths for samples of 256 and more (sorting and scanning in
 * WebAssembly) are the ones compiled, as for the benchmark's request: with the 60 values this
 * used to have, a large request still compiled those functions itself (−3.6 ms on the
 * benchmark request, medians of 21 interleaved runs).
 */
function warmUpRequest() {
  const x = Array.from({ length: 3000 }, (_, i) => Math.round(Math.exp(Math.sin(i * 12.9898) * 0.8 + 1) * 100) / 100);
  return JSON.stringify({ data: { x }, statistic: { name: 'median', column: 'x' }, B: 2000, seed: 'code-cache', intervals: { level: 0.95, methods: ['percentile', 'bca'] } });
}

/**
 * Writes the command line's code cache (code-cache.cjs) by running the new bundle once on the
 * warm-up request. A failure leaves no cache, which only makes starts slower: say so, go on.
 */
async function writeCodeCache(dir) {
  // node:child_process only here, when building: the freshness check runs on every start of the
  // command line, and loading that module cost it ~2–3 ms.
  const { spawnSync } = await import('node:child_process');
  const r = spawnSync(process.execPath, [fileURLToPath(new URL('./code-cache.cjs', import.meta.url)), '--write', path.join(dir, CLI_FILE), path.join(dir, CLI_CACHE), '-', '--threads', '0'], {
    input: warmUpRequest(),
    encoding: 'utf8',
    timeout: 60_000,
  });
  if (r.status !== 0 || !existsSync(path.join(dir, CLI_CACHE))) {
    process.stderr.write(`build-engine: no code cache for the command line (warm-up run exited ${r.status}): ${(r.stderr || r.stdout || '').slice(-500)}\n`);
    return false;
  }
  return true;
}

/** Builds both bundles (always). Returns the bundle paths. */
export async function build(root = projectRoot()) {
  const esbuild = await import('esbuild');
  const { buildInPlace, nodeBundleOptions, serverOnlyEmpty } = await import('../build/bundle-on-demand.mjs');
  const p = bundlePaths(root);
  const signature = sourceSignature(root);
  await buildInPlace(root, 'engine', p.dir, async (tmp) => {
    const common = { ...nodeBundleOptions(root, tmp), format: 'cjs', outExtension: { '.js': '.cjs' } };
    // The command line's `await import('./index')` becomes a lazy require: the engine's modules
    // (zod schemas and all) are evaluated only when it is reached, after the workers started.
    const cli = await esbuild.build({ ...common, entryPoints: { cli: ENTRIES.cli }, plugins: [serverOnlyEmpty, seedrandomWithoutCrypto] });
    const worker = await esbuild.build({ ...common, entryPoints: { worker: ENTRIES.worker }, plugins: [serverOnlyEmpty, seedrandomWithoutCrypto, await inertZod()] });
    const files = [...Object.keys(cli.metafile.outputs), ...Object.keys(worker.metafile.outputs)].map((f) => path.basename(f));
    const cached = await writeCodeCache(tmp);
    // An old cache left beside a new bundle would only be rejected by V8, but is removed all the same.
    if (!cached) rmSync(p.cliCache, { force: true });
    return { files: [...(cached ? [CLI_CACHE] : []), ...files], stamp: { signature, files } };
  });
  for (const f of readdirSync(p.dir)) {
    if ((f.startsWith('chunk-') || f === 'cli.mjs') && Date.now() - statSync(path.join(p.dir, f)).mtimeMs > STALE_FILE_MS) rmSync(path.join(p.dir, f), { force: true });
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
