import { type Complex, add, complex, div, mul, scale, sub } from '../harness/numeric/complex.js';
import type { EnsembleConstants } from '../harness/numeric/ensemble.js';
import { chebyshevCoefficients } from './chebyshev.js';
import { stieltjesSemicircle } from './semicircle-law.js';

/**
 * The 1/N terms of the means of spectral statistics of Wigner matrices, and exact finite-N even
 * moments of GOE and GUE. Normalisation as in THEORY.md, "Conventions": off-diagonal
 * E|h_ij|² = 1/N, Var h_ii = σ_d²/N, κ4 the normalised fourth cumulant, ⟨X⟩ = Tr X/N.
 *
 * References:
 * - Z. D. Bai and J. Yao, 2005, Bernoulli 11(6), 1059–1092: the mean of the limiting spectral
 *   empirical process of a Wigner matrix (the 1/N term of E Tr f(H)).
 * - J. Harer and D. Zagier, 1986, Invent. Math. 85, 457–485: the GUE moment recursion.
 * - GOE polynomials: THEORY.md, "Exact finite-N moments", obtained by exact Wick enumeration
 *   (Isserlis 1918, Biometrika 12); a recursion for them is in M. Ledoux, 2009, Ann. Inst. H.
 *   Poincaré Probab. Stat. 45, 754–769, and the map-counting view in I. P. Goulden and
 *   D. M. Jackson, 1997, Canad. J. Math. 49. The test re-derives them by Wick enumeration.
 */

/** [β = 1], and the coefficient σ_d² − 2/β that multiplies τ_2. */
function ensembleWeights(c: EnsembleConstants): { real: boolean; diagonalExcess: number } {
  return { real: c.beta === 1, diagonalExcess: c.diagonalVariance - 2 / c.beta };
}

/**
 * lim_{N→∞} (E Tr f(H) − N ∫ f ρ) =
 *   [β = 1]·((f(2) + f(−2))/4 − τ_0(f)/2) + (σ_d² − 2/β)·τ_2(f) + κ4·τ_4(f),
 * τ_k as in chebyshev.ts (τ_0 = c_0, τ_k = c_k/2).
 *
 * Method: τ_0, τ_2, τ_4 from `chebyshevCoefficients(f, 4)` (full double precision for f analytic
 * on a neighbourhood of [−2, 2]; throws otherwise). The theorem needs such an f.
 * References: Bai and Yao 2005, Bernoulli 11, Theorem 1.1 (theorem number from memory); the form
 * above is THEORY.md's, checked there by simulation and here against exact moments.
 */
export function linearStatisticMeanCorrection(f: (x: number) => number, c: EnsembleConstants): number {
  const { real, diagonalExcess } = ensembleWeights(c);
  const coefficients = chebyshevCoefficients(f, 4);
  const tau0 = coefficients[0];
  const tau2 = coefficients[2] / 2;
  const tau4 = coefficients[4] / 2;
  const edge = real ? (f(2) + f(-2)) / 4 - tau0 / 2 : 0;
  return edge + diagonalExcess * tau2 + c.kappa4 * tau4;
}

/**
 * lim_{N→∞} (E Tr G(z) − N m(z)), G(z) = (H − z)⁻¹, m = m(z) the semicircle Stieltjes transform:
 *   real (β = 1):    m³/(1 − m²)² + (σ_d² − 2) m³/(1 − m²) + κ4 m⁵/(1 − m²),
 *   complex (β = 2): (σ_d² − 1) m³/(1 − m²) + κ4 m⁵/(1 − m²)   (0 for GUE).
 *
 * Method: the linear-statistic correction with f(x) = 1/(x − z), whose Chebyshev coefficients are
 * τ_k = m(−m)^k/(1 − m²) (expand 1/(2cos θ − z) = m/((1 + m e^{iθ})(1 + m e^{−iθ})), using
 * z = −(m + 1/m)); the edge term (f(2) + f(−2))/4 − τ_0/2 simplifies to m³/(1 − m²)². Singular at
 * z = ±2. References: THEORY.md, "Fluctuations: linear statistics" (derived and verified by
 * simulation there); Bai and Yao 2005 for the underlying mean formula.
 */
export function resolventMeanCorrection(z: Complex, c: EnsembleConstants): Complex {
  const { real, diagonalExcess } = ensembleWeights(c);
  const m = stieltjesSemicircle(z);
  const m2 = mul(m, m);
  const m3 = mul(m2, m);
  const oneMinus = sub(complex(1, 0), m2);
  const tau2 = div(m3, oneMinus);
  const tau4 = mul(tau2, m2);
  const edge = real ? div(tau2, oneMinus) : complex(0, 0);
  return add(add(edge, scale(tau2, diagonalExcess)), scale(tau4, c.kappa4));
}

function binomial(n: number, k: number): bigint {
  if (k < 0 || k > n) return 0n;
  let b = 1n;
  for (let j = 1; j <= k; j++) b = (b * BigInt(n - k + j)) / BigInt(j);
  return b;
}

/**
 * The 1/N coefficient of E⟨H^{2k}⟩: E⟨H^{2k}⟩ = Catalan(k) + evenMomentCorrection(k, c)/N + O(N⁻²).
 *
 * Method: the mean correction with f = x^{2k}, in closed form: (2cos θ)^{2k} has τ_0 = binom(2k, k),
 * τ_2 = binom(2k, k − 1), τ_4 = binom(2k, k − 2) (binomial theorem) and f(±2) = 4^k, so the value is
 *   [β = 1]·(4^k/2 − binom(2k, k)/2) + (σ_d² − 2/β)·binom(2k, k − 1) + κ4·binom(2k, k − 2).
 * GOE k = 2: 8 − 3 = 5 (E Tr X⁴ = 2N³ + 5N² + 5N); GUE: 0 for every k.
 */
export function evenMomentCorrection(k: number, c: EnsembleConstants): number {
  if (!Number.isInteger(k) || k < 0) throw new RangeError(`evenMomentCorrection: k must be an integer ≥ 0, got ${k}`);
  const { real, diagonalExcess } = ensembleWeights(c);
  const edge = real ? Number(4n ** BigInt(k) - binomial(2 * k, k)) / 2 : 0;
  return edge + diagonalExcess * Number(binomial(2 * k, k - 1)) + c.kappa4 * Number(binomial(2 * k, k - 2));
}

function checkSizeAndOrder(name: string, N: number, k: number): void {
  if (!Number.isInteger(N) || N < 1) throw new RangeError(`${name}: N must be an integer ≥ 1, got ${N}`);
  if (!Number.isInteger(k) || k < 0) throw new RangeError(`${name}: k must be an integer ≥ 0, got ${k}`);
}

/**
 * a_k = E Tr X^{2k} for an N×N GUE matrix X with E|x_ij|² = 1, exact:
 * a_0 = N, a_1 = N², (k + 2) a_{k+1} = (4k + 2) N a_k + k(4k² − 1) a_{k−1} (Harer and Zagier 1986,
 * Invent. Math. 85). The division by k + 2 is exact.
 */
export function gueTraceMoment(N: number, k: number): bigint {
  checkSizeAndOrder('gueTraceMoment', N, k);
  const n = BigInt(N);
  let previous = n;
  let current = n * n;
  if (k === 0) return previous;
  for (let j = 1n; j < BigInt(k); j++) {
    const next = ((4n * j + 2n) * n * current + j * (4n * j * j - 1n) * previous) / (j + 2n);
    previous = current;
    current = next;
  }
  return current;
}

/**
 * Coefficients of N^1 … N^{k+1} in E Tr X^{2k} for GOE, k = 0 … 5: THEORY.md, "Exact finite-N
 * moments" (exact Wick enumeration; re-derived independently in the test).
 */
const GOE_TRACE_POLYNOMIALS: readonly (readonly bigint[])[] = [
  [1n],
  [1n, 1n],
  [5n, 5n, 2n],
  [41n, 52n, 22n, 5n],
  [509n, 690n, 374n, 93n, 14n],
  [8229n, 12143n, 7150n, 2290n, 386n, 42n],
];

/**
 * E Tr X^{2k} for an N×N GOE matrix X with off-diagonal variance 1 and diagonal variance 2, exact,
 * for k ≤ 5; undefined beyond (a general recursion is Ledoux 2009).
 */
export function goeTraceMoment(N: number, k: number): bigint | undefined {
  checkSizeAndOrder('goeTraceMoment', N, k);
  const coefficients = GOE_TRACE_POLYNOMIALS[k];
  if (coefficients === undefined) return undefined;
  const n = BigInt(N);
  let value = 0n;
  for (let j = coefficients.length - 1; j >= 0; j--) value = (value + coefficients[j]) * n; // Horner, no constant term
  return value;
}

/**
 * p/q correctly rounded to the nearest double (p, q integers, q ≠ 0).
 * Method: scale so that the integer quotient has ≥ 66 significant bits, set a sticky bit when the
 * division is inexact, and let Number(bigint) round once (round to nearest, ties to even).
 */
export function ratioToNumber(p: bigint, q: bigint): number {
  if (q === 0n) throw new RangeError('ratioToNumber: division by zero');
  if (p === 0n) return 0;
  const negative = p < 0n !== q < 0n;
  const a = p < 0n ? -p : p;
  const b = q < 0n ? -q : q;
  const shift = 66 - (a.toString(2).length - b.toString(2).length);
  const numerator = shift >= 0 ? a << BigInt(shift) : a;
  const denominator = shift >= 0 ? b : b << BigInt(-shift);
  let quotient = numerator / denominator;
  if (numerator % denominator !== 0n) quotient |= 1n;
  const half = Math.trunc(shift / 2);
  const value = Number(quotient) * 2 ** -half * 2 ** -(shift - half); // two exact power-of-two steps
  return negative ? -value : value;
}

/** E⟨H^{2k}⟩ for GUE (H = X/√N), exact up to one rounding: gueTraceMoment(N, k)/N^{k+1}. */
export function exactEvenMomentGUE(N: number, k: number): number {
  return ratioToNumber(gueTraceMoment(N, k), BigInt(N) ** BigInt(k + 1));
}

/** E⟨H^{2k}⟩ for GOE (H = X/√N), exact up to one rounding, for k ≤ 5; undefined for k > 5. */
export function exactEvenMomentGOE(N: number, k: number): number | undefined {
  const trace = goeTraceMoment(N, k);
  return trace === undefined ? undefined : ratioToNumber(trace, BigInt(N) ** BigInt(k + 1));
}
