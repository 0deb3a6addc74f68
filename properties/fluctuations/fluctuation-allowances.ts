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
 * run by hand): N = 50 with 3·10⁴ samples (real) or 1.8·10⁴ (complex), eigenvectors on 4500 or 2400
 * of them, for GOE, GUE, real Rademacher without diagonal, real Gaussian without diagonal, complex
 * Rademacher; the largest |observed − limit|·N/(g·scale) per kind, over all checks of the kind and
 * all five ensembles, was: resolvent 3.4 (GOE, 2.5 + 0.5i beside the edge), chains 0.5, weighted 1.7,
 * linear 1.3, means 0.8, mesoscopic (·Nη) 0.55, Wick 1.8 (order 6, ±1.0). N = 50 is the smallest size
 * the tests use, and the 1/N² terms make it the worst case; the constants below leave a margin of
 * 1.2 to 3 over those at N = 50 and more at the default N = 200.
 */

/** One-resolvent covariances (tracial). */
export const RESOLVENT_COVARIANCE_CONSTANT = 5;
/** Identity chains. */
export const CHAIN_COVARIANCE_CONSTANT = 3;
/** Weighted one-resolvent covariances (and the Monte Carlo comparison of weighted chains). */
export const WEIGHTED_COVARIANCE_CONSTANT = 4;
/** Linear-statistic covariances without an exact finite-N value. */
export const LINEAR_COVARIANCE_CONSTANT = 4;
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
