export interface LeastSquaresLine {
  intercept: number;
  slope: number;
  fitted: Float64Array;
  residuals: Float64Array;
  /** leverages h_i = 1/n + (x_i − x̄)² / Sxx, the diagonal of the hat matrix */
  leverages: Float64Array;
}

/**
 * Least-squares line y = a + b x, with fitted values, residuals and leverages.
 *
 *   b = Sxy / Sxx,  a = ȳ − b x̄,  ŷ_i = a + b x_i,  e_i = y_i − ŷ_i,
 *   h_i = 1/n + (x_i − x̄)² / Sxx
 *
 * Reference: Weisberg, S. (2005), "Applied Linear Regression", 3rd ed., §2.2 and §8.1.2;
 * the same values as R's lm(), fitted(), residuals() and hatvalues().
 *
 * Cost: O(n), two passes. Throws RangeError for unequal lengths, n < 3 or all x equal.
 */
export function leastSquaresLine(x: ArrayLike<number>, y: ArrayLike<number>): LeastSquaresLine {
  const n = x.length;
  if (y.length !== n) throw new RangeError('x and y must have the same length');
  if (n < 3) throw new RangeError('a regression line needs at least 3 points');
  let sx = 0;
  let sy = 0;
  for (let i = 0; i < n; i++) {
    sx += x[i];
    sy += y[i];
  }
  const mx = sx / n;
  const my = sy / n;
  let sxx = 0;
  let sxy = 0;
  for (let i = 0; i < n; i++) {
    const dx = x[i] - mx;
    sxx += dx * dx;
    sxy += dx * (y[i] - my);
  }
  if (!(sxx > 0)) throw new RangeError('all x values are equal: no regression line can be fitted');
  const slope = sxy / sxx;
  const intercept = my - slope * mx;
  const fitted = new Float64Array(n);
  const residuals = new Float64Array(n);
  const leverages = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    fitted[i] = intercept + slope * x[i];
    residuals[i] = y[i] - fitted[i];
    leverages[i] = 1 / n + ((x[i] - mx) * (x[i] - mx)) / sxx;
  }
  return { intercept, slope, fitted, residuals, leverages };
}
