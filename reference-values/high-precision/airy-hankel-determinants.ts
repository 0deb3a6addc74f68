import { airyAiTable } from './airy-taylor-table.js';
import { positiveDefiniteDeterminant } from './positive-definite-determinant.js';
import { type DoubleDouble, dd } from './double-double.js';
import { gaussLegendreDoubleDouble } from './gauss-legendre-double-double.js';

/**
 * The operator is cut to L²(0, L) with t + L ≥ 16: the discarded blocks are ∫∫ Ai(t + u + v)² over
 * u > L, which is of order Ai(t + L)² ≤ Ai(16)² ≈ 1e-37 (a cut at t + 2L = 24 left Ai(t + L)² ≈ 1e-20 at
 * t = −3, which an independent 40-digit evaluation exposed).
 */
const CUT = 16;

export interface AiryHankelDeterminants {
  /** det(I − B_t) on L²(0, ∞), B_t(u, v) = Ai(t + u + v): F1(t). */
  readonly minus: DoubleDouble;
  /** det(I + B_t). F2(t) = minus·plus and F4(t/√2) = (minus + plus)/2. */
  readonly plus: DoubleDouble;
}

/**
 * The Fredholm determinants det(I ∓ B_t) of the Airy Hankel operator, from which all three
 * Tracy–Widom distributions follow (Ferrari and Spohn 2005 for F1; F2 = det(I − B²) = det(I − K_Ai)
 * since B_t² is the Airy kernel K_Ai shifted to L²(t, ∞) (Tracy and Widom 1994); F4 as above, in
 * Tracy and Widom's 1996 normalisation; Bornemann 2010, Markov Process. Related Fields 16, collects
 * these forms; equation numbers not checked, from memory).
 *
 * Method: Nyström discretisation (Bornemann 2010, Math. Comp. 79): the operator on L²(0, L) with
 * L = max(4, 16 − t) (see CUT), the m-point Gauss–Legendre
 * rule u_i, w_i mapped to [0, L], det(δ_ij ∓ √w_i Ai(t + u_i + u_j) √w_j) by LDLᵀ in double-double (both
 * matrices are positive definite),
 * with Ai from its Taylor table (airy-taylor-table.ts).
 * The error decays exponentially in m for this entire kernel; the generator certifies digits by
 * comparing two values of m.
 */
export function airyHankelDeterminants(t: DoubleDouble, m: number): AiryHankelDeterminants {
  const half = Math.max(4, CUT - t.hi) / 2;
  const rule = gaussLegendreDoubleDouble(m);
  const u = rule.nodes.map((x) => dd.mulNumber(dd.add(x, dd.of(1)), half));
  const rootWeights = rule.weights.map((w) => dd.sqrt(dd.mulNumber(w, half)));
  // The kernel √w_i Ai(t + u_i + u_j) √w_j, symmetric, as high and low parts.
  const kernelHi = new Float64Array(m * m);
  const kernelLo = new Float64Array(m * m);
  for (let i = 0; i < m; i++) {
    const shifted = dd.add(t, u[i]);
    for (let j = i; j < m; j++) {
      const value = dd.mul(dd.mul(rootWeights[i], rootWeights[j]), airyAiTable(dd.add(shifted, u[j])));
      kernelHi[i * m + j] = kernelHi[j * m + i] = value.hi;
      kernelLo[i * m + j] = kernelLo[j * m + i] = value.lo;
    }
  }
  const determinant = (sign: 1 | -1): DoubleDouble => {
    const hi = new Float64Array(m * m);
    const lo = new Float64Array(m * m);
    for (let k = 0; k < m * m; k++) {
      hi[k] = sign * kernelHi[k];
      lo[k] = sign * kernelLo[k];
    }
    for (let k = 0; k < m; k++) {
      const one = dd.add({ hi: hi[k * (m + 1)], lo: lo[k * (m + 1)] }, { hi: 1, lo: 0 });
      hi[k * (m + 1)] = one.hi;
      lo[k * (m + 1)] = one.lo;
    }
    return positiveDefiniteDeterminant(hi, lo, m);
  };
  return { minus: determinant(-1), plus: determinant(1) };
}
