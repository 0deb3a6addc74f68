import { checkedWeight, complexVectors } from './eigenbasis-matrix.js';
import type { SpectralDecomposition } from './spectral-decomposition.js';
import { asComplex, type SquareMatrix } from './square-matrix.js';

/**
 * The diagonal of V*AV, (V*AV)_ii = Σ_{r,s} conj(V_ri) A_rs V_si, complex interleaved (2N numbers),
 * for `weightedResolventTrace` (resolvent-trace.ts). Only the diagonal is formed, never V*AV.
 *
 * Cost: a diagonal weight takes
 * Σ_r A_rr |V_ri|², O(N²); any other weight takes W = AV (one product, 2N³ flops real, 8N³
 * complex) and then Σ_r conj(V_ri) W_ri, O(N²). Each entry has absolute error O(N ε ‖A‖)
 * (Higham 2002, Accuracy and Stability of Numerical Algorithms, 2nd ed., SIAM, §3.5).
 */
export function eigenbasisDiagonal(decomp: SpectralDecomposition, weight: SquareMatrix): Float64Array {
  const n = checkedWeight(decomp, weight, 'eigenbasisDiagonal');
  const a = asComplex(weight).data;
  const v = complexVectors(decomp);
  const out = new Float64Array(2 * n);
  if (isDiagonal(a, n)) {
    for (let r = 0; r < n; r++) {
      const ar = a[2 * (r * n + r)];
      const ai = a[2 * (r * n + r) + 1];
      const row = 2 * r * n;
      for (let i = 0; i < n; i++) {
        const m2 = v[row + 2 * i] ** 2 + v[row + 2 * i + 1] ** 2;
        out[2 * i] += ar * m2;
        out[2 * i + 1] += ai * m2;
      }
    }
    return out;
  }
  for (let r = 0; r < n; r++) {
    // Row r of W = A V, then its contribution conj(V_ri) W_ri to every i.
    const w = new Float64Array(2 * n);
    const arow = 2 * r * n;
    for (let s = 0; s < n; s++) {
      const ar = a[arow + 2 * s];
      const ai = a[arow + 2 * s + 1];
      if (ar === 0 && ai === 0) continue;
      const vs = 2 * s * n;
      for (let k = 0; k < 2 * n; k += 2) {
        const xr = v[vs + k];
        const xi = v[vs + k + 1];
        w[k] += ar * xr - ai * xi;
        w[k + 1] += ar * xi + ai * xr;
      }
    }
    for (let i = 0; i < n; i++) {
      const cr = v[arow + 2 * i];
      const ci = -v[arow + 2 * i + 1];
      out[2 * i] += cr * w[2 * i] - ci * w[2 * i + 1];
      out[2 * i + 1] += cr * w[2 * i + 1] + ci * w[2 * i];
    }
  }
  return out;
}

function isDiagonal(a: Float64Array, n: number): boolean {
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      if (i !== j && (a[2 * (i * n + j)] !== 0 || a[2 * (i * n + j) + 1] !== 0)) return false;
    }
  }
  return true;
}
