import type { Diagnostic } from './types';

const DEPENDENT = ['cluster', 'moving-block', 'stationary'];

/**
 * Under the cluster and block schemes the engine's jackknife still leaves out one row at a
 * time, which treats the rows as independent — exactly what these schemes do not assume.
 * BCa's acceleration and the jackknife output then ignore the clusters or the serial
 * dependence (a delete-a-cluster or block jackknife would be needed: Davison & Hinkley 1997,
 * §3.8 and §8.2). Says so when either is asked for.
 */
export const dependentJackknife: Diagnostic = ({ problem, methods }) => {
  const scheme = problem.request.scheme.name;
  if (!DEPENDENT.includes(scheme)) return null;
  const uses = [methods.includes('bca') ? 'the BCa acceleration' : null, problem.request.include.includes('jackknife') ? 'the jackknife output' : null].filter(Boolean);
  if (!uses.length) return null;
  return {
    code: 'jackknife-rows',
    message: `${uses.join(' and ')} ${uses.length > 1 ? 'come' : 'comes'} from leaving out one row at a time, which ignores the ${scheme === 'cluster' ? 'clusters' : 'serial dependence'} the ${scheme} scheme allows for; read the BCa interval as approximate and compare it with the percentile interval.`,
  };
};
