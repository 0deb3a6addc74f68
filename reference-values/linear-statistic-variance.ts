import { type Complex, complex } from '../harness/numeric/complex.js';
import type { EnsembleConstants } from '../harness/numeric/ensemble.js';
import { chebyshevCoefficients } from './chebyshev.js';

/**
 * Limiting variance and covariance of linear eigenvalue statistics Tr f(H) of a Wigner matrix
 * (THEORY.md, "Fluctuations: linear statistics"). With f = Σ_k c_k(f) T_k(x/2) on [−2, 2]
 * (chebyshev.ts),
 *
 *   lim Cov(Tr f(H), Tr g(H)) = (1/(2β)) Σ_{k≥1} k c_k(f)c_k(g) + (σ_d² − 2/β) c_1(f)c_1(g)/4
 *                               + κ4 c_2(f)c_2(g)/2,
 *
 * the polarisation of the variance formula (it is a symmetric bilinear form in f and g, so
 * Cov = (Var(f + g) − Var(f − g))/4 holds term by term). Checks: f = x (c_1 = 2) gives σ_d²;
 * f = x² (c_2 = 2) gives 4/β + 2κ4. Complex f, g (e.g. e^{itx}) are handled bilinearly by
 * splitting into real and imaginary parts (`complexLinearStatisticCovariance`).
 *
 * Method: c_0 … c_K by `chebyshevCoefficients` (trapezoid rule in θ, full double precision for f
 * analytic on a neighbourhood of [−2, 2]; Trefethen and Weideman 2014, SIAM Rev. 56). K starts at
 * 16 and doubles until the upper half of Σ_k k(c_k(f)² + c_k(g)²) is below 4ε times the whole
 * (it bounds twice the neglected Σ k|c_k(f)c_k(g)|, and the coefficients of such f decay
 * geometrically, so the neglected tail is far smaller still), up to K = 8192; a function for which
 * that fails (not smooth enough for the theorem's hypotheses to give a finite, rapidly converging
 * series) is a RangeError.
 *
 * References: K. Johansson, 1998, Duke Math. J. 91(1), 151–204 (Gaussian ensembles);
 * Z. D. Bai and J. Yao, 2005, Bernoulli 11(6), 1059–1092, and A. Lytova and L. Pastur, 2009,
 * Ann. Probab. 37(5), 1778–1840 (general Wigner matrices); THEORY.md gives the form above
 * (sources.ts: JOHANSSON_1998, BAI_YAO_2005, LYTOVA_PASTUR_2009).
 */

const FIRST_ORDER = 16;
const MAX_ORDER = 8192;

/** Σ_{k≥1} k c_k(f)c_k(g) with the first two coefficient products, to convergence (see the module note). */
function chebyshevPairing(f: (x: number) => number, g: (x: number) => number): { sum: number; c1: number; c2: number } {
  for (let K = FIRST_ORDER; K <= MAX_ORDER; K *= 2) {
    const a = chebyshevCoefficients(f, K);
    const b = f === g ? a : chebyshevCoefficients(g, K);
    let sum = 0;
    let magnitude = 0;
    let tail = 0;
    for (let k = 1; k <= K; k++) {
      sum += k * a[k] * b[k];
      // Σ k(a_k² + b_k²) bounds 2Σ k|a_k b_k| and stays meaningful when the products cancel
      // exactly (f odd, g even: every a_k b_k is 0 and the products are rounding noise).
      const size = k * (a[k] * a[k] + b[k] * b[k]);
      magnitude += size;
      if (2 * k > K) tail += size;
    }
    if (tail <= 4 * Number.EPSILON * magnitude) return { sum, c1: a[1] * b[1], c2: a[2] * b[2] };
  }
  throw new RangeError(
    `linear-statistic covariance: the Chebyshev series Σ k c_k² did not converge with ${MAX_ORDER} terms; f must be analytic on a neighbourhood of [−2, 2]`,
  );
}

/** lim Cov(Tr f(H), Tr g(H)) for real f, g (module note). */
export function linearStatisticCovariance(f: (x: number) => number, g: (x: number) => number, c: EnsembleConstants): number {
  const { sum, c1, c2 } = chebyshevPairing(f, g);
  return sum / (2 * c.beta) + ((c.diagonalVariance - 2 / c.beta) * c1) / 4 + (c.kappa4 * c2) / 2;
}

/** lim Var(Tr f(H)) = (1/(2β)) Σ_{k≥1} k c_k² + (σ_d² − 2/β) c_1²/4 + κ4 c_2²/2. */
export function linearStatisticVariance(f: (x: number) => number, c: EnsembleConstants): number {
  return linearStatisticCovariance(f, f, c);
}

/**
 * lim Cov(Tr f(H), Tr g(H)) for complex-valued f, g, bilinear (no conjugation):
 * Cov(f_r + i f_i, g_r + i g_i) = Cov(f_r, g_r) − Cov(f_i, g_i) + i (Cov(f_r, g_i) + Cov(f_i, g_r)).
 * For the variance of |·|-type, E|X|², pass g = conj f.
 */
export function complexLinearStatisticCovariance(f: (x: number) => Complex, g: (x: number) => Complex, c: EnsembleConstants): Complex {
  const fr = (x: number): number => f(x).re;
  const fi = (x: number): number => f(x).im;
  const gr = (x: number): number => g(x).re;
  const gi = (x: number): number => g(x).im;
  return complex(
    linearStatisticCovariance(fr, gr, c) - linearStatisticCovariance(fi, gi, c),
    linearStatisticCovariance(fr, gi, c) + linearStatisticCovariance(fi, gr, c),
  );
}

/**
 * Exact finite-N variances of Tr H^p for GOE and GUE (normalised entries, THEORY.md "Exact
 * finite-N moments"), as polynomials in 1/N, coefficients of N^0, N^{−1}, …:
 *   GOE Var Tr H³ = 24 + 54/N + 42/N²,  Var Tr H⁴ = 72 + 304/N + 664/N² + 496/N³;
 *   GUE Var Tr H³ = 12 + 3/N²,          Var Tr H⁴ = 36 + 60/N².
 * Source: THEORY.md, obtained there by exact Wick enumeration (Isserlis 1918, Biometrika 12); the
 * test re-derives every coefficient by Wick enumeration over the two traces. The constant terms
 * are the limits of `linearStatisticVariance` (x³ = 2T_3(x/2) + 6T_1(x/2), x⁴ = 2T_4(x/2) + 8T_2(x/2) + 6).
 */
const EXACT_POWER_VARIANCES: Readonly<Record<'goe' | 'gue', Readonly<Record<3 | 4, readonly number[]>>>> = {
  goe: { 3: [24, 54, 42], 4: [72, 304, 664, 496] },
  gue: { 3: [12, 0, 3], 4: [36, 0, 60] },
};

/** The coefficients of Var Tr H^p in powers of 1/N (see `exactLinearStatisticVariance`). */
export function exactPowerVarianceCoefficients(ensemble: 'goe' | 'gue', power: 3 | 4): readonly number[] {
  return EXACT_POWER_VARIANCES[ensemble][power];
}

/** Exact Var Tr H^p for GOE or GUE of size N ≥ 1, p = 3 or 4 (Horner in 1/N). */
export function exactLinearStatisticVariance(ensemble: 'goe' | 'gue', power: 3 | 4, N: number): number {
  if (!Number.isInteger(N) || N < 1) throw new RangeError(`exactLinearStatisticVariance: N must be a positive integer, got ${N}`);
  const coefficients = exactPowerVarianceCoefficients(ensemble, power);
  let value = 0;
  for (let j = coefficients.length - 1; j >= 0; j--) value = value / N + coefficients[j];
  return value;
}
