import type { EnsembleConstants } from '../../harness/numeric/ensemble.js';

/**
 * Finite-N allowances of the fluctuation checks: C·g/N (C·g/(Nη) at the mesoscopic scale) times the
 * natural size of the compared quantity. Their form follows the known 1/N corrections (THEORY.md:
 * two-resolvent deviations (0.3–0.6)/N; GOE chains O(1/N); the Wick fourth cumulant a few per cent of
 * the pairing sum at N = 200–800; joint cumulants of order ≥ 3 O(1/N) for macroscopic statistics;
 * the GOE 1/N loop term at mesoscopic scales). The factor g = 1 + |κ4| + |σ_d² − 2/β| grows with the
 * non-Gaussian terms of the limit, whose own 1/N corrections do not cancel when the terms themselves
 * nearly do (THEORY.md: non-Gaussian entries converge more slowly; allow a constant that grows with
 * the entries' higher moments); g = 1 for GOE and GUE.
 *
 * Calibration (our own simulation with the reference engine; test/properties/fluctuation-calibration.test.ts,
 * run by hand): N = 50, seed 97, 3·10⁴ samples for a real ensemble and 1.8·10⁴ for a complex one
 * (eigenvectors on 4500 and 2400 of them), for GOE, GUE, real Rademacher without diagonal, real
 * Gaussian without diagonal and complex Rademacher with σ_d² = 1. The largest |observed − limit|
 * in units of g·scale/N, over every check of a kind and all five ensembles (± its sampling error):
 * resolvent 3.4 ± 0.4 (GOE, 2.5 + 0.5i beside the edge), chains 0.6 ± 0.4, weighted 1.7 ± 0.7,
 * linear 3.0 ± 0.3 (complex Rademacher, Var Tr H⁴), means 0.5 ± 0.4, mesoscopic (in units of
 * g·scale/(Nη)) 0.7 (GOE at N/4 = 16), Wick 1.8 ± 1.0 (order 6). N = 50 is below the sizes the
 * tests use (80, and 32 for the false-alarm count, which the allowances pass) and far below the
 * default 200, where the terms beyond 1/N have shrunk; the constants leave margins of 1.5 to 5 at N = 50.
 */

/** One-resolvent covariances (tracial). */
export const RESOLVENT_COVARIANCE_CONSTANT = 5;
/** Identity chains. */
export const CHAIN_COVARIANCE_CONSTANT = 3;
/** Weighted one-resolvent covariances (and the Monte Carlo comparison of weighted chains). */
export const WEIGHTED_COVARIANCE_CONSTANT = 4;
/**
 * The summed shift-weighted covariances Σ_k Cov(Tr G(3i)P^k, ·): for GOE their 1/N correction adds
 * up over the eight shifts while the noise does not, and a run at N = 100 with 900 samples measured
 * −3.5 ± 1.4 in units of scale/N (the terms of the transposed pairing); hence its own constant.
 */
export const SHIFT_COVARIANCE_CONSTANT = 8;
/** Linear-statistic covariances without an exact finite-N value. */
export const LINEAR_COVARIANCE_CONSTANT = 6;
/** Mean corrections: the O(1/N) remainder, relative to the statistic's standard deviation. */
export const MEAN_CORRECTION_CONSTANT = 2.5;
/** Mesoscopic variance and cross-covariance, relative to the variance, per 1/(Nη). */
export const MESOSCOPIC_CONSTANT = 1.6;
/** Joint cumulants of order 3, 4 and 6, relative to Π √E|X_i − EX_i|². */
export const WICK_CONSTANT = 4;
/** The contour quadrature's error, relative: far below any sampling error (contour-quadrature.ts). */
export const QUADRATURE_ALLOWANCE = 1e-9;

/** g = 1 + |κ4| + |σ_d² − 2/β|: the size of the non-Gaussian terms (1 for GOE and GUE). */
export function nonGaussianFactor(c: EnsembleConstants): number {
  return 1 + Math.abs(c.kappa4) + Math.abs(c.diagonalVariance - 2 / c.beta);
}
