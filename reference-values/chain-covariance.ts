import { type Complex, ONE, add, complex, div, mul, sub } from '../harness/numeric/complex.js';
import type { EnsembleConstants } from '../harness/numeric/ensemble.js';
import { dividedDifferenceRule } from './divided-difference.js';
import { tracialCovarianceFromStieltjes } from './resolvent-covariance.js';
import { stieltjesSemicircle } from './semicircle-law.js';

/**
 * Chains of resolvents with identity weights, Π_i G(z_i) = G(z_1)⋯G(z_k), reduce to one-resolvent
 * statistics: by partial fractions, Π_i 1/(x − z_i) is the divided difference in ζ of 1/(x − ζ)
 * over z_1..z_k, so Π_i G(z_i) = G[z_1..z_k] (derivatives of G where points coincide: G(z)² = G′(z)).
 * Taking traces, expectations and covariances commutes with this finite linear combination (and,
 * for coincident points, with the contour integral that defines it), hence
 *
 *   lim Cov(Tr Π_i G(z_i), Tr Π_j G(w_j)) = the double divided difference of
 *   C(ζ, ω) = tracialResolventCovariance(ζ, ω) over ζ ∈ {z_i} and ω ∈ {w_j},
 *   lim E⟨Π_i G(z_i)⟩ = m[z_1..z_k]  (the divided difference of the Stieltjes transform).
 *
 * The second is THEORY.md's law of large numbers for chains ("Mesoscopic scales and chains") with
 * all weights the identity, where the free cumulants collapse to divided differences of m; for
 * k = 2 it is (m1 − m2)/(z1 − z2) = m1m2/(1 − m1m2). An empty chain is Tr I − E Tr I = 0, so its
 * covariance with anything is 0 (and its normalised mean is 1).
 *
 * Method: `dividedDifferenceRule` (contour integrals by the trapezoid rule around clusters of
 * nearby points, partial fractions between clusters; Trefethen and Weideman 2014, SIAM Rev. 56) in
 * each variable, m and m′ precomputed at the nodes; C is analytic in each variable off [−2, 2]
 * (|m| < 1 there, so 1 − m(ζ)m(ω) ≠ 0). Cost: (nodes in ζ) × (nodes in ω), at most about 10⁴
 * evaluations for four coincident points on each side.
 *
 * References: the covariance kernel as in resolvent-covariance.ts (Khorunzhy, Khoruzhenko and
 * Pastur 1996, J. Math. Phys. 37; Bai and Silverstein 2010, ch. 9); partial fractions and the
 * Hermite contour formula for divided differences are common practice.
 */

interface StieltjesNode {
  readonly m: Complex;
  readonly dm: Complex;
}

function stieltjesAt(zeta: Complex): StieltjesNode {
  const m = stieltjesSemicircle(zeta);
  const m2 = mul(m, m);
  return { m, dm: div(m2, sub(ONE, m2)) };
}

/** lim Cov(Tr G(z_1)⋯G(z_k), Tr G(w_1)⋯G(w_l)); every point off [−2, 2]. */
export function identityChainCovariance(left: readonly Complex[], right: readonly Complex[], c: EnsembleConstants): Complex {
  if (left.length === 0 || right.length === 0) return complex(0, 0);
  const a = dividedDifferenceRule(left);
  const b = dividedDifferenceRule(right);
  const aNodes = a.nodes.map(stieltjesAt);
  const bNodes = b.nodes.map(stieltjesAt);
  let sum = complex(0, 0);
  aNodes.forEach((p, i) => {
    let inner = complex(0, 0);
    bNodes.forEach((q, j) => {
      inner = add(inner, mul(b.weights[j], tracialCovarianceFromStieltjes(p.m, p.dm, q.m, q.dm, c)));
    });
    sum = add(sum, mul(a.weights[i], inner));
  });
  return sum;
}

/** lim E⟨G(z_1)⋯G(z_k)⟩ = m[z_1..z_k]; 1 for the empty chain. */
export function identityChainMean(points: readonly Complex[]): Complex {
  if (points.length === 0) return ONE;
  const rule = dividedDifferenceRule(points);
  let sum = complex(0, 0);
  rule.nodes.forEach((zeta, j) => {
    sum = add(sum, mul(rule.weights[j], stieltjesSemicircle(zeta)));
  });
  return sum;
}
