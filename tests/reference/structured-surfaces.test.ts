// Every structured scheme and test through the three surfaces of the engine — the module
// (runRequest), the command line (`npm run -s compute -- FILE`, worker threads) and
// POST /api/compute (session stubbed as in lib/compute/route.test.ts) — giving the same
// JSON, and bad input answered with { error: { code, message, path } } naming the field.
// Data: invented nitrate readings (mg/L), upstream and downstream of a treatment works,
// daily, at several sampling sites.
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it, vi } from 'vitest';
import { runRequest } from '@/lib/resampling';

const session = vi.hoisted(() => ({ user: { id: 1, email: 'ana@example.test', name: 'Ana' } as null | { id: number; email: string; name: string } }));
vi.mock('@/lib/auth/session', async () => {
  const { AppError } = await import('@/lib/errors');
  return {
    requireUser: async () => {
      if (!session.user) throw new AppError('unauthorized:session', 'Please sign in.');
      return session.user;
    },
    currentUser: async () => session.user,
  };
});
const { POST } = await import('@/app/api/compute/route');
const { closeComputePool } = await import('@/lib/compute');

const dir = mkdtempSync(path.join(tmpdir(), 'margin-structured-'));
afterAll(async () => {
  await closeComputePool();
  rmSync(dir, { recursive: true, force: true });
});

let fileNo = 0;
/** The command line; `--threads 2` sends the replicate chunks to two worker threads. */
function cli(request: unknown, extra: string[] = []): { status: number | null; body: unknown } {
  const file = path.join(dir, `req-${fileNo++}.json`);
  writeFileSync(file, JSON.stringify(request));
  const r = spawnSync('npm', ['run', '-s', 'compute', '--', file, ...extra], { cwd: process.cwd(), encoding: 'utf8' });
  return { status: r.status, body: JSON.parse(r.stdout) };
}
async function route(request: unknown): Promise<{ status: number; body: unknown }> {
  const res = await POST(new Request('http://127.0.0.1/api/compute', { method: 'POST', body: JSON.stringify(request), headers: { 'content-type': 'application/json' } }), undefined as never);
  return { status: res.status, body: await res.json() };
}

// 60 days of an autocorrelated daily series (AR(1)-like, made by a fixed recurrence).
const daily: number[] = [];
let level = 0;
for (let t = 0; t < 60; t++) {
  level = 0.7 * level + Math.sin(t * 1.7) * 0.8 + Math.cos(t * 0.31) * 0.3;
  daily.push(Math.round((4 + level) * 100) / 100);
}
const sites = Array.from({ length: 48 }, (_, i) => `S${1 + (i % 12)}`);
const siteReadings = sites.map((s, i) => Math.round((3 + Number(s.slice(1)) * 0.2 + ((i * 7) % 5) * 0.15) * 100) / 100);
const up = [2.1, 2.6, 1.9, 3.4, 2.8, 2.2, 3.9, 2.5, 2.0, 3.1];
const down = [3.3, 4.1, 2.9, 5.6, 3.8, 4.4, 6.9, 3.5, 3.1, 4.9];
const groups = { nitrate: [...up, ...down], site: [...up.map(() => 'upstream'), ...down.map(() => 'downstream')] };
const diff = { name: 'mean-difference', column: 'nitrate', group: 'site', levels: ['downstream', 'upstream'] };

const requests: [string, object][] = [
  ['moving-block auto', { data: { nitrate: daily }, statistic: { name: 'mean', column: 'nitrate' }, scheme: { name: 'moving-block', blockLength: 'auto' }, B: 1500, seed: 's1' }],
  ['stationary 5', { data: { nitrate: daily }, statistic: { name: 'median', column: 'nitrate' }, scheme: { name: 'stationary', meanBlockLength: 5 }, B: 1500, seed: 's2', intervals: { methods: ['percentile', 'bca'] } }],
  ['cluster two-stage', { data: { nitrate: siteReadings, site: sites }, statistic: { name: 'mean', column: 'nitrate' }, scheme: { name: 'cluster', by: 'site', secondStage: true }, B: 1500, seed: 's3' }],
  ['parametric lognormal', { data: groups, statistic: diff, scheme: { name: 'parametric', family: 'lognormal' }, B: 1500, seed: 's4' }],
  ['residual', { data: { day: daily.map((_, i) => i), nitrate: daily }, statistic: { name: 'regression-slope', x: 'day', y: 'nitrate' }, scheme: { name: 'residual' }, B: 1500, seed: 's5' }],
  ['permutation exact', { data: groups, statistic: diff, B: 1000, seed: 's6', test: { name: 'permutation', alternative: 'greater' } }],
  ['bootstrap-mean test', { data: { nitrate: up }, statistic: { name: 'mean', column: 'nitrate' }, B: 1500, seed: 's7', test: { name: 'bootstrap-mean', nullValue: 3 } }],
];

describe('module, command line and route give the same response', () => {
  // build the engine bundle once, outside the timed test body
  execFileSync(process.execPath, [path.join(process.cwd(), 'lib/compute/build-engine.mjs')]);
  it.each(requests)('%s', async (_label, request) => {
    const module = JSON.parse(JSON.stringify(runRequest(request)));
    const c = cli(request, ['--threads', '2']);
    expect(c.status).toBe(0);
    expect(c.body).toEqual(module);
    const r = await route(request);
    expect(r.status).toBe(200);
    expect(r.body).toEqual(module);
    expect(module.scheme.name).toBe((request as { scheme?: { name: string } }).scheme?.name ?? 'ordinary');
  });
});

describe('bad input: exit 1 on the command line, 422 on the route, the field named', () => {
  const bad: [string, object, string][] = [
    ['one cluster', { data: { nitrate: [1, 2, 3, 4], site: ['S1', 'S1', 'S1', 'S1'] }, statistic: { name: 'mean', column: 'nitrate' }, scheme: { name: 'cluster', by: 'site' }, B: 100 }, 'scheme.by'],
    ['block length ≥ n', { data: { nitrate: daily.slice(0, 12) }, statistic: { name: 'mean', column: 'nitrate' }, scheme: { name: 'moving-block', blockLength: 12 }, B: 100 }, 'scheme.blockLength'],
    ['family that cannot fit', { data: { nitrate: [1.5, -0.2, 3.1] }, statistic: { name: 'mean', column: 'nitrate' }, scheme: { name: 'parametric', family: 'exponential' }, B: 100 }, 'scheme.family'],
    ['poisson on non-integers', { data: { nitrate: [1.5, 2, 3] }, statistic: { name: 'mean', column: 'nitrate' }, scheme: { name: 'parametric', family: 'poisson' }, B: 100 }, 'scheme.family'],
    ['unknown test', { data: groups, statistic: diff, B: 100, test: { name: 'wilcoxon' } }, 'test.name'],
  ];
  it.each(bad)('%s', async (_label, request, field) => {
    const c = cli(request);
    expect(c.status).toBe(1);
    expect((c.body as { error: { path: string } }).error.path).toBe(field);
    const r = await route(request);
    expect(r.status).toBe(422);
    expect((r.body as { error: { path: string; message: string } }).error).toMatchObject({ path: field, message: expect.any(String) });
  });
});
