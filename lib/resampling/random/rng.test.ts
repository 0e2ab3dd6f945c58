import seedrandom from 'seedrandom';
import { describe, expect, it } from 'vitest';
import { createRng } from './rng';
import { uniformIndex } from './uniform-index';

describe('engine generator = seedrandom tychei', () => {
  it('produces exactly seedrandom.tychei’s stream (int32 and double)', () => {
    // Source: the seedrandom 3.0.5 package's own Tyche-i implementation.
    const ours = createRng('nitrate', 'chunk:0');
    const ref = seedrandom.tychei('nitrate\u001fchunk:0');
    const a = Array.from({ length: 100_000 }, () => ours.int32());
    const b = Array.from({ length: 100_000 }, () => ref.int32());
    expect(a).toEqual(b);
    const c = Array.from({ length: 1000 }, () => ours.double());
    const d = Array.from({ length: 1000 }, () => ref.double());
    expect(c).toEqual(d);
  });

  it('bulk addCounts draws exactly the indices fillIndices lists (and uniformIndex above 2¹⁶)', () => {
    for (const m of [1, 2, 7, 1000, 65_536, 65_537, 2_000_000]) {
      // 512 and 513 straddle one batch of 64 steps (eight draws each) in the 16-bit loops.
      for (const times of [1, 2, 511, 512, 513, 999, 3000, 10_001]) {
        const a = createRng('s', `m${m}`);
        const b = createRng('s', `m${m}`);
        const size = Math.min(m, 5000);
        const viaBulk = new Int32Array(size);
        const viaList = new Int32Array(size);
        const units = Int32Array.from({ length: m }, (_, i) => i % size);
        a.addCounts(viaBulk, m, times, m > size ? units : null);
        const list = new Int32Array(times);
        b.fillIndices(list, 0, m, times);
        for (const i of list) {
          expect(i).toBeGreaterThanOrEqual(0);
          expect(i).toBeLessThan(m);
          viaList[units[i]]++;
        }
        expect(Array.from(viaBulk)).toEqual(Array.from(viaList));
        expect(a.int32()).toBe(b.int32());
        if (m > 65_536) {
          const c = createRng('s', `m${m}`);
          for (let k = 0; k < times; k++) expect(list[k]).toBe(uniformIndex(c, m));
        }
      }
    }
  });

  it('indices below 2¹⁶ are Lemire draws from four seedrandom tychei lanes, eight per step in order', () => {
    // Sources: the seedrandom 3.0.5 package's Tyche-i for each lane's stream; Lemire, D. (2019),
    // "Fast random integer generation in an interval", ACM TOMACS 29(1): 3 (multiply, keep the
    // high part, reject when the low part is below 2^k mod m), here with k = 16.
    for (const m of [3, 1000, 10_000, 65_536]) {
      for (const times of [1, 7, 8, 9, 5003]) {
        const rng = createRng('lanes', `m${m}`);
        const ours = new Int32Array(2 * times);
        // two calls: the second starts with the step after the first call's last one
        rng.fillIndices(ours, 0, m, times);
        rng.fillIndices(ours, times, m, times);
        const lanes = [0, 1, 2, 3].map((j) => seedrandom.tychei(`lanes\u001fm${m}\u001flane:${j}`));
        const threshold = (65536 - m) % m;
        const ref: number[] = [];
        for (const part of [0, 1]) {
          const want = (part + 1) * times;
          while (ref.length < want) {
            for (const w of lanes.map((l) => l.int32())) {
              for (const half of [w >>> 16, w & 0xffff]) {
                const x = half * m;
                if ((x & 0xffff) >= threshold && ref.length < want) ref.push(x >>> 16);
              }
            }
          }
        }
        expect(Array.from(ours)).toEqual(ref);
      }
    }
  });

  it('different streams and seeds differ; the same seed repeats', () => {
    const draw = (seed: string, stream: string) => Array.from({ length: 5 }, ((r) => () => r.int32())(createRng(seed, stream)));
    expect(draw('a', 'chunk:0')).toEqual(draw('a', 'chunk:0'));
    expect(draw('a', 'chunk:0')).not.toEqual(draw('a', 'chunk:1'));
    expect(draw('a', 'chunk:0')).not.toEqual(draw('b', 'chunk:0'));
  });
});

describe('uniform indices', () => {
  it('are uniform: chi-square over 10 cells below the 0.1% critical value', () => {
    // Chi-square with 9 degrees of freedom: P(χ² > 27.88) = 0.001 (any χ² table).
    const rng = createRng('uniformity', 'x');
    const cells = new Array(10).fill(0);
    const N = 200_000;
    for (let i = 0; i < N; i++) cells[uniformIndex(rng, 10)]++;
    const chi = cells.reduce((a, c) => a + (c - N / 10) ** 2 / (N / 10), 0);
    expect(chi).toBeLessThan(27.88);
  });

  it('bulk draws from 16-bit halves are uniform too (m = 10 and m = 6, chi-square)', () => {
    // Chi-square critical values at 0.1%: 27.88 (9 df), 20.52 (5 df) (any χ² table).
    for (const [m, crit] of [[10, 27.88], [6, 20.52]] as const) {
      const rng = createRng('uniformity16', `m${m}`);
      const counts = new Int32Array(m);
      const N = 300_000;
      rng.addCounts(counts, m, N, null);
      const chi = Array.from(counts).reduce((acc, c) => acc + (c - N / m) ** 2 / (N / m), 0);
      expect(chi).toBeLessThan(crit);
    }
  });

  it('a given point is absent from a resample with probability ≈ (1 − 1/n)ⁿ ≈ e⁻¹', () => {
    // Source: Efron, B. (1983), JASA 78: 316–331 (the .632 estimator): P(x₁ ∉ x*) = (1 − 1/n)ⁿ → e⁻¹ ≈ 0.368.
    const n = 50;
    const trials = 20_000;
    const rng = createRng('absent', 'x');
    let absent = 0;
    const counts = new Int32Array(n);
    for (let t = 0; t < trials; t++) {
      counts.fill(0);
      rng.addCounts(counts, n, n, null);
      if (counts[0] === 0) absent++;
    }
    const p = (1 - 1 / n) ** n;
    const mcSe = Math.sqrt((p * (1 - p)) / trials);
    expect(Math.abs(absent / trials - p)).toBeLessThan(4 * mcSe);
    expect(Math.abs(p - Math.exp(-1))).toBeLessThan(0.004);
  });
});
