import { readFileSync } from 'node:fs';
import seedrandom from 'seedrandom';
import { describe, expect, it } from 'vitest';
import { runRNumbers } from '@/tests/reference/structured-r';
import { countRelabellings, PermutationError, permutationTest, type TwoGroupStatistic } from './index';

const mean = (x: Float64Array) => x.reduce((s, v) => s + v, 0) / x.length;
const median = (x: Float64Array) => {
  const s = Float64Array.from(x).sort();
  const h = s.length >> 1;
  return s.length % 2 ? s[h] : (s[h - 1] + s[h]) / 2;
};
const meanDiff: TwoGroupStatistic = (a, b) => mean(a) - mean(b);
const medianDiff: TwoGroupStatistic = (a, b) => median(a) - median(b);

// Outside reference: full enumeration in R with utils::combn on data from R's datasets
// package (PlantGrowth, ToothGrowth, chickwts), run live. C(20, 10) = 184,756 splits.
const script = readFileSync(new URL('./permutation.reference.R', import.meta.url), 'utf8');
const R = runRNumbers(`${script}
pg <- split(PlantGrowth$weight, PlantGrowth$group)
emit("ctrl", pg$ctrl); emit("trt1", pg$trt1); emit("trt2", pg$trt2)
emit("ctrl_trt1", perm_counts_mean(pg$ctrl, pg$trt1))
emit("ctrl_trt2", perm_counts_mean(pg$ctrl, pg$trt2))
tg <- subset(ToothGrowth, dose == 0.5)
oj <- tg$len[tg$supp == "OJ"]; vc <- tg$len[tg$supp == "VC"]
emit("oj", oj); emit("vc", vc)
emit("oj_vc_median", perm_counts_median(oj, vc))
emit("oj5_vc6_median", perm_counts(oj[1:5], vc[1:6], median_diff))
cw <- split(chickwts$weight, chickwts$feed)
emit("horsebean", cw$horsebean); emit("linseed", cw$linseed)
emit("horse_lin", perm_counts_mean(cw$horsebean, cw$linseed))
`);

describe('exact permutation test against full enumeration in R (combn)', () => {
  it.each([
    ['ctrl', 'trt1', 'ctrl_trt1'],
    ['ctrl', 'trt2', 'ctrl_trt2'],
  ])('PlantGrowth %s vs %s, difference of means: identical counts for all three alternatives', (g1, g2, ref) => {
    const [total, greater, less, twoSided, strict] = R[ref];
    expect(total).toBe(184_756);
    // Weights have two decimals, so many splits tie in exact arithmetic; without the
    // tolerance, rounding drops some of them (strict ≤ tolerant, both from R).
    expect(strict).toBeLessThanOrEqual(twoSided);
    const run = (alternative: 'greater' | 'less' | 'two-sided') =>
      permutationTest(R[g1], R[g2], meanDiff, { alternative });
    const g = run('greater');
    const l = run('less');
    const t = run('two-sided');
    expect(g.method).toBe('exact');
    expect(g.total).toBe(total);
    expect([g.count, l.count, t.count]).toEqual([greater, less, twoSided]);
    expect(t.pValue).toBe(twoSided / total);
    expect(t.monteCarloError).toBe(0);
  });

  it('ToothGrowth dose 0.5, OJ vs VC, difference of medians (many ties): identical counts', () => {
    const [total, greater, less, twoSided] = R.oj_vc_median;
    const counts = (['greater', 'less', 'two-sided'] as const).map(
      (alternative) => permutationTest(R.oj, R.vc, medianDiff, { alternative }).count,
    );
    expect(counts).toEqual([greater, less, twoSided]);
    expect(total).toBe(184_756);
  });

  it('odd group sizes (first 5 OJ vs first 6 VC), difference of medians, R with one median() call per split', () => {
    const [total, greater, less, twoSided] = R.oj5_vc6_median;
    expect(total).toBe(462);
    const counts = (['greater', 'less', 'two-sided'] as const).map(
      (alternative) => permutationTest(R.oj.slice(0, 5), R.vc.slice(0, 6), medianDiff, { alternative }).count,
    );
    expect(counts).toEqual([greater, less, twoSided]);
  });
});

describe('Monte Carlo permutation test', () => {
  it('agrees with the exact R p-value within 4 Monte Carlo errors (chickwts horsebean vs linseed, C(22,10) = 646,646)', () => {
    const [total, , , twoSided] = R.horse_lin;
    expect(total).toBe(646_646);
    expect(countRelabellings(10, 12, 200_000)).toBe(Infinity);
    const exactP = twoSided / total;
    const r = permutationTest(R.horsebean, R.linseed, meanDiff, { B: 20_000, random: seedrandom('chick') });
    expect(r.method).toBe('monte-carlo');
    expect(r.total).toBe(20_000);
    expect(r.pValue).toBe((r.count + 1) / 20_001);
    expect(r.monteCarloError).toBeCloseTo(Math.sqrt((r.pValue * (1 - r.pValue)) / 20_000), 15);
    expect(Math.abs(r.pValue - exactP)).toBeLessThan(4 * r.monteCarloError);
  });

  it('is used when forced by a low exactLimit, and agrees with the exact answer', () => {
    const exact = permutationTest(R.ctrl, R.trt2, meanDiff);
    const mc = permutationTest(R.ctrl, R.trt2, meanDiff, { exactLimit: 0, B: 20_000, random: seedrandom('pg') });
    expect(mc.method).toBe('monte-carlo');
    expect(Math.abs(mc.pValue - exact.pValue)).toBeLessThan(4 * mc.monteCarloError + 1 / 20_001);
  });

  it('is deterministic for a seed', () => {
    const run = (seed: string) =>
      permutationTest(R.horsebean, R.linseed, meanDiff, { B: 500, random: seedrandom(seed) }).count;
    expect(run('a')).toBe(run('a'));
    expect([run('a'), run('b'), run('c')].some((c, _, all) => c !== all[0])).toBe(true);
  });
});

describe('small cases worked by hand', () => {
  it('[1,2] vs [3,4]: 6 splits, differences −2, −1, 0, 0, 1, 2', () => {
    const a = Object.freeze([1, 2]);
    expect(permutationTest(a, [3, 4], meanDiff, { alternative: 'less' })).toMatchObject({ count: 1, total: 6, pValue: 1 / 6 });
    expect(permutationTest(a, [3, 4], meanDiff, { alternative: 'greater' })).toMatchObject({ count: 6, pValue: 1 });
    expect(permutationTest(a, [3, 4], meanDiff).pValue).toBeCloseTo(1 / 3, 15);
    expect(a).toEqual([1, 2]);
  });

  it('counts a tie lost to rounding (0.1 + 0.2 vs 0.3 + 0)', () => {
    // observed sum 0.30000000000000004; the split {0.3, 0} gives 0.3 exactly — a tie.
    const sumA: TwoGroupStatistic = (a) => a[0] + a[1];
    const r = permutationTest([0.1, 0.2], [0.3, 0], sumA, { alternative: 'greater' });
    // splits: {.1,.2}=.3 {.1,.3}=.4 {.1,0}=.1 {.2,.3}=.5 {.2,0}=.2 {.3,0}=.3 → ≥ .3: four
    expect(r.count).toBe(4);
  });

  it('reports all-tied data (p = 1) and skips relabellings with a non-finite statistic', () => {
    expect(permutationTest([2, 2], [2, 2, 2], meanDiff)).toMatchObject({ pValue: 1, allTied: true });
    // a statistic undefined when group A holds the value 9
    const odd: TwoGroupStatistic = (a, b) => (a.includes(9) ? NaN : mean(a) - mean(b));
    const r = permutationTest([1, 2], [3, 9], odd);
    expect(r.nonFinite).toBe(3);
    expect(r.total).toBe(3);
  });
});

describe('bad input', () => {
  it('names the problem', () => {
    expect(() => permutationTest([], [1], meanDiff)).toThrow(PermutationError);
    expect(() => permutationTest([1, NaN], [1], meanDiff)).toThrow(/value 2 of the first group/);
    expect(() => permutationTest([1, 1], [2, 2], (a, b) => (mean(a) - mean(b)) / 0 * 0)).toThrow(/zero variance/);
    expect(() => permutationTest(R.horsebean, R.linseed, meanDiff, { B: 0, random: seedrandom('bad-B') })).toThrow(/B must be/);
    expect(() => permutationTest(R.horsebean, R.linseed, meanDiff)).toThrow(/random source/);
    expect(() =>
      permutationTest([1], [2], meanDiff, { alternative: 'both' as unknown as 'less' }),
    ).toThrow(/alternative/);
  });

  it('counts relabellings as binomial coefficients', () => {
    expect([countRelabellings(10, 10), countRelabellings(1, 5), countRelabellings(10, 12), countRelabellings(0, 4)]).toEqual([
      184_756, 6, 646_646, 1,
    ]);
    expect(countRelabellings(500, 500, 200_000)).toBe(Infinity);
  });
});
