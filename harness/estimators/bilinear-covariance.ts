import type { Complex } from '../numeric/complex.js';

/** A covariance estimate with its standard error per component. */
export interface CovarianceEstimate {
  readonly estimate: Complex;
  /** Standard error of Re and Im of the estimate. */
  readonly standardError: Complex;
  readonly count: number;
}

/**
 * The bilinear covariance Cov(X, Y) = E[XY] − E[X]E[Y] (no conjugation) of two complex statistics
 * observed together on K independent samples, with a delta-method standard error.
 *
 * Samples are complex interleaved: x[2k], x[2k + 1] are Re and Im of X on sample k.
 *
 * Method: ĉ = (1/(K − 1)) Σ_k (x_k − x̄)(y_k − ȳ). To first order ĉ − c is the mean of the
 * centred products p_k = (x_k − μx)(y_k − μy) minus c (the error in the means enters at second
 * order), so Var ĉ ≈ Var(p)/K: the standard error of each component is the sample standard
 * deviation of that component of p_k = (x_k − x̄)(y_k − ȳ) over √K (the delta method; e.g. A. W.
 * van der Vaart, 1998, Asymptotic Statistics, Cambridge University Press, ch. 3). It needs finite
 * fourth moments and independent samples (the fluctuation suite checks the latter separately).
 */
export function bilinearCovariance(x: Float64Array, y: Float64Array): CovarianceEstimate {
  return summedBilinearCovariance([[x, y]]);
}

/**
 * Σ_j Cov(X_j, Y_j) over several pairs observed on the same K samples, with the delta-method
 * standard error of the sum: the per-sample sums of centred products p_k = Σ_j (x_jk − x̄_j)(y_jk − ȳ_j)
 * carry the dependence between the pairs, so SE = sd(p)/√K per component, as for one pair. Summing
 * the covariances of statistics that are independent of each other (or nearly) averages their noise
 * while their signals add.
 */
export function summedBilinearCovariance(pairs: ReadonlyArray<readonly [Float64Array, Float64Array]>): CovarianceEstimate {
  if (pairs.length === 0) throw new RangeError('summedBilinearCovariance: at least one pair is needed');
  const length = pairs[0][0].length;
  for (const [x, y] of pairs) {
    if (x.length !== length || y.length !== length || length % 2 !== 0) {
      throw new RangeError('bilinearCovariance: x and y need the same even length (complex interleaved)');
    }
  }
  const n = length / 2;
  if (n < 2) throw new RangeError('bilinearCovariance: at least two samples are needed');
  const means = pairs.map(([x, y]) => [...complexMean(x), ...complexMean(y)]);
  // Welford on the two components of the summed centred products.
  let meanRe = 0;
  let meanIm = 0;
  let m2Re = 0;
  let m2Im = 0;
  for (let k = 0; k < n; k++) {
    let pr = 0;
    let pi = 0;
    pairs.forEach(([x, y], j) => {
      const [xr, xi, yr, yi] = means[j];
      const ar = x[2 * k] - xr;
      const ai = x[2 * k + 1] - xi;
      const br = y[2 * k] - yr;
      const bi = y[2 * k + 1] - yi;
      pr += ar * br - ai * bi;
      pi += ar * bi + ai * br;
    });
    const dr = pr - meanRe;
    const di = pi - meanIm;
    meanRe += dr / (k + 1);
    meanIm += di / (k + 1);
    m2Re += dr * (pr - meanRe);
    m2Im += di * (pi - meanIm);
  }
  const unbiased = n / (n - 1);
  return {
    estimate: { re: meanRe * unbiased, im: meanIm * unbiased },
    standardError: { re: Math.sqrt(m2Re / (n - 1) / n), im: Math.sqrt(m2Im / (n - 1) / n) },
    count: n,
  };
}

/** The mean of complex interleaved samples, as [re, im]. */
export function complexMean(x: Float64Array): [number, number] {
  const n = x.length / 2;
  let re = 0;
  let im = 0;
  for (let k = 0; k < n; k++) {
    re += x[2 * k];
    im += x[2 * k + 1];
  }
  return [re / n, im / n];
}
