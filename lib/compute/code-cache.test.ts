import { execFile } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import { afterAll, describe, expect, it } from 'vitest';

const run = promisify(execFile);
const loader = path.join(process.cwd(), 'lib/compute/code-cache.cjs');
const dir = mkdtempSync(path.join(tmpdir(), 'margin-code-cache-'));
const bundle = path.join(dir, 'bundle.cjs');
const cache = `${bundle}.cache`;
// A stand-in bundle: prints its arguments and the result of a function it defines.
writeFileSync(bundle, "const twice = (v) => v * 2;\nconsole.log(JSON.stringify({ args: process.argv.slice(2), twice: twice(21), file: __filename, exported: typeof module.exports }));\n");

/** Runs the bundle through runWithCodeCache in a fresh process; returns its output and whether V8 took the cache. */
async function runCached(): Promise<{ out: unknown; rejected: unknown }> {
  const script = `const { runWithCodeCache } = await import(${JSON.stringify(loader)});
process.argv = [process.argv[0], ${JSON.stringify(bundle)}, 'a', 'b'];
const s = runWithCodeCache(${JSON.stringify(bundle)}, ${JSON.stringify(cache)});
console.log(JSON.stringify({ rejected: s.cachedDataRejected ?? null }));`;
  const { stdout } = await run(process.execPath, ['--input-type=module', '-e', script]);
  const [out, flag] = stdout.trim().split('\n');
  return { out: JSON.parse(out), rejected: JSON.parse(flag).rejected };
}

afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('the command line code cache (code-cache.cjs)', () => {
  it('--write runs the bundle with the given arguments, then writes a cache that V8 accepts', async () => {
    const { stdout } = await run(process.execPath, [loader, '--write', bundle, cache, 'x', '--y']);
    expect(JSON.parse(stdout)).toEqual({ args: ['x', '--y'], twice: 42, file: bundle, exported: 'object' });
    expect(readFileSync(cache).length).toBeGreaterThan(0);
    const cached = await runCached();
    expect(cached.out).toEqual({ args: ['a', 'b'], twice: 42, file: bundle, exported: 'object' });
    expect(cached.rejected).toBe(false);
  });

  it('a cache that does not fit is rejected by V8 and the bundle runs all the same; no cache at all is fine too', async () => {
    writeFileSync(cache, Buffer.from('not a code cache at all, just bytes'));
    const bad = await runCached();
    expect(bad.out).toEqual({ args: ['a', 'b'], twice: 42, file: bundle, exported: 'object' });
    expect(bad.rejected).toBe(true);
    rmSync(cache);
    const none = await runCached();
    expect(none.out).toEqual({ args: ['a', 'b'], twice: 42, file: bundle, exported: 'object' });
    expect(none.rejected).toBe(null);
  });
});
