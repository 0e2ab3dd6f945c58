import { serialDependence } from '../dependence';
import type { Diagnostic } from './types';

const BLOCK_SCHEMES = ['moving-block', 'stationary', 'cluster'];

/**
 * Serial correlation in row order: the lag-1 autocorrelation r₁ of each numeric column
 * (within each group for two-group statistics) is compared with ±2/√n (common practice:
 * the approximate 95% band under independence, Bartlett 1946). Beyond it, rows are not
 * exchangeable and resampling them one by one understates the SE — for an AR(1) series the
 * SE of the mean is σ/√n · √((1 + φ)/(1 − φ)) asymptotically, not σ/√n. Suggests a block
 * scheme. Silent under the block and cluster schemes, which allow for dependence.
 */
export const serialCorrelation: Diagnostic = ({ problem }) => {
  if (BLOCK_SCHEMES.includes(problem.request.scheme.name)) return null;
  const groups = problem.data.group;
  const series: { role: string; values: Float64Array }[] = [];
  for (const [role, values] of Object.entries(problem.data.values)) {
    if (!groups) series.push({ role, values });
    else for (const g of [0, 1]) series.push({ role, values: values.filter((_, i) => groups[i] === g) });
  }
  let worst: { role: string; r1: number; threshold: number } | null = null;
  for (const s of series) {
    const d = serialDependence(s.values);
    if (d.clearlyNonZero && d.r1 !== null && (!worst || Math.abs(d.r1) > Math.abs(worst.r1))) worst = { role: s.role, r1: d.r1, threshold: d.threshold };
  }
  if (!worst) return null;
  const column = problem.columnOf?.(worst.role) ?? worst.role;
  return {
    code: 'serial-correlation',
    message: `The lag-1 autocorrelation of ${column} in row order is ${worst.r1.toFixed(2)}, beyond ±2/√n = ±${worst.threshold.toFixed(2)} (a common rule of thumb): neighbouring rows are not independent, and resampling rows one at a time understates the standard error. If the rows are a series in time or space, use the moving-block or stationary scheme with block length "auto".`,
  };
};
