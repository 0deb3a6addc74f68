/**
 * Running means and variances of several real statistics observed together on each sample, as
 * plain data so that a block's tally crosses to a worker thread or into a shard file unchanged.
 * Memory does not grow with the number of samples.
 */
export interface MeanTally {
  readonly count: number;
  readonly mean: Float64Array;
  /** Σ (x − x̄)² per statistic. */
  readonly m2: Float64Array;
}

export function emptyMeanTally(width: number): MeanTally {
  return { count: 0, mean: new Float64Array(width), m2: new Float64Array(width) };
}

/**
 * The tally with one more sample, by Welford's update (B. P. Welford, 1962, Technometrics 4(3),
 * 419–420). Updates `tally`'s arrays in place and returns the new count with them.
 */
export function addToMeanTally(tally: MeanTally, values: ArrayLike<number>): MeanTally {
  const n = tally.count + 1;
  const { mean, m2 } = tally;
  for (let j = 0; j < mean.length; j++) {
    const delta = values[j] - mean[j];
    mean[j] += delta / n;
    m2[j] += delta * (values[j] - mean[j]);
  }
  return { count: n, mean, m2 };
}

/**
 * The tally of two disjoint sets of samples, by the pairwise update of T. F. Chan, G. H. Golub and
 * R. J. LeVeque (1979, "Updating formulae and a pairwise algorithm for computing sample variances",
 * Stanford report STAN-CS-79-773; eq. 2.1 there): n = nA + nB, δ = x̄B − x̄A, x̄ = x̄A + δ·nB/n,
 * M2 = M2A + M2B + δ²·nA·nB/n. A pure function: the same two tallies give the same bits.
 */
export function combineMeanTallies(left: MeanTally, right: MeanTally): MeanTally {
  if (left.count === 0) return { count: right.count, mean: right.mean.slice(), m2: right.m2.slice() };
  if (right.count === 0) return { count: left.count, mean: left.mean.slice(), m2: left.m2.slice() };
  const n = left.count + right.count;
  const mean = new Float64Array(left.mean.length);
  const m2 = new Float64Array(left.mean.length);
  for (let j = 0; j < mean.length; j++) {
    const delta = right.mean[j] - left.mean[j];
    mean[j] = left.mean[j] + (delta * right.count) / n;
    m2[j] = left.m2[j] + right.m2[j] + (delta * delta * left.count * right.count) / n;
  }
  return { count: n, mean, m2 };
}

/** Standard error of the mean of statistic j, s/√n with the unbiased sample variance. */
export function standardErrorOfMean(tally: MeanTally, j: number): number {
  return tally.count > 1 ? Math.sqrt(tally.m2[j] / (tally.count - 1) / tally.count) : NaN;
}
