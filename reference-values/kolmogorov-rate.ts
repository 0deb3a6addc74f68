import type { Citation } from './citation.js';
import { semicircleCdf, semicircleDensity } from './semicircle-law.js';
import { ERDOS_YAU_YIN_2012, GOTZE_TIKHOMIROV_2016, GOTZE_TIKHOMIROV_EMPIRICAL } from './sources.js';

/**
 * The rate at which the spectral distribution of a Wigner matrix approaches the semicircle in
 * Kolmogorov distance D_N = sup_x |F_N(x) − F_sc(x)|, and the slope range a log–log fit of D_N
 * against N may show; with the semicircle quantile function that such checks use.
 *
 * Known rates (normalisation of THEORY.md, entries of variance 1/N):
 * - expected distribution, F_N = E(empirical CDF): D_N = O(N⁻¹) under a fourth-moment condition
 *   and a truncation |X_jk| ≤ D_0 N^{1/4} (Götze and Tikhomirov 2016, PTRF 165; statement
 *   checked against the arXiv abstract 1405.7820). No logarithm.
 * - empirical distribution: D_N = O(N⁻¹ log⁵ N) with high probability, eight moments
 *   (Götze and Tikhomirov, arXiv:1407.2780); O(N⁻¹ (log N)^{O(log log N)}) from eigenvalue
 *   rigidity (Erdős, Yau and Yin 2012, Adv. Math. 229; from memory). Always D_N ≥ 1/(2N): F_N
 *   jumps by ≥ 1/N and F_sc is continuous.
 */
export const KOLMOGOROV_RATE_EXPONENT = -1;

export const KOLMOGOROV_RATE_SOURCES: { readonly expected: readonly Citation[]; readonly empirical: readonly Citation[] } = {
  expected: [GOTZE_TIKHOMIROV_2016],
  empirical: [GOTZE_TIKHOMIROV_EMPIRICAL, ERDOS_YAU_YIN_2012],
};

/** The sizes the fit is designed for. */
export const KOLMOGOROV_FIT_SIZES: readonly number[] = [100, 200, 400, 800];

/** Ordinary least-squares slope of y on x. */
export function leastSquaresSlope(x: readonly number[], y: readonly number[]): number {
  if (x.length !== y.length || x.length < 2) throw new RangeError('leastSquaresSlope: need two or more (x, y) pairs');
  const mx = x.reduce((a, b) => a + b, 0) / x.length;
  const my = y.reduce((a, b) => a + b, 0) / y.length;
  let sxy = 0;
  let sxx = 0;
  for (let i = 0; i < x.length; i++) {
    sxy += (x[i] - mx) * (y[i] - my);
    sxx += (x[i] - mx) ** 2;
  }
  return sxy / sxx;
}

export interface KolmogorovSlopeRange {
  readonly exponent: number;
  /** Admissible interval for the least-squares slope of ln D_N on ln N over `sizes`. */
  readonly lower: number;
  readonly upper: number;
  readonly sizes: readonly number[];
  /** Largest power c of ln N allowed in D_N ≈ A N⁻¹ (ln N)^c. */
  readonly maxLogPower: number;
  /** Slope of ln ln N on ln N over `sizes`: what each unit of c adds to the fitted slope. */
  readonly slopePerLogPower: number;
  /** Largest |r| in a relative correction (1 + r N^{-1/3}). */
  readonly maxRelativeCorrection: number;
  readonly sources: readonly Citation[];
  readonly note: string;
}

/**
 * The slope range of a log–log fit of D_N over `sizes` (default 100, 200, 400, 800).
 *
 * Model: D_N = A N⁻¹ (ln N)^c (1 + r N^{-1/3}), 0 ≤ c ≤ c_max, |r| ≤ r_max. The least-squares slope
 * is linear in ln D, so it equals −1 + c·S_1 + S_2(r), S_1 = slope of ln ln N (a weighted mean of
 * d ln ln N/d ln N = 1/ln N, ≈ 0.18 over 100…800, i.e. −1 + c/ln N ≈ −1 + c/5.6) and S_2(r) the
 * slope of ln(1 + r N^{-1/3}), decreasing in r, so the extremes are at c ∈ {0, c_max}, r = ±r_max.
 * Choices:
 * - c_max = 0 for the expected distribution: the O(N⁻¹) bound of Götze and Tikhomirov has no log.
 *   c_max = 1 for the empirical one: the counting function N(F_N − F_sc)(x) fluctuates by
 *   O(√ln N) at each x and its supremum over x, a log-correlated field's maximum, is of order
 *   ln N (heuristic, common practice); D_N ≈ (a + b ln N)/N with a, b ≥ 0 then has local slope
 *   −1 + b/(a + b ln N) ≤ −1 + 1/ln N. The proven log⁵ N bound would allow −1 + 5·0.18 ≈ −0.1 and
 *   would not separate a correct rate from N^{-1/2}; it is not used.
 * - r_max = 1: finite-N corrections from the spectral edges, where the N^{-2/3} Tracy–Widom scale
 *   makes relative corrections of order N^{-1/3} (common practice; the GUE case is checked
 *   deterministically in the test, from the exact finite-N density).
 * Over N = 100, 200, 400, 800: S_1 = 0.179, S_2(±1) = −0.0446 / +0.0617, so the range is
 * [−1.045, −0.938] for the expected and [−1.045, −0.759] for the empirical distribution. The exact
 * GUE expected distance (Hermite kernel, in the test) has N·D_N ≈ 0.031 and slope ≈ −0.995.
 * Not included: sampling error of D_N, and for the expected distribution estimated from M samples
 * the upward bias of the supremum, of order (MN)^{-1/2}, which must stay well below 1/N (M ≫ N) or
 * be allowed for by the caller.
 */
export function kolmogorovSlopeRange(
  kind: 'expected' | 'empirical',
  sizes: readonly number[] = KOLMOGOROV_FIT_SIZES,
): KolmogorovSlopeRange {
  if (sizes.length < 2 || sizes.some((n) => !(n > 8))) throw new RangeError('kolmogorovSlopeRange: need two or more sizes > 8');
  const maxLogPower = kind === 'expected' ? 0 : 1;
  const maxRelativeCorrection = 1;
  const logN = sizes.map(Math.log);
  const slopePerLogPower = leastSquaresSlope(logN, logN.map(Math.log));
  const correction = (r: number): number => leastSquaresSlope(logN, sizes.map((n) => Math.log1p(r * n ** (-1 / 3))));
  return {
    exponent: KOLMOGOROV_RATE_EXPONENT,
    lower: KOLMOGOROV_RATE_EXPONENT + correction(maxRelativeCorrection),
    upper: KOLMOGOROV_RATE_EXPONENT + maxLogPower * slopePerLogPower + correction(-maxRelativeCorrection),
    sizes: sizes.slice(),
    maxLogPower,
    slopePerLogPower,
    maxRelativeCorrection,
    sources: KOLMOGOROV_RATE_SOURCES[kind],
    note:
      kind === 'expected'
        ? 'D_N = O(1/N) (Götze and Tikhomirov 2016); range allows relative corrections (1 ± N^{-1/3}) (common practice); sampling error not included'
        : 'D_N ≈ (a + b ln N)/N assumed, c ≤ 1 (heuristic, common practice; proven: O(log⁵N/N) w.h.p.); relative corrections (1 ± N^{-1/3}); sampling error not included',
  };
}

/**
 * Q(p) = F_sc⁻¹(p) on [0, 1]: Q(0) = −2, Q(1/2) = 0, Q(1) = 2, Q(1 − p) = −Q(p).
 *
 * Method: solve F(x) = p for p ≤ 1/2 (the other half by symmetry) by Newton's method with a
 * bisection safeguard (W. H. Press et al., 2007, Numerical Recipes, 3rd ed., Cambridge University
 * Press, §9.4, routine rtsafe; section from memory): the bracket [lo, hi] ⊂ [−2, 0] shrinks at each
 * step, and a Newton step that leaves it (or meets ρ = 0) is replaced by bisection. Start: x = −2 + (3πp/2)^{2/3}, from F(−2 + t) ≈ 2t^{3/2}/(3π).
 * Accurate to a few ulps of x (|F(Q(p)) − p| ≤ ρ(Q)·ulp plus F's rounding; tested).
 */
export function semicircleQuantile(p: number): number {
  if (Number.isNaN(p)) return NaN;
  if (p < 0 || p > 1) throw new RangeError(`semicircleQuantile: p must lie in [0, 1], got ${p}`);
  if (p > 0.5) return -semicircleQuantile(1 - p);
  if (p === 0) return -2;
  if (p === 0.5) return 0;
  let lo = -2;
  let hi = 0;
  let x = Math.min(-2 + ((3 * Math.PI * p) / 2) ** (2 / 3), -1e-3);
  for (let iteration = 0; iteration < 200; iteration++) {
    const residual = semicircleCdf(x) - p;
    if (residual === 0) return x;
    if (residual < 0) lo = x;
    else hi = x;
    const density = semicircleDensity(x);
    let next = density > 0 ? x - residual / density : NaN;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (next === x || hi - lo <= 2 * Number.EPSILON * Math.abs(x)) return next;
    x = next;
  }
  return x;
}
