import type { EngineResponse, IntervalResult, JackknifeResult } from '../contract/response';
import type { IntervalMethod } from '../contract/schema';
import { dataSha256 } from '../data/data-hash';
import { diagnose } from '../diagnostics/registry';
import { exactAnswer } from '../exact/exact';
import { biasCorrection } from '../intervals/bca';
import { INTERVALS } from '../intervals/registry';
import type { IntervalInput } from '../intervals/types';
import { type JackknifeOutcome, jackknife } from '../jackknife/jackknife';
import { bootstrapSeOfResample } from '../jackknife/resample-se';
import { finiteSorted } from '../math/finite-sorted';
import { type Moments, moments } from '../math/moments';
import { quantileSorted } from '../math/quantile-sorted';
import { adviseB } from '../montecarlo/advice';
import { seMonteCarloError } from '../montecarlo/se-error';
import { createRng, RNG_NAME } from '../random/rng';
import { CHUNK_SIZE } from '../replicates/chunks';
import { ENGINE_VERSION } from '../version';
import { runTest } from '../hypothesis/run-test';
import { convergenceSeries } from './convergence';
import type { Problem } from './problem';

/** A number for the response: finite, else null. The response never holds NaN or ±Infinity. */
export function finite(x: number | null | undefined): number | null {
  return typeof x === 'number' && Number.isFinite(x) ? x : null;
}

const IQR_NORMAL = 1.3489795003921634; // 2·Φ⁻¹(0.75)

/**
 * Everything after the replicates: SE, bias, Monte Carlo errors, intervals, jackknife,
 * exact answer, convergence, diagnostics, provenance. Deterministic: the same replicates
 * give the same response, whichever threads drew them.
 *
 * `dataDigest`, when given, is the caller's SHA-256 of canonicalJson(request.data) as lowercase
 * hex (a Node caller computes it with node:crypto, several times faster than the engine's
 * pure-JS hash); otherwise the engine hashes the data itself. Both give the same digest.
 */
export function finalize(problem: Problem, theta: Float64Array, innerSe: Float64Array | null, shouldStop?: () => boolean, dataDigest?: string): EngineResponse {
  const req = problem.request;
  const B = req.B;
  const estimate = problem.statistic.estimate;
  const methods = req.intervals.methods as IntervalMethod[];
  const level = req.intervals.level;

  const sorted = finiteSorted(theta);
  const nonFinite = B - sorted.length;
  const m: Moments | null = sorted.length >= 2 ? moments(sorted) : null;
  const se = m ? m.sd : Number.NaN;
  const seMc = m ? seMonteCarloError(m.sd, m.excessKurtosis, sorted.length) : Number.NaN;
  const robustSe = sorted.length >= 4 ? (quantileSorted(sorted, 0.75) - quantileSorted(sorted, 0.25)) / IQR_NORMAL : Number.NaN;
  const z0 = sorted.length ? biasCorrection(sorted, estimate) : null;

  // Jackknife of the observed data, when BCa, the studentized interval or the output needs it.
  const wantJack = req.include.includes('jackknife') || methods.includes('bca') || (methods.includes('studentized') && req.intervals.studentized.se === 'jackknife');
  const jack: JackknifeOutcome | null = wantJack ? jackknife(problem.statistic, problem.strata, shouldStop) : null;
  const jackknifeUndefined = jack !== null && !Number.isFinite(jack.se);

  // Studentized: t* and se₀ by the same inner method.
  let studentized: IntervalInput['studentized'] = null;
  let studentizedDropped = 0;
  let innerT: Float64Array | null = null;
  let se0: number | null = null;
  if (methods.includes('studentized') && innerSe) {
    const opts = req.intervals.studentized;
    if (opts.se === 'jackknife') se0 = jack && Number.isFinite(jack.se) ? jack.se : null;
    else {
      const counting = problem.scheme.counting!;
      const n = problem.n;
      const ones = new Int32Array(n).fill(1);
      const v = bootstrapSeOfResample(problem.statistic, counting.strata, ones, n, opts.innerB, createRng(req.seed, 'studentized:observed'), new Int32Array(n), new Int32Array(n));
      se0 = Number.isFinite(v) ? v : null;
    }
    innerT = new Float64Array(B);
    for (let b = 0; b < B; b++) innerT[b] = (theta[b] - estimate) / innerSe[b];
    const t = finiteSorted(innerT);
    studentizedDropped = sorted.length - t.length;
    if (se0 !== null) studentized = { sortedT: t, se0 };
  }

  const acceleration = jack && Number.isFinite(jack.acceleration) ? jack.acceleration : null;
  const input: IntervalInput = { level, estimate, sorted, mean: m?.mean ?? Number.NaN, se, seMonteCarloError: seMc, z0, acceleration, studentized };

  const intervals: Partial<Record<IntervalMethod, IntervalResult>> = {};
  const extremeEndpoints: IntervalMethod[] = [];
  const unavailable: { method: IntervalMethod; reason: string }[] = [];
  const endPointErrors: number[] = [];
  for (const method of methods) {
    const r = m && se > 0 ? INTERVALS[method](input) : null;
    if (!r || !Number.isFinite(r.lower) || !Number.isFinite(r.upper)) {
      unavailable.push({ method, reason: reasonFor(method, { m, se, z0, acceleration, studentized, scheme: problem.scheme.counting !== undefined }) });
      intervals[method] = { level, lower: null, upper: null, lowerMonteCarloError: null, upperMonteCarloError: null };
      continue;
    }
    if (r.extreme) extremeEndpoints.push(method);
    endPointErrors.push(r.lowerMonteCarloError, r.upperMonteCarloError);
    intervals[method] = {
      level,
      lower: finite(r.lower),
      upper: finite(r.upper),
      lowerMonteCarloError: finite(r.lowerMonteCarloError),
      upperMonteCarloError: finite(r.upperMonteCarloError),
    };
  }

  let jackknifeOut: JackknifeResult | null = null;
  if (jack) {
    jackknifeOut = { se: finite(jack.se), bias: finite(jack.bias), acceleration: finite(jack.acceleration) };
    if (req.include.includes('jackknife')) {
      jackknifeOut.influence = Array.from(jack.influence, finite);
      jackknifeOut.pseudoValues = Array.from(jack.pseudoValues, finite);
    }
  }

  const exact = exactAnswer(problem.statistic, problem.scheme, problem.statisticDef.name);

  const warnings = diagnose({
    problem,
    B,
    sorted,
    nonFinite,
    moments: m,
    methods,
    level,
    extremeEndpoints,
    unavailable,
    robustSe: finite(robustSe),
    studentizedDropped,
    jackknifeUndefined,
  });

  return {
    estimate,
    B,
    replicatesUsed: sorted.length,
    se: finite(se),
    bias: m ? finite(m.mean - estimate) : null,
    seMonteCarloError: finite(seMc),
    robustSe: finite(robustSe),
    intervals,
    jackknife: jackknifeOut,
    z0: finite(z0),
    exact,
    replicates: req.include.includes('replicates') ? Array.from(theta, finite) : null,
    convergence: req.include.includes('convergence') ? convergenceSeries(theta, innerT, estimate, level, methods, acceleration, se0, finite) : null,
    advice: adviseB(sorted.length, se, m?.excessKurtosis ?? 0, endPointErrors),
    warnings,
    // regression: say whether cases (rows) or residuals were resampled
    scheme: { name: req.scheme.name, ...(req.statistic.name.startsWith('regression-') && req.scheme.name !== 'residual' ? { regression: 'cases' } : {}), ...problem.scheme.details },
    test: runTest(problem),
    provenance: {
      engine: ENGINE_VERSION,
      rng: `${RNG_NAME}; replicates in chunks of ${CHUNK_SIZE}, chunk k seeded with seed + "\\u001fchunk:k"; indices by Lemire's unbiased multiply-and-reject`,
      seed: req.seed,
      dataSha256: dataDigest ?? dataSha256(req.data),
      statistic: problem.description,
      scheme: problem.scheme.description,
      n: problem.n,
      chunkSize: CHUNK_SIZE,
      quantiles: 'replicate quantiles: order statistic (B+1)α, normal-scale interpolation (Davison & Hinkley 1997 eq. 5.8, as R boot)',
      z0Ties: 'z0 = Φ⁻¹((#{θ* < θ̂} + ½#{θ* = θ̂}) / B)',
      ...(methods.includes('studentized')
        ? { studentizedSe: req.intervals.studentized.se === 'bootstrap' ? `nested bootstrap, ${req.intervals.studentized.innerB} inner replicates` : 'jackknife of each resample' }
        : {}),
    },
  };
}

function reasonFor(
  method: IntervalMethod,
  s: { m: Moments | null; se: number; z0: number | null; acceleration: number | null; studentized: IntervalInput['studentized']; scheme: boolean },
): string {
  if (!s.m) return 'fewer than two defined replicates';
  if (!(s.se > 0)) return 'the replicates have no spread';
  if (method === 'bca') {
    if (s.z0 === null) return 'every replicate lies on one side of the estimate, so z0 is infinite';
    if (s.acceleration === null) return 'the jackknife acceleration is undefined';
  }
  if (method === 'studentized') {
    if (!s.scheme) return 'this scheme has no inner standard error';
    if (!s.studentized) return 'the inner standard error of the estimate is undefined';
  }
  return 'an end point is undefined';
}
