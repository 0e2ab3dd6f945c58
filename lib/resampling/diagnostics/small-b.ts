import type { Diagnostic } from './types';

/**
 * B too small for what was asked. Common practice: about 100–200 replicates are usually
 * enough for a standard error, while interval end points need 1,000–2,000 or more
 * (Efron & Tibshirani 1993, §6.4, §19.3); an end point at an extreme order statistic
 * ((B + 1)α outside (1, B), as R's boot warns) is a sure sign.
 */
export const smallB: Diagnostic = ({ B, methods, extremeEndpoints }) => {
  const quantileMethods = methods.filter((m) => m !== 'normal');
  if (extremeEndpoints.length) {
    return {
      code: 'small-b',
      message: `B = ${B} is too small for the ${extremeEndpoints.join(', ')} interval at this level: an end point is the most extreme replicate. Use B ≥ 2000.`,
    };
  }
  if (quantileMethods.length && B < 1000) {
    return { code: 'small-b', message: `B = ${B} is small for ${quantileMethods.join(', ')} intervals; common practice is B ≥ 1000–2000 for interval end points.` };
  }
  if (B < 100) return { code: 'small-b', message: `B = ${B} is small even for a standard error; common practice is at least 100–200.` };
  return null;
};
