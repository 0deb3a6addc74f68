import { type IntegerPolynomial, addScaledShifted } from './integer-polynomial.js';

/**
 * Exact mixed trace moments E Π_j Tr X^{μ_j} of the Gaussian ensembles with unnormalised entries,
 * as polynomials in N with integer coefficients:
 * - 'goe': real symmetric, E x_ij x_kl = δ_ik δ_jl + δ_il δ_jk (off-diagonal variance 1, diagonal 2);
 * - 'gue': complex Hermitian, E x_ij x_kl = δ_il δ_jk (E|x_ij|² = 1, diagonal variance 1).
 *
 * Method: Gaussian integration by parts (Stein's identity E[Y_a F(Y)] = Σ_b C_ab E[∂_b F(Y)] for a
 * centred Gaussian vector Y with covariance C, any polynomial F; Isserlis 1918 in another form)
 * applied to Tr X^{n+1} = Σ_ij x_ij (X^n)_ji, with ∂(X^n)_ji/∂x_kl = Σ_a (X^a)_jk (X^{n−1−a})_li
 * and ∂ Tr X^m/∂x_kl = m (X^{m−1})_lk, gives the Schwinger–Dyson (loop) equations, for any
 * multiset ν of further powers:
 *   GOE: E[Tr X^{n+1} Π_ν] = Σ_{a=0}^{n−1} E[Tr X^a Tr X^{n−1−a} Π_ν] + n E[Tr X^{n−1} Π_ν]
 *                            + Σ_{m ∈ ν} 2m E[Tr X^{n+m−1} Π_{ν∖m}],
 *   GUE: the same without the middle term and with m in place of 2m,
 * where Tr X^0 = N (the middle term and the factor 2 come from the transposed pairing
 * δ_ik δ_jl, which for symmetric X gives Tr X^a (X^{n−1−a})ᵀ = Tr X^{n−1}). Each step lowers the
 * total degree by 2, so the recursion ends at E[1] = 1; a total odd degree gives 0. Check:
 * E Tr X⁴ = 2N·E Tr X² + E (Tr X)² + 3 E Tr X² = 2N³ + 5N² + 5N for GOE.
 *
 * For GUE these are the equations behind Tutte's recursion and the Harer–Zagier formula; for GOE
 * they are the equations that M. Ledoux (2009, Ann. Inst. H. Poincaré Probab. Stat. 45, 754–769)
 * reduces, by the same integration by parts, to a five-term recursion for E Tr X^{2k} alone (his
 * recursion is not used here: its statement was not available to check). The map-counting reading
 * (one-vertex maps on locally orientable surfaces, weighted by N^faces) is I. P. Goulden and
 * D. M. Jackson, 1997, Canad. J. Math. 49, 865–882.
 *
 * Cost: one polynomial per multiset of total degree ≤ 2k (about 4000 multisets for k = 12).
 */
export type GaussianEnsembleKind = 'goe' | 'gue';

const memo: Record<GaussianEnsembleKind, Map<string, IntegerPolynomial>> = { goe: new Map(), gue: new Map() };

/** E Π_j Tr X^{powers_j} as a polynomial in N (coefficient of N^r at index r). */
export function mixedTraceMomentPolynomial(kind: GaussianEnsembleKind, powers: readonly number[]): IntegerPolynomial {
  for (const p of powers) {
    if (!Number.isInteger(p) || p < 0) throw new RangeError(`mixedTraceMomentPolynomial: powers must be integers ≥ 0, got ${p}`);
  }
  const zeros = powers.filter((p) => p === 0).length;
  const parts = powers.filter((p) => p > 0).sort((a, b) => b - a);
  return addScaledShifted([], 1n, positivePartsMoment(kind, parts), zeros);
}

/** E Tr X^{2k} as a polynomial in N of degree k + 1. */
export function evenTraceMomentPolynomial(kind: GaussianEnsembleKind, k: number): IntegerPolynomial {
  if (!Number.isInteger(k) || k < 0) throw new RangeError(`evenTraceMomentPolynomial: k must be an integer ≥ 0, got ${k}`);
  return mixedTraceMomentPolynomial(kind, [2 * k]);
}

/** parts: positive, sorted descending. */
function positivePartsMoment(kind: GaussianEnsembleKind, parts: readonly number[]): IntegerPolynomial {
  if (parts.length === 0) return [1n];
  if (parts.reduce((s, p) => s + p, 0) % 2 === 1) return [];
  const key = parts.join(',');
  const known = memo[kind].get(key);
  if (known !== undefined) return known;

  const n = parts[0] - 1;
  const rest = parts.slice(1);
  const term = (extra: readonly number[]): IntegerPolynomial => mixedTraceMomentPolynomial(kind, [...rest, ...extra]);
  let result: bigint[] = [];
  for (let a = 0; a <= n - 1; a++) result = addScaledShifted(result, 1n, term([a, n - 1 - a]));
  if (kind === 'goe' && n > 0) result = addScaledShifted(result, BigInt(n), term([n - 1]));
  for (let j = 0; j < rest.length; j++) {
    const m = rest[j];
    const others = [...rest.slice(0, j), ...rest.slice(j + 1), n + m - 1];
    const weight = BigInt(kind === 'goe' ? 2 * m : m);
    result = addScaledShifted(result, weight, mixedTraceMomentPolynomial(kind, others));
  }
  memo[kind].set(key, result);
  return result;
}
