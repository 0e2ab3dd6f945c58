import type { Diagnostic } from './types';

/**
 * A group of a two-group comparison whose values are all equal: resampling within it always
 * gives the same value, so it contributes nothing to the SE and intervals understate the
 * uncertainty of that group's statistic.
 */
export const zeroVarianceGroup: Diagnostic = ({ problem }) => {
  const groups = problem.data.group;
  if (!groups || !problem.groupLevels) return null;
  for (const [role, values] of Object.entries(problem.data.values)) {
    for (const g of [0, 1]) {
      let first: number | null = null;
      let constant = true;
      for (let i = 0; i < values.length && constant; i++) {
        if (groups[i] !== g) continue;
        if (first === null) first = values[i];
        else if (values[i] !== first) constant = false;
      }
      if (constant && first !== null) {
        const column = problem.columnOf?.(role) ?? role;
        return {
          code: 'zero-variance-group',
          message: `All values of ${column} in group "${problem.groupLevels[g]}" are equal (${first}): resampling that group never varies it, so the standard error and intervals leave out its uncertainty. Check the data, or collect more values for that group.`,
        };
      }
    }
  }
  return null;
};
