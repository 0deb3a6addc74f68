import { type IntegerMomentLaw, pairings, patternExpectation, wickExplicit } from './exact-moment-enumeration.js';

/**
 * Exact enumerations of joint moments of traces, E[Π_c Tr X^{p_c}], as polynomials in N, for the
 * tests of linear-statistic-variance.ts. X has unnormalised entries (off-diagonal E|x|² = 1); the
 * normalised H = X/√N has Var Tr H^p = N^{−p} Var Tr X^p.
 *
 * The factors are numbered along the cycles: cycle c holds positions s_c … s_c + p_c − 1, and factor
 * t is x_{i_t i_{next(t)}} with next(t) the following position of its cycle (cyclically).
 *
 * Two independent methods:
 * - Wick (Isserlis 1918, Biometrika 12): for GOE, E x_ab x_cd = δ_ac δ_bd + δ_ad δ_bc (diagonal
 *   variance 2); for GUE, E x_ab x_cd = δ_ad δ_bc. Each pairing and choice of term identifies
 *   indices; the free index classes contribute N^{#classes}.
 * - The moment method (Wigner 1955; Anderson, Guionnet and Zeitouni 2010, §2.1): sum over the set
 *   partitions of the index positions (r blocks: N(N − 1)⋯(N − r + 1) assignments) of the product
 *   over distinct edges of the entries' moments; works for any law with integer moments.
 * A third, explicit index sum at small N checks both.
 */

function find(parent: number[], a: number): number {
  while (parent[a] !== a) a = parent[a] = parent[parent[a]];
  return a;
}

/** next(t) for the concatenated cycles. */
function successors(lengths: readonly number[]): number[] {
  const next: number[] = [];
  let start = 0;
  for (const p of lengths) {
    for (let t = 0; t < p; t++) next.push(start + ((t + 1) % p));
    start += p;
  }
  return next;
}

/** E[Π_c Tr X^{p_c}] as a polynomial in N (index r: coefficient of N^r) by Wick's rule. */
export function wickTraceProductPolynomial(lengths: readonly number[], ensemble: 'goe' | 'gue'): bigint[] {
  const size = lengths.reduce((a, b) => a + b, 0);
  const coefficients: bigint[] = new Array(size + 1).fill(0n);
  if (size % 2 === 1) return coefficients;
  const next = successors(lengths);
  const choices = ensemble === 'goe' ? 1 << (size / 2) : 1;
  for (const pairing of pairings(size)) {
    for (let choice = 0; choice < choices; choice++) {
      const parent = Array.from({ length: size }, (_, i) => i);
      const join = (a: number, b: number): void => {
        parent[find(parent, a)] = find(parent, b);
      };
      pairing.forEach(([s, t], p) => {
        const [a, b, c, d] = [s, next[s], t, next[t]];
        if (ensemble === 'goe' && ((choice >> p) & 1) === 0) {
          join(a, c);
          join(b, d);
        } else {
          join(a, d);
          join(b, c);
        }
      });
      let classes = 0;
      for (let i = 0; i < size; i++) if (find(parent, i) === i) classes++;
      coefficients[classes] += 1n;
    }
  }
  return coefficients;
}

/** E[Π_c Tr X^{p_c}] as a polynomial in N by the moment method (set partitions of the positions). */
export function momentMethodTraceProductPolynomial(lengths: readonly number[], law: IntegerMomentLaw): bigint[] {
  const size = lengths.reduce((a, b) => a + b, 0);
  const next = successors(lengths);
  const falling: bigint[] = new Array(size + 1).fill(0n);
  const labels = new Array<number>(size).fill(0);
  const visit = (position: number, blocks: number): void => {
    if (position === size) {
      falling[blocks] += patternExpectation(labels, law, next);
      return;
    }
    for (let b = 0; b <= blocks; b++) {
      labels[position] = b;
      visit(position + 1, Math.max(blocks, b + 1));
    }
  };
  visit(0, 0);
  // Σ_r falling[r]·N(N − 1)⋯(N − r + 1) in the monomial basis.
  const monomial: bigint[] = new Array(size + 1).fill(0n);
  let factor: bigint[] = [1n];
  for (let r = 0; r <= size; r++) {
    factor.forEach((a, j) => (monomial[j] += falling[r] * a));
    const grown: bigint[] = new Array(factor.length + 1).fill(0n);
    factor.forEach((a, j) => {
      grown[j + 1] += a;
      grown[j] -= BigInt(r) * a;
    });
    factor = grown;
  }
  return monomial;
}

/** E[Π_c Tr X^{p_c}] by Wick's rule over explicit indices 0..N−1 (tiny N only). */
export function wickTraceProductExplicit(lengths: readonly number[], ensemble: 'goe' | 'gue', N: number): number {
  return wickExplicit(N, lengths.reduce((a, b) => a + b, 0), ensemble, successors(lengths));
}

/** a − b·c for polynomials (coefficient arrays, index = power). */
export function polynomialDifference(a: readonly bigint[], b: readonly bigint[], c: readonly bigint[]): bigint[] {
  const out: bigint[] = new Array(Math.max(a.length, b.length + c.length - 1)).fill(0n);
  a.forEach((v, i) => (out[i] += v));
  b.forEach((u, i) => c.forEach((v, j) => (out[i + j] -= u * v)));
  return out;
}

/** Var Tr X^p = E[(Tr X^p)²] − (E Tr X^p)² as a polynomial in N. */
export function traceVariancePolynomial(p: number, joint: (lengths: readonly number[]) => bigint[]): bigint[] {
  const mean = joint([p]);
  return polynomialDifference(joint([p, p]), mean, mean);
}
