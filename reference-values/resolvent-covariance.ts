import { type Complex, ONE, add, complex, div, mul, scale, sub } from '../harness/numeric/complex.js';
import type { EnsembleConstants } from '../harness/numeric/ensemble.js';
import { entryIm, entryRe, type SquareMatrix } from '../harness/numeric/square-matrix.js';
import { stieltjesSemicircle } from './semicircle-law.js';

/**
 * Limiting covariances of one-resolvent trace statistics of a Wigner matrix H (THEORY.md,
 * "Fluctuations: one resolvent"): with G(z) = (H − z)⁻¹, m_j = m(z_j) the semicircle Stieltjes
 * transform, ⟨X⟩ = Tr X/N and Å = A − ⟨A⟩I,
 *
 *   tracial:    lim Cov(Tr G(z1), Tr G(z2))
 *                 = ∂z1 ∂z2 [ −(2/β) log(1 − m1m2) + (σ_d² − 2/β) m1m2 + (κ4/2) m1²m2² ]
 *                 = m1′m2′ [ (2/β)/(1 − m1m2)² + (σ_d² − 2/β) + 2κ4 m1m2 ],
 *   traceless:  lim Cov(Tr G(z1)Å1, Tr G(z2)Å2)
 *                 = S m1²m2²/(1 − m1m2) + [ (σ_d² − 2/β) m1²m2² + κ4 m1³m2³ ] ⟨d(Å1)d(Å2)⟩,
 *
 * S = ⟨Å1Å2⟩ (β = 2) or ⟨Å1Å2⟩ + ⟨Å1Å2ᵀ⟩ (β = 1), ⟨d(Å1)d(Å2)⟩ = (1/N) Σ_i (Å1)_ii (Å2)_ii.
 * Covariances are bilinear (no conjugation), and the traces are "Tr statistics" (order one).
 *
 * Derivation (summary). The tracial form is the second mixed derivative of the log-generating
 * function above: ∂1∂2 of −(2/β) log(1 − m1m2) is (2/β) m1′m2′/(1 − m1m2)², the other two terms give
 * m1′m2′ and 2κ4 m1m2 m1′m2′. It is the resolvent case f = 1/(x − z) of the linear-statistic
 * covariance (linear-statistic-variance.ts), whose Chebyshev coefficients are
 * c_k = 2m(−m)^k/(1 − m²), so that (1/(2β)) Σ k c_k(z1)c_k(z2) = (2/β) m1′m2′/(1 − m1m2)², c_1²/4
 * gives m1′m2′ and c_2²/2 gives 2m1m2 m1′m2′ (checked numerically in the test). The traceless form
 * comes from the cumulant expansion of E[Tr G(z1)Å1 · Tr G(z2)Å2] (Gaussian integration by parts
 * plus the fourth cumulant, the method of Bai and Silverstein 2010, ch. 9): the second cumulants
 * of the off-diagonal entries give the pairing S, the diagonal variance's excess over the Gaussian
 * value 2/β and the fourth cumulant act only through the diagonal of Å. THEORY.md records it as
 * derived in this way and verified by simulation on eight ensembles; the test verifies it again
 * with the project's engine, including ensembles where the bracket term is essential. Check at
 * large |z| (m ~ −1/z): Cov(Tr HÅ1, Tr HÅ2) = S + (σ_d² − 2/β)⟨d(Å1)d(Å2)⟩ exactly, the term of
 * order 1/(z1²z2²).
 *
 * The tracial and traceless parts are uncorrelated for A = ⟨A⟩I + Å (THEORY.md); for entry laws
 * symmetric about 0 even exactly at every N: conjugating by diag(±1) keeps the law and flips the
 * sign of G_ij (i ≠ j) but not Tr G, and exchangeability makes Cov(G_ii, Tr G) independent of i.
 *
 * References: A. M. Khorunzhy, B. A. Khoruzhenko and L. A. Pastur, 1996, J. Math. Phys. 37(10),
 * 5033–5060 (tracial); Z. D. Bai and J. W. Silverstein, 2010, Spectral Analysis of Large
 * Dimensional Random Matrices, 2nd ed., Springer, ch. 9 (the method); THEORY.md for the traceless
 * form (sources.ts: KHORUNZHY_KHORUZHENKO_PASTUR_1996, BAI_SILVERSTEIN_2010).
 *
 * Domain: z1, z2 off [−2, 2] (the formulas are analytic in each variable on C \ [−2, 2]; there
 * |m| < 1, so 1 − m1m2 ≠ 0). On [−2, 2] they are singular and the result is not finite.
 */

/** Overlaps of two traceless weights that the traceless covariance depends on. */
export interface WeightOverlaps {
  /** S = ⟨Å1Å2⟩ (β = 2) or ⟨Å1Å2⟩ + ⟨Å1Å2ᵀ⟩ (β = 1); bilinear, no conjugation. */
  readonly pairing: Complex;
  /** ⟨d(Å1)d(Å2)⟩ = (1/N) Σ_i (Å1)_ii (Å2)_ii. */
  readonly diagonal: Complex;
}

/** m, m′ = m²/(1 − m²) at z (semicircle-law.ts). */
function stieltjesPair(z: Complex): { m: Complex; dm: Complex } {
  const m = stieltjesSemicircle(z);
  const m2 = mul(m, m);
  return { m, dm: div(m2, sub(ONE, m2)) };
}

/** lim Cov(Tr G(z1), Tr G(z2)) = m1′m2′ [(2/β)/(1 − m1m2)² + (σ_d² − 2/β) + 2κ4 m1m2]. */
export function tracialResolventCovariance(z1: Complex, z2: Complex, c: EnsembleConstants): Complex {
  const a = stieltjesPair(z1);
  const b = stieltjesPair(z2);
  return tracialCovarianceFromStieltjes(a.m, a.dm, b.m, b.dm, c);
}

/**
 * The tracial covariance from m and m′ at both points, for callers that evaluate it at many
 * pairs of precomputed points (chain-covariance.ts).
 */
export function tracialCovarianceFromStieltjes(m1: Complex, dm1: Complex, m2: Complex, dm2: Complex, c: EnsembleConstants): Complex {
  const p = mul(m1, m2);
  const q = sub(ONE, p);
  const bracket = add(add(div(complex(2 / c.beta, 0), mul(q, q)), complex(c.diagonalVariance - 2 / c.beta, 0)), scale(p, 2 * c.kappa4));
  return mul(mul(dm1, dm2), bracket);
}

/**
 * lim Cov(Tr G(z1)Å1, Tr G(z2)Å2) = S m1²m2²/(1 − m1m2) + [(σ_d² − 2/β) m1²m2² + κ4 m1³m2³] ⟨d(Å1)d(Å2)⟩,
 * with the overlaps of `weightOverlaps` (computed for the same β as c.beta).
 */
export function tracelessResolventCovariance(z1: Complex, z2: Complex, overlaps: WeightOverlaps, c: EnsembleConstants): Complex {
  const p = mul(stieltjesSemicircle(z1), stieltjesSemicircle(z2));
  const p2 = mul(p, p);
  const pairingPart = div(mul(overlaps.pairing, p2), sub(ONE, p));
  const bracket = add(scale(p2, c.diagonalVariance - 2 / c.beta), scale(mul(p2, p), c.kappa4));
  return add(pairingPart, mul(bracket, overlaps.diagonal));
}

/** Entry (i, j) of a weight as a Complex (real weights have zero imaginary part). */
function entry(a: SquareMatrix, i: number, j: number): Complex {
  return complex(entryRe(a, i, j), entryIm(a, i, j));
}

/**
 * S and ⟨d(Å1)d(Å2)⟩ for weights A1, A2 (real or complex, not necessarily Hermitian).
 *
 * Method: with t_j = ⟨A_j⟩, (Å_j)_rs = (A_j)_rs − t_j δ_rs, so ⟨Å1Å2⟩ = ⟨A1A2⟩ − t1t2 and
 * ⟨Å1Å2ᵀ⟩ = ⟨A1A2ᵀ⟩ − t1t2 (both bilinear); the sums (1/N) Σ_rs (A1)_rs (A2)_sr and
 * (1/N) Σ_rs (A1)_rs (A2)_rs cost O(N²). The diagonal overlap is (1/N) Σ_i (A1_ii − t1)(A2_ii − t2),
 * summed from the centred entries to avoid cancellation.
 */
export function weightOverlaps(A1: SquareMatrix, A2: SquareMatrix, beta: 1 | 2): WeightOverlaps {
  const n = A1.size;
  if (A2.size !== n) throw new RangeError(`weightOverlaps: weights of sizes ${n} and ${A2.size}`);
  if (n < 1) throw new RangeError('weightOverlaps: empty weights (N = 0)');
  let t1 = complex(0, 0);
  let t2 = complex(0, 0);
  for (let i = 0; i < n; i++) {
    t1 = add(t1, entry(A1, i, i));
    t2 = add(t2, entry(A2, i, i));
  }
  t1 = scale(t1, 1 / n);
  t2 = scale(t2, 1 / n);
  let product = complex(0, 0); // Σ_rs Å1_rs Å2_sr
  let transposed = complex(0, 0); // Σ_rs Å1_rs Å2_rs
  let diagonal = complex(0, 0);
  for (let r = 0; r < n; r++) {
    for (let s = 0; s < n; s++) {
      let a = entry(A1, r, s);
      let b = entry(A2, s, r);
      let bt = entry(A2, r, s);
      if (r === s) {
        a = sub(a, t1);
        b = sub(b, t2);
        bt = b;
        diagonal = add(diagonal, mul(a, b));
      }
      product = add(product, mul(a, b));
      if (beta === 1) transposed = add(transposed, mul(a, bt));
    }
  }
  const pairing = beta === 2 ? product : add(product, transposed);
  return { pairing: scale(pairing, 1 / n), diagonal: scale(diagonal, 1 / n) };
}

/**
 * lim Cov(Tr G(z1)A1, Tr G(z2)A2) for general weights A = ⟨A⟩I + Å: ⟨A1⟩⟨A2⟩ times the tracial
 * covariance plus the traceless covariance of Å1, Å2 (the cross terms vanish, see the module note).
 * `null` stands for the identity (⟨I⟩ = 1, Î = 0).
 */
export function resolventCovariance(
  z1: Complex,
  A1: SquareMatrix | null,
  z2: Complex,
  A2: SquareMatrix | null,
  c: EnsembleConstants,
): Complex {
  const t1 = A1 === null ? ONE : normalisedTrace(A1);
  const t2 = A2 === null ? ONE : normalisedTrace(A2);
  const tracial = mul(mul(t1, t2), tracialResolventCovariance(z1, z2, c));
  if (A1 === null || A2 === null) return tracial;
  return add(tracial, tracelessResolventCovariance(z1, z2, weightOverlaps(A1, A2, c.beta), c));
}

function normalisedTrace(a: SquareMatrix): Complex {
  let t = complex(0, 0);
  for (let i = 0; i < a.size; i++) t = add(t, entry(a, i, i));
  return scale(t, 1 / a.size);
}
