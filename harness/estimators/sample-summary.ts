/**
 * Mean and standard error of the mean of independent, identically distributed observations.
 *
 * Method: Welford's one-pass update (B. P. Welford, 1962, "Note on a method for calculating
 * corrected sums of squares and products", Technometrics 4(3), 419–420), which avoids the
 * cancellation of Σx² − (Σx)²/n. The standard error is s/√n with the unbiased sample variance s².
 */
export interface SampleSummary {
  readonly count: number;
  readonly mean: number;
  /** Unbiased sample variance s² (NaN for fewer than two observations). */
  readonly variance: number;
  /** s/√n. */
  readonly standardError: number;
}

export function summariseSample(values: ArrayLike<number>): SampleSummary {
  let mean = 0;
  let m2 = 0;
  const n = values.length;
  for (let k = 0; k < n; k++) {
    const delta = values[k] - mean;
    mean += delta / (k + 1);
    m2 += delta * (values[k] - mean);
  }
  const variance = n > 1 ? m2 / (n - 1) : NaN;
  return { count: n, mean: n > 0 ? mean : NaN, variance, standardError: Math.sqrt(variance / n) };
}
