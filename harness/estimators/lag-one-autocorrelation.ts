/** A lag-1 autocorrelation with what independence predicts for it. */
export interface AutocorrelationEstimate {
  readonly estimate: number;
  /** E r1 = −1/K for independent, identically distributed samples. */
  readonly expectedUnderIndependence: number;
  /** √(1/K), the standard deviation of r1 under independence. */
  readonly standardError: number;
  readonly count: number;
}

/**
 * The lag-1 sample autocorrelation r1 = Σ_{t<K} (x_t − x̄)(x_{t+1} − x̄) / Σ_t (x_t − x̄)² of a
 * series in the order the samples were produced. For independent, identically distributed samples
 * with a finite variance, √K (r1 + 1/K) is asymptotically standard normal, so a value many 1/√K
 * away from −1/K says consecutive samples are dependent (a reused random stream, a sampler with
 * state leaking between draws).
 *
 * References: M. S. Bartlett, 1946, "On the theoretical specification and sampling properties of
 * autocorrelated time-series", J. Roy. Statist. Soc. Suppl. 8(1), 27–41; G. E. P. Box, G. M. Jenkins
 * and G. C. Reinsel, Time Series Analysis: Forecasting and Control (the white-noise bands ±z/√K;
 * section from memory). E r1 = −1/K + O(K⁻²) for white noise: R. L. Anderson, 1942, Ann. Math.
 * Statist. 13, 1–13 (from memory).
 */
export function lagOneAutocorrelation(x: ArrayLike<number>): AutocorrelationEstimate {
  const n = x.length;
  if (n < 3) throw new RangeError('lagOneAutocorrelation: at least three samples are needed');
  let mean = 0;
  for (let t = 0; t < n; t++) mean += x[t];
  mean /= n;
  let lagged = 0;
  let total = 0;
  for (let t = 0; t < n; t++) {
    const d = x[t] - mean;
    total += d * d;
    if (t + 1 < n) lagged += d * (x[t + 1] - mean);
  }
  return { estimate: total > 0 ? lagged / total : NaN, expectedUnderIndependence: -1 / n, standardError: Math.sqrt(1 / n), count: n };
}
