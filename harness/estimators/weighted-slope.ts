/**
 * Weighted least-squares slope of y on x, with its standard error from the given standard errors
 * of the y's (taken as known, not re-estimated from the residuals).
 *
 * Method: weights w_i = 1/σ_i²; slope b = Σw(x − x̄)(y − ȳ)/Σw(x − x̄)², x̄ and ȳ weighted means;
 * Var b = 1/Σw(x − x̄)². Common practice (e.g. Bevington and Robinson, 2003, Data Reduction and
 * Error Analysis for the Physical Sciences, 3rd ed., McGraw-Hill, ch. 6).
 */
export interface SlopeEstimate {
  readonly slope: number;
  readonly intercept: number;
  readonly standardError: number;
}

export function weightedSlope(x: readonly number[], y: readonly number[], sigma: readonly number[]): SlopeEstimate {
  if (x.length !== y.length || x.length !== sigma.length || x.length < 2) {
    throw new RangeError('weightedSlope needs at least two points with one standard error each');
  }
  let sw = 0;
  let swx = 0;
  let swy = 0;
  for (let i = 0; i < x.length; i++) {
    const w = 1 / (sigma[i] * sigma[i]);
    sw += w;
    swx += w * x[i];
    swy += w * y[i];
  }
  const xBar = swx / sw;
  const yBar = swy / sw;
  let sxx = 0;
  let sxy = 0;
  for (let i = 0; i < x.length; i++) {
    const w = 1 / (sigma[i] * sigma[i]);
    sxx += w * (x[i] - xBar) * (x[i] - xBar);
    sxy += w * (x[i] - xBar) * (y[i] - yBar);
  }
  const slope = sxy / sxx;
  return { slope, intercept: yBar - slope * xBar, standardError: Math.sqrt(1 / sxx) };
}
