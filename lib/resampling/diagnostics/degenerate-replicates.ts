import type { Diagnostic } from './types';

/** Replicates with no spread (every resample gives the same value), or too few distinct values. */
export const degenerateReplicates: Diagnostic = ({ sorted }) => {
  const B = sorted.length;
  if (B === 0) return { code: 'degenerate-replicates', message: 'No replicate was defined; there is nothing to summarise.' };
  if (sorted[0] === sorted[B - 1]) {
    return { code: 'degenerate-replicates', message: 'Every replicate has the same value, so the SE is 0 and intervals are a single point; the data may have too little variety.' };
  }
  let distinct = 1;
  for (let i = 1; i < B && distinct < 20; i++) if (sorted[i] !== sorted[i - 1]) distinct++;
  if (distinct < 20) {
    return {
      code: 'discrete-replicates',
      message: `The replicates take only ${distinct} distinct values, so interval end points jump between them; report them with that caution.`,
    };
  }
  return null;
};
