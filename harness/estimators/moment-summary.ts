/**
 * Mean, variance and fourth central moment of independent, identically distributed observations,
 * with the standard errors of the mean and of the variance: what a later sample needs to be
 * compared with this one by two-sample tests without keeping the observations.
 */
export interface MomentSummary {
  readonly count: number;
  readonly mean: number;
  /** Unbiased sample variance s². */
  readonly variance: number;
  /** m₄ = (1/n) Σ (x − x̄)⁴. */
  readonly fourthCentralMoment: number;
}

/**
 * Method: two passes (the mean first, then centred sums), which keeps the cancellation of the
 * one-pass formulas out of the fourth moment (common practice).
 */
export function summariseMoments(values: ArrayLike<number>): MomentSummary {
  const n = values.length;
  if (n < 2) throw new RangeError('summariseMoments: at least two observations are needed');
  let sum = 0;
  for (let k = 0; k < n; k++) sum += values[k];
  const mean = sum / n;
  let m2 = 0;
  let m4 = 0;
  for (let k = 0; k < n; k++) {
    const d2 = (values[k] - mean) ** 2;
    m2 += d2;
    m4 += d2 * d2;
  }
  return { count: n, mean, variance: m2 / (n - 1), fourthCentralMoment: m4 / n };
}

/** s/√n. */
export function meanStandardError(summary: MomentSummary): number {
  return Math.sqrt(summary.variance / summary.count);
}

/**
 * The standard error of the sample variance, √((m₄ − s⁴)/n): Var(s²) = (μ₄ − σ⁴)/n + O(1/n²) for
 * any law with a finite fourth moment (H. Cramér, 1946, Mathematical Methods of Statistics,
 * Princeton University Press, §27.4; section from memory), with the moments replaced by their
 * estimates. Unlike the F-test's, it does not assume normal observations.
 */
export function varianceStandardError(summary: MomentSummary): number {
  return Math.sqrt(Math.max(0, summary.fourthCentralMoment - summary.variance ** 2) / summary.count);
}
