// Two-group permutation tests: exact enumeration or Monte Carlo. Pure functions; the
// random source is passed in; no Node or DOM APIs.
export { PermutationError } from './permutation-error';
export { countRelabellings } from './count-relabellings';
export { asExtreme, TIE_TOLERANCE, type Alternative } from './as-extreme';
export {
  permutationTest,
  type PermutationOptions,
  type PermutationResult,
  type TwoGroupStatistic,
} from './permutation-test';
