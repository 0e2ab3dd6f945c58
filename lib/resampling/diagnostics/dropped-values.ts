import type { Diagnostic } from './types';

/** Rows left out because a value the statistic or scheme needs was missing or non-finite. */
export const droppedValues: Diagnostic = ({ problem }) => {
  if (!problem.dropped) return null;
  const r = problem.dropped;
  return {
    code: 'non-finite-dropped',
    message: `${r} row${r === 1 ? ' was' : 's were'} left out because of missing or non-finite values (in ${problem.droppedColumns.join(', ')}); the results use the remaining ${problem.n} rows.`,
  };
};
