// Reference tests against R's boot package (Canty & Ripley; Davison & Hinkley 1997), from
// Debian's r-cran-boot, on data sets from R's `datasets` package. The engine's own resamples
// (resampleIndices: the very draws of its replicates) are handed to R, which recomputes
// every replicate itself and runs boot.ci on them, with influence values from boot's own
// empinf(type = "jack"). Replicates, SD and the normal, basic, percentile, BCa and
// studentized end points must then agree to rounding, not just within Monte Carlo error.
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { prepare, resampleIndices, runRequest } from '@/lib/resampling';
import { hasR, keyValues, rDataset, rscript } from './support/r';

const dirs: string[] = [];
afterAll(() => dirs.forEach((d) => rmSync(d, { recursive: true, force: true })));

interface Case {
  title: string;
  request: Record<string, unknown>;
  rStatistic: string;
  columns: { x: number[]; y?: number[]; g?: string[] };
  levels?: [string, string];
  studentized?: boolean;
  /** BCa is compared exactly only when no replicate ties θ̂ (R counts θ* < θ̂; the engine gives ties ½). */
  bca?: boolean;
}

function close(a: number, b: number, rel = 1e-9): void {
  expect(Math.abs(a - b)).toBeLessThanOrEqual(rel * Math.max(1, Math.abs(a), Math.abs(b)));
}

function compareWithR(c: Case): void {
  const r = runRequest(c.request);
  const problem = prepare(c.request);
  const B = problem.request.B;
  const n = problem.n;
  const idx = resampleIndices(problem);
  const dir = mkdtempSync(path.join(tmpdir(), 'margin-boot-'));
  dirs.push(dir);
  const rows: string[] = [];
  for (let b = 0; b < B; b++) {
    const row: number[] = [];
    for (let k = 0; k < n; k++) row.push(idx[b * n + k] + 1);
    rows.push(row.join(' '));
  }
  writeFileSync(path.join(dir, 'indices.txt'), `${rows.join('\n')}\n`);
  // The cleaned data in unit order (the engine's units), so R's row i is the engine's unit i − 1.
  const units = problem.rows;
  writeFileSync(path.join(dir, 'x.txt'), Array.from(units, (u) => c.columns.x[u]).join('\n'));
  if (c.columns.y) writeFileSync(path.join(dir, 'y.txt'), Array.from(units, (u) => c.columns.y![u]).join('\n'));
  if (c.columns.g) writeFileSync(path.join(dir, 'g.txt'), Array.from(units, (u) => c.columns.g![u]).join('\n'));
  const conf = (c.request.intervals as { level: number }).level;
  writeFileSync(
    path.join(dir, 'case.txt'),
    [`statistic ${c.rStatistic}`, `conf ${conf}`, `studentized ${c.studentized ? 'yes' : 'no'}`, `bca ${c.bca === false ? 'no' : 'yes'}`, ...(c.levels ? [`a ${c.levels[0]}`, `b ${c.levels[1]}`] : [])].join('\n'),
  );
  const out = keyValues(rscript('boot-identical.R', [dir]));
  const tR = readFileSync(path.join(dir, 't.txt'), 'utf8').trim().split('\n').map(Number);
  const L = readFileSync(path.join(dir, 'L.txt'), 'utf8').trim().split('\n').map(Number);
  const Lboot = readFileSync(path.join(dir, 'Lboot.txt'), 'utf8').trim().split('\n').map(Number);

  // Same resamples → same replicates (R computed each one itself).
  const reps = r.replicates!;
  expect(tR.length).toBe(B);
  for (let b = 0; b < B; b++) close(reps[b]!, tR[b], 1e-10);
  close(r.estimate, out.t0, 1e-12);
  close(r.se!, out.sd, 1e-9);
  // boot.ci: normal (bias-corrected), basic, percentile — Davison & Hinkley eqs. 5.5, 5.6, 5.18.
  for (const m of ['normal', 'basic', 'percentile'] as const) {
    close(r.intervals[m]!.lower!, out[`${m}.lower`]);
    close(r.intervals[m]!.upper!, out[`${m}.upper`]);
  }
  // The engine's jackknife influence values = Efron's (n−1)(θ̄₍·₎ − θ₍ⱼ₎) computed in R. boot's
  // empinf(type = "jack") centres at θ̂ instead of θ̄₍·₎: the same values whenever the jackknife
  // bias is 0 (the mean, the n−1 variance), a constant shift otherwise.
  const infl = r.jackknife!.influence!;
  for (let i = 0; i < n; i++) close(infl[i]!, L[i], 1e-8);
  const shift = Lboot[0] - L[0];
  for (let i = 0; i < n; i++) close(Lboot[i] - L[i], shift, 1e-8);
  if (c.rStatistic === 'mean' || c.rStatistic === 'variance') expect(Math.abs(shift)).toBeLessThan(1e-8);
  if (c.bca !== false) {
    expect(out.ties).toBe(0);
    close(r.jackknife!.acceleration!, out.a, 1e-8);
    close(r.intervals.bca!.lower!, out['bca.lower']);
    close(r.intervals.bca!.upper!, out['bca.upper']);
  }
  if (c.studentized) {
    close(r.intervals.studentized!.lower!, out['studentized.lower'], 1e-8);
    close(r.intervals.studentized!.upper!, out['studentized.upper'], 1e-8);
  }
}

describe.skipIf(!hasR)('identical resamples: engine = R boot', () => {
  const precip = rDataset('precip').value as number[];
  const faithful = rDataset('faithful');
  const cars = rDataset('cars');
  const tooth = rDataset('ToothGrowth');
  const air = rDataset('airquality');
  const all = ['normal', 'basic', 'percentile', 'bca'];

  it('mean of precip (n = 70), all five intervals incl. studentized with jackknife inner SE', () => {
    compareWithR({
      title: 'precip mean',
      request: { data: { x: precip }, statistic: { name: 'mean', column: 'x' }, B: 999, seed: 'precip', intervals: { level: 0.95, methods: [...all, 'studentized'] }, include: ['replicates', 'jackknife'] },
      rStatistic: 'mean',
      columns: { x: precip },
      studentized: true,
    });
  }, 120_000);

  it('median of faithful eruptions (n = 272), 90% level', () => {
    const x = faithful.eruptions as number[];
    compareWithR({
      title: 'faithful median',
      request: { data: { x }, statistic: { name: 'median', column: 'x' }, B: 1999, seed: 'geyser', intervals: { level: 0.9, methods: all }, include: ['replicates', 'jackknife'] },
      rStatistic: 'median',
      columns: { x },
      bca: false,
    });
  }, 120_000);

  it('Pearson correlation and Spearman correlation of cars speed and dist (n = 50)', () => {
    const x = cars.speed as number[];
    const y = cars.dist as number[];
    for (const [method, rStatistic] of [['pearson', 'correlation'], ['spearman', 'spearman']]) {
      compareWithR({
        title: `cars ${method}`,
        request: { data: { x, y }, statistic: { name: 'correlation', x: 'x', y: 'y', method }, B: 1999, seed: 'cars', intervals: { level: 0.95, methods: all }, include: ['replicates', 'jackknife'] },
        rStatistic,
        columns: { x, y },
      });
    }
  }, 120_000);

  it('least-squares slope of dist on speed (cars), case resampling', () => {
    const x = cars.speed as number[];
    const y = cars.dist as number[];
    compareWithR({
      title: 'cars slope',
      request: { data: { x, y }, statistic: { name: 'regression-slope', x: 'x', y: 'y' }, B: 999, seed: 'lm', intervals: { level: 0.95, methods: all }, include: ['replicates', 'jackknife'] },
      rStatistic: 'slope',
      columns: { x, y },
    });
  }, 120_000);

  it('difference in mean tooth length OJ − VC (ToothGrowth), resampled within supp (boot strata)', () => {
    const x = tooth.len as number[];
    const g = tooth.supp as string[];
    compareWithR({
      title: 'ToothGrowth mean difference',
      request: {
        data: { x, g },
        statistic: { name: 'mean-difference', column: 'x', group: 'g', levels: ['OJ', 'VC'] },
        B: 1999,
        seed: 'tooth',
        intervals: { level: 0.95, methods: ['normal', 'basic', 'percentile'] },
        include: ['replicates', 'jackknife'],
      },
      rStatistic: 'mean-difference',
      columns: { x, g },
      levels: ['OJ', 'VC'],
      bca: false,
    });
  }, 120_000);

  it('variance of airquality Ozone with its 37 missing values left out (n = 116)', () => {
    const ozone = air.Ozone as (number | null)[];
    const request = { data: { x: ozone }, statistic: { name: 'variance', column: 'x' }, B: 999, seed: 'ozone', intervals: { level: 0.95, methods: all }, include: ['replicates', 'jackknife'] };
    const r = runRequest(request);
    expect(r.provenance.n).toBe(116);
    expect(r.warnings.find((w) => w.code === 'non-finite-dropped')!.message).toMatch(/^37 rows/);
    compareWithR({ title: 'ozone variance', request, rStatistic: 'variance', columns: { x: ozone as number[] } });
  }, 120_000);
});

describe.skipIf(!hasR)('building blocks = base R', () => {
  const ref = keyValues(rscript('functions.R'));
  it('qnorm and pnorm (R uses AS 241 for qnorm)', async () => {
    const { normalQuantile } = await import('@/lib/resampling/math/normal-quantile');
    const { normalCdf } = await import('@/lib/resampling/math/normal-cdf');
    for (const p of [1e-12, 0.001, 0.025, 0.05, 0.3, 0.5, 0.9, 0.975, 0.999999]) close(normalQuantile(p), ref[`qnorm.${p}`], 1e-14);
    for (const z of [-7, -3, -1.96, -0.5, 0, 0.7, 1.645, 2.5, 6]) expect(Math.abs(normalCdf(z) - ref[`pnorm.${z}`])).toBeLessThan(2e-15);
  });
  it('quantile type 7, median, mad, IQR, var, sd, trimmed mean on faithful eruptions; cor and lm on cars', () => {
    const e = rDataset('faithful').eruptions as number[];
    const cars = rDataset('cars');
    const est = (statistic: Record<string, unknown>, data: Record<string, unknown> = { x: e }) => prepare({ data, statistic, B: 10 }).statistic.estimate;
    for (const p of [0, 0.1, 0.25, 0.5, 0.75, 0.93, 1]) close(est({ name: 'quantile', column: 'x', p }), ref[`quantile.${p}`], 1e-15);
    close(est({ name: 'median', column: 'x' }), ref.median, 1e-15);
    close(est({ name: 'mad', column: 'x' }), ref.mad, 1e-14);
    close(est({ name: 'iqr', column: 'x' }), ref.iqr, 1e-14);
    close(est({ name: 'variance', column: 'x' }), ref.var, 1e-13);
    close(est({ name: 'sd', column: 'x' }), ref.sd, 1e-13);
    close(est({ name: 'trimmed-mean', column: 'x', trim: 0.1 }), ref['trim.0.1'], 1e-13);
    close(est({ name: 'trimmed-mean', column: 'x', trim: 0.25 }), ref['trim.0.25'], 1e-13);
    const cd = { x: cars.speed, y: cars.dist };
    close(est({ name: 'correlation', x: 'x', y: 'y' }, cd), ref['cor.pearson'], 1e-13);
    close(est({ name: 'correlation', x: 'x', y: 'y', method: 'spearman' }, cd), ref['cor.spearman'], 1e-13);
    close(est({ name: 'regression-slope', x: 'x', y: 'y' }, cd), ref['lm.slope'], 1e-12);
    close(est({ name: 'regression-intercept', x: 'x', y: 'y' }, cd), ref['lm.intercept'], 1e-12);
  });
});
