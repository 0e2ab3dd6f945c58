import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { EngineError, runRequest } from '@/lib/resampling';
import { runRNumbers } from './structured-r';

// Outside reference: exact permutation p-values by full enumeration with utils::combn in R
// (lib/resampling/permutation/permutation.reference.R), on PlantGrowth and chickwts from
// R's datasets package; the bootstrap test of a mean against R's boot on shifted data.
const script = readFileSync(new URL('../../lib/resampling/permutation/permutation.reference.R', import.meta.url), 'utf8');
const R = runRNumbers(`${script}
pg <- split(PlantGrowth$weight, PlantGrowth$group)
emit("ctrl", pg$ctrl); emit("trt2", pg$trt2)
emit("ctrl_trt2", perm_counts_mean(pg$ctrl, pg$trt2))
emit("ctrl_trt2_median", perm_counts_median(pg$ctrl, pg$trt2))
cw <- split(chickwts$weight, chickwts$feed)
emit("horsebean", cw$horsebean); emit("linseed", cw$linseed)
emit("horse_lin", perm_counts_mean(cw$horsebean, cw$linseed))
suppressMessages(library(boot)); set.seed(5)
x <- as.numeric(nhtemp); mu0 <- 51.5; n <- length(x)
tobs <- (mean(x) - mu0) / (sd(x) / sqrt(n)); z <- x - mean(x) + mu0
b <- boot(z, function(d, i) { y <- d[i]; (mean(y) - mu0) / (sd(y) / sqrt(n)) }, R = 20000)
emit("nhtemp", x); emit("nhtemp_test", c((sum(abs(b$t) >= abs(tobs)) + 1) / 20001, (sum(b$t <= tobs) + 1) / 20001))
`);

const twoGroups = (a: number[], b: number[]) => ({
  nitrate: [...a, ...b],
  site: [...a.map(() => 'upstream'), ...b.map(() => 'downstream')],
});
const diff = (name: string) => ({ name, column: 'nitrate', group: 'site', levels: ['upstream', 'downstream'] });

describe('permutation test in a request', () => {
  it('exact for PlantGrowth ctrl vs trt2 (C(20,10) = 184,756): p = R count / 184,756 for each alternative', () => {
    const [total, greater, less, two] = R.ctrl_trt2;
    for (const [alternative, count] of [['greater', greater], ['less', less], ['two-sided', two]] as const) {
      const r = runRequest({ data: twoGroups(R.ctrl, R.trt2), statistic: diff('mean-difference'), B: 200, test: { name: 'permutation', alternative } });
      expect(r.test).toMatchObject({ name: 'permutation', alternative, method: 'exact', count, total, monteCarloError: 0 });
      expect(r.test!.pValue).toBe(count / total);
    }
  });

  it('exact for the difference of medians as well', () => {
    const [total, , , two] = R.ctrl_trt2_median;
    const r = runRequest({ data: twoGroups(R.ctrl, R.trt2), statistic: diff('median-difference'), B: 200, test: { name: 'permutation' } });
    expect(r.test!.pValue).toBe(two / total);
  });

  it('Monte Carlo above 200,000 relabellings (chickwts, C(22,10) = 646,646): within 4 Monte Carlo errors of the exact p', () => {
    const [total, , , two] = R.horse_lin;
    const r = runRequest({ data: twoGroups(R.horsebean, R.linseed), statistic: diff('mean-difference'), B: 20_000, seed: 'perm', test: { name: 'permutation' } });
    expect(r.test!.method).toBe('monte-carlo');
    expect(r.test!.pValue).toBe((r.test!.count + 1) / 20_001);
    expect(Math.abs(r.test!.pValue - two / total)).toBeLessThan(4 * r.test!.monteCarloError);
  });

  it('needs a two-group statistic', () => {
    const e = (() => {
      try {
        runRequest({ data: { nitrate: R.ctrl }, statistic: { name: 'mean', column: 'nitrate' }, B: 100, test: { name: 'permutation' } });
      } catch (err) {
        return err as EngineError;
      }
    })();
    expect(e?.path).toBe('test.name');
  });

  it('does not change the bootstrap replicates', () => {
    const base = { data: twoGroups(R.ctrl, R.trt2), statistic: diff('mean-difference'), B: 500, seed: 's', include: ['replicates'] };
    expect(runRequest({ ...base, test: { name: 'permutation' } }).replicates).toEqual(runRequest(base).replicates);
  });
});

describe('bootstrap test of a mean against a null value', () => {
  it('nhtemp, μ₀ = 51.5: p within Monte Carlo error of R boot on the shifted data', () => {
    const [pTwo, pLess] = R.nhtemp_test;
    const two = runRequest({ data: { x: R.nhtemp }, statistic: { name: 'mean', column: 'x' }, B: 20_000, test: { name: 'bootstrap-mean', nullValue: 51.5 } }).test!;
    const less = runRequest({ data: { x: R.nhtemp }, statistic: { name: 'mean', column: 'x' }, B: 20_000, test: { name: 'bootstrap-mean', nullValue: 51.5, alternative: 'less' } }).test!;
    expect(two).toMatchObject({ name: 'bootstrap-mean', method: 'monte-carlo', nullValue: 51.5 });
    expect(Math.abs(two.pValue - pTwo)).toBeLessThan(4 * Math.SQRT2 * two.monteCarloError + 1e-4);
    expect(Math.abs(less.pValue - pLess)).toBeLessThan(4 * Math.SQRT2 * less.monteCarloError + 1e-4);
  });

  it('needs the mean statistic and a finite null value', () => {
    expect(() => runRequest({ data: { x: R.nhtemp }, statistic: { name: 'median', column: 'x' }, B: 100, test: { name: 'bootstrap-mean', nullValue: 50 } })).toThrow(/for the mean/);
    expect(() => runRequest({ data: { x: R.nhtemp }, statistic: { name: 'mean', column: 'x' }, B: 100, test: { name: 'bootstrap-mean' } })).toThrow(EngineError);
  });
});

describe('zero-variance groups', () => {
  it('warn, naming the group', () => {
    const r = runRequest({ data: twoGroups([5, 5, 5, 5, 5, 5, 5, 5, 5, 5], R.trt2), statistic: diff('mean-difference'), B: 200 });
    const w = r.warnings.find((x) => x.code === 'zero-variance-group');
    expect(w?.message).toMatch(/"upstream"/);
  });
});
