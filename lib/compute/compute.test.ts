import { execFile } from 'node:child_process';
import { statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import { afterAll, describe, expect, it } from 'vitest';
import { EngineError, parseRequest, prepareProblem, runRequest } from '@/lib/resampling';
import { everyStatistic } from '@/tests/support/statistics';
import { guessDraws } from './early-worker.cjs';
import { closeComputePool, compute, drawsOf } from './index';

const run = promisify(execFile);
const root = process.cwd();

// Invented demo data: daily nitrate readings (mg/L) downstream of a treatment works.
const daily = Array.from({ length: 3000 }, (_, i) => Math.round((3 + Math.sin(i / 9) + ((i * 7919) % 101) / 50) * 100) / 100);
const big = { data: { nitrate: daily }, statistic: { name: 'median', column: 'nitrate' }, B: 3300, seed: 'river', intervals: { methods: ['percentile', 'bca', 'normal'] }, include: ['replicates'] };

afterAll(async () => {
  await closeComputePool();
});

describe("the command line's guess of a request's work, before validation (early-worker.cjs)", () => {
  it('is the work compute() counts from the prepared request, for every scheme that states its own', () => {
    const n = 600;
    const x = daily.slice(0, n);
    const site = x.map((_, i) => `site ${Math.floor(i / 8)}`);
    const g = x.map((_, i) => (Math.floor(i / 8) % 2 ? 'down' : 'up'));
    const data = { x, site, g };
    const diff = { name: 'mean-difference', column: 'x', group: 'g', levels: ['up', 'down'] };
    const cases = [
      { statistic: { name: 'median', column: 'x' } },
      ...[{ name: 'mean' }, { name: 'median' }, { name: 'trimmed-mean', trim: 0.1 }].map((st) => ({ statistic: { ...st, column: 'x' }, scheme: { name: 'cluster', by: 'site' } })),
      { statistic: diff, scheme: { name: 'cluster', by: 'site' } },
      { statistic: { name: 'median', column: 'x' }, scheme: { name: 'cluster', by: 'site', secondStage: true } },
      { statistic: { name: 'mean', column: 'x' }, scheme: { name: 'moving-block', blockLength: 20 } },
      { statistic: { name: 'median', column: 'x' }, scheme: { name: 'moving-block', blockLength: 20 } },
      { statistic: { name: 'mean', column: 'x' }, scheme: { name: 'stationary', meanBlockLength: 7.5 } },
      { statistic: { name: 'mean', column: 'x' }, intervals: { methods: ['studentized'] } },
      { statistic: { name: 'mean', column: 'x' }, intervals: { methods: ['percentile', 'studentized'], studentized: { se: 'bootstrap', innerB: 25 } } },
    ];
    for (const c of cases) {
      const input = { data, B: 1000, ...c };
      expect(guessDraws(input), JSON.stringify(c)).toBe(drawsOf(prepareProblem(parseRequest(input))));
    }
  });
});

describe('compute() in worker threads', () => {
  it('is bit-identical to runRequest, with 1 and 2 workers', async () => {
    const expected = JSON.stringify(runRequest(big));
    expect(JSON.stringify(await compute(big, { threads: 2 }))).toBe(expected);
    expect(JSON.stringify(await compute(big, { threads: 1 }))).toBe(expected);
  }, 120_000);

  it('is bit-identical when the calling thread draws alongside the workers (the CLI default)', async () => {
    const expected = JSON.stringify(runRequest(big));
    expect(JSON.stringify(await compute(big, { threads: 1, callerDraws: true }))).toBe(expected);
    expect(JSON.stringify(await compute(big, { threads: 2, callerDraws: true }))).toBe(expected);
    // Two jobs at once on one pool: chunks are claimed per job, results stay apart.
    const other = { ...big, seed: 'other' };
    const [a, b] = await Promise.all([compute(big, { threads: 2 }), compute(other, { threads: 2 })]);
    expect(JSON.stringify(a)).toBe(expected);
    expect(JSON.stringify(b)).toBe(JSON.stringify(runRequest(other)));
    expect(JSON.stringify(b)).not.toBe(expected);
  }, 120_000);

  it('is bit-identical for a studentized interval with a nested bootstrap inner SE', async () => {
    const req = { data: { x: daily.slice(0, 60) }, statistic: { name: 'trimmed-mean', column: 'x', trim: 0.1 }, B: 1100, seed: 'st', intervals: { methods: ['studentized'], studentized: { se: 'bootstrap', innerB: 25 } } };
    expect(JSON.stringify(await compute(req, { threads: 2 }))).toBe(JSON.stringify(runRequest(req)));
  }, 120_000);

  it('gives the same replicates as runRequest for every statistic and scheme, drawn by a worker alone', async () => {
    // The worker bundle has no zod (build-engine.mjs): this shows that preparing a problem
    // there never needs a schema. With a warm pool the calling thread leaves every chunk to
    // the worker.
    await compute(big, { threads: 1 });
    const x = daily.slice(0, 240);
    const y = x.map((v, i) => Math.round((0.4 * v + ((i * 37) % 11) / 10) * 100) / 100);
    const site = x.map((_, i) => `S${i % 12}`);
    const side = x.map((_, i) => (i % 3 ? 'downstream' : 'upstream'));
    const data = { x, y, site, side, day: x.map((_, i) => i) };
    const statistics = everyStatistic({ x: 'x', y: 'y', group: 'side', levels: ['downstream', 'upstream'], regression: { x: 'day', y: 'x' }, p: 0.9, pearson: false });
    const schemes: [object, object][] = [
      [{ name: 'stratified', by: 'site' }, { name: 'median', column: 'x' }],
      [{ name: 'cluster', by: 'site' }, { name: 'mean', column: 'x' }],
      [{ name: 'parametric', family: 'lognormal' }, { name: 'median', column: 'x' }],
      [{ name: 'residual' }, { name: 'regression-slope', x: 'day', y: 'x' }],
      [{ name: 'moving-block', blockLength: 'auto' }, { name: 'mean', column: 'x' }],
      [{ name: 'stationary', meanBlockLength: 6 }, { name: 'median', column: 'x' }],
    ];
    const requests = [
      ...statistics.map((statistic) => ({ statistic })),
      ...schemes.map(([scheme, statistic]) => ({ scheme, statistic })),
      { statistic: { name: 'mean', column: 'x' }, intervals: { methods: ['studentized'], studentized: { se: 'jackknife' } } },
    ].map((r, i) => ({ data, B: 1100, seed: `every-${i}`, intervals: { methods: ['percentile', 'bca'] }, include: ['replicates'], ...r }));
    for (const request of requests) {
      const expected = JSON.stringify(runRequest(request));
      expect(JSON.stringify(await compute(request, { threads: 1 })), JSON.stringify(request.statistic)).toBe(expected);
    }
  }, 120_000);

  it('reports progress up to B', async () => {
    const seen: number[] = [];
    await compute(big, { threads: 2, onProgress: (done, total) => (expect(total).toBe(3300), seen.push(done)) });
    expect(seen.length).toBe(7);
    expect(seen.at(-1)).toBe(3300);
    expect([...seen].sort((a, b) => a - b)).toEqual(seen);
  }, 120_000);

  it('rejects with the abort reason when cancelled, and keeps working afterwards', async () => {
    const ctl = new AbortController();
    const p = compute({ ...big, B: 200_000 }, { threads: 2, signal: ctl.signal, onProgress: () => ctl.abort() });
    await expect(p).rejects.toMatchObject({ name: 'AbortError' });
    const again = await compute({ ...big, B: 1000 }, { threads: 2 });
    expect(again.B).toBe(1000);
    const pre = new AbortController();
    pre.abort();
    await expect(compute(big, { signal: pre.signal })).rejects.toMatchObject({ name: 'AbortError' });
  }, 120_000);

  it('rejects bad input with EngineError naming the field', async () => {
    await expect(compute({ ...big, statistic: { name: 'median', column: 'nope' } })).rejects.toBeInstanceOf(EngineError);
    await expect(compute({ ...big, B: -3 })).rejects.toMatchObject({ code: 'invalid:request', path: 'B' });
  });
});

describe('command line', () => {
  const cli = (args: string[], input?: string) =>
    new Promise<{ code: number; stdout: string }>((resolve) => {
      const child = execFile(process.execPath, [path.join(root, 'scripts/compute.cjs'), ...args], { cwd: root, maxBuffer: 64 * 1024 * 1024 }, (err, stdout) => {
        resolve({ code: err ? ((err as { code?: number }).code ?? 1) : 0, stdout });
      });
      if (input !== undefined) child.stdin!.end(input);
    });

  it('prints the same response as the module, from a file and from stdin', async () => {
    const file = path.join(tmpdir(), `margin-cli-${process.pid}.json`);
    writeFileSync(file, JSON.stringify(big));
    const expected = JSON.stringify(runRequest(big));
    const fromFile = await cli([file]);
    expect(fromFile.code).toBe(0);
    expect(fromFile.stdout.trim()).toBe(expected);
    const fromStdin = await cli(['-', '--threads', '0'], JSON.stringify(big));
    expect(fromStdin.stdout.trim()).toBe(expected);
  }, 120_000);

  it('a large request, whose job reaches the workers before this thread has prepared it: same response, or the same error', async () => {
    const file = path.join(tmpdir(), `margin-cli-stud-${process.pid}.json`);
    const stud = { ...big, B: 1000, intervals: { methods: ['percentile', 'studentized'], studentized: { se: 'bootstrap', innerB: 25 } }, data: { nitrate: daily.slice(0, 2500) } };
    writeFileSync(file, JSON.stringify(stud));
    const out = await cli([file]);
    expect(out.code).toBe(0);
    expect(out.stdout.trim()).toBe(JSON.stringify(runRequest(stud)));
    const badFile = path.join(tmpdir(), `margin-cli-bad-${process.pid}.json`);
    writeFileSync(badFile, JSON.stringify({ ...big, statistic: { name: 'median', column: 'nope' } }));
    const bad = await cli([badFile]);
    expect(bad.code).toBe(1);
    expect(JSON.parse(bad.stdout).error).toMatchObject({ code: 'invalid:request', path: 'statistic.column' });
  }, 120_000);

  it('a large request from a file gets the worker the launcher started before loading the engine, and the request it parsed (one worker, one parse, same response)', async () => {
    const file = path.join(tmpdir(), `margin-cli-early-${process.pid}.json`);
    // n·B = 3.15·10⁷ index draws: above the command line's worker threshold (early-worker.cjs)
    const large = { ...big, B: 10_500 };
    writeFileSync(file, JSON.stringify(large));
    const traced = await new Promise<{ stdout: string; stderr: string }>((resolve, reject) => {
      execFile(process.execPath, [path.join(root, 'scripts/compute.cjs'), file], { cwd: root, env: { ...process.env, MARGIN_TRACE: '1' }, maxBuffer: 64 * 1024 * 1024 }, (err, stdout, stderr) =>
        err ? reject(err) : resolve({ stdout, stderr }),
      );
    });
    expect(traced.stdout.trim()).toBe(JSON.stringify(runRequest(large)));
    const marks = traced.stderr.split('\n');
    expect(marks.filter((l) => l.startsWith('launcher:early-worker '))).toHaveLength(1);
    // adopted by the pool: no second worker was started (whether the worker got to load before
    // this thread had drawn every chunk depends on the machine's load, so that is not asserted)
    expect(marks.filter((l) => l.startsWith('pool:adopted-early-worker '))).toHaveLength(1);
    expect(marks.filter((l) => l.startsWith('pool:started-worker '))).toHaveLength(0);
    expect(marks.filter((l) => l.startsWith('worker:loaded ')).length).toBeLessThanOrEqual(1);
    // the command line did not read and parse the file again
    expect(marks.filter((l) => l.startsWith('cli:request-from-launcher '))).toHaveLength(1);
    // a small request starts none
    const small = path.join(tmpdir(), `margin-cli-small-${process.pid}.json`);
    writeFileSync(small, JSON.stringify({ ...big, B: 100 }));
    const quiet = await new Promise<string>((resolve, reject) => {
      execFile(process.execPath, [path.join(root, 'scripts/compute.cjs'), small], { cwd: root, env: { ...process.env, MARGIN_TRACE: '1' } }, (err, _stdout, stderr) => (err ? reject(err) : resolve(stderr)));
    });
    expect(quiet).not.toContain('launcher:early-worker');
    expect(quiet).toContain('cli:request-from-launcher');
  }, 120_000);

  it('exits non-zero with a JSON error on bad input', async () => {
    const bad = await cli(['-'], '{"data": {"x": [1, 2, "three"]}, "statistic": {"name": "mean", "column": "x"}}');
    expect(bad.code).toBe(1);
    expect(JSON.parse(bad.stdout)).toEqual({ error: { code: 'invalid:data', message: expect.stringContaining('three'), path: 'data.x[2]' } });
    const notJson = await cli(['-'], '{"data": ');
    expect(notJson.code).toBe(1);
    expect(JSON.parse(notJson.stdout).error.code).toBe('bad_request:json');
    const noFile = await cli([]);
    expect(noFile.code).toBe(2);
  }, 60_000);

  it('the bundle builder reports fresh bundles after a build', async () => {
    const { stdout } = await run(process.execPath, [path.join(root, 'lib/compute/build-engine.mjs')], { cwd: root });
    expect(stdout.trim()).toBe(path.join(root, 'dist/engine'));
    const { isFresh, bundlePaths } = await import('./build-engine.mjs' as string);
    expect(isFresh(root)).toBe(true);
    // The build leaves the command line's code cache beside it (code-cache.cjs).
    expect(statSync(bundlePaths(root).cliCache).size).toBeGreaterThan(10_000);
  }, 60_000);
});
