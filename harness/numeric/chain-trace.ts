import type { Complex } from './complex.js';
import { complexProduct, scaleRows } from './complex-matrix-product.js';
import { eigenbasisDiagonal } from './eigenbasis-diagonal.js';
import { eigenbasisMatrix } from './eigenbasis-matrix.js';
import { resolventDiagonal } from './resolvent-trace.js';
import type { SpectralDecomposition } from './spectral-decomposition.js';
import type { SquareMatrix } from './square-matrix.js';

/**
 * The normalised chain trace ⟨G(z1)A1 G(z2)A2 ⋯ G(zk)Ak⟩ = Tr(G(z1)A1 ⋯ G(zk)Ak)/N
 * (THEORY.md, "Chains of any length"), from one eigendecomposition H = V Λ V*.
 *
 * Method: G(z) = V D(z) V* with D(z) = diag(1/(λ − z)), so the trace is
 * (1/N) Tr(D1 B1 D2 B2 ⋯ Dk Bk) with B_j = V* A_j V (cyclic invariance of the trace). The weights
 * need not be Hermitian, and a real decomposition takes complex weights. k = 1 needs only the
 * diagonal of B1 (eigenbasis-diagonal.ts); otherwise each B_j costs two products, the running
 * product M = D1 B1 ⋯ D_{k−1} B_{k−1} one product per factor, and the last factor only the
 * O(N²) sum Tr(M D_k B_k) = Σ_{r,s} M_rs (D_k)_s (B_k)_sr. Cost O(k N³).
 *
 * Accuracy: each factor is formed to O(N ε ‖A_j‖) absolute accuracy; the product inherits the
 * usual forward error of a chain of products, O(k N ε) Π‖D_j‖‖A_j‖ (Higham 2002, Accuracy and
 * Stability of Numerical Algorithms, 2nd ed., SIAM, §3.5), which near the spectrum, where
 * ‖D_j‖ = 1/dist(z_j, spec H) is large, is the conditioning of the quantity itself.
 */
export function chainTrace(decomp: SpectralDecomposition, points: readonly Complex[], weights: readonly SquareMatrix[]): Complex {
  const n = decomp.size;
  const k = points.length;
  if (k === 0) throw new RangeError('chainTrace: at least one spectral parameter is needed');
  if (weights.length !== k) throw new RangeError(`chainTrace: ${k} spectral parameters but ${weights.length} weights`);
  if (n === 0) throw new RangeError('chainTrace: empty spectrum (N = 0)');
  if (k === 1) {
    const diag = eigenbasisDiagonal(decomp, weights[0]);
    const d = resolventDiagonal(decomp.values, points[0]);
    let re = 0;
    let im = 0;
    for (let i = 0; i < n; i++) {
      re += d[2 * i] * diag[2 * i] - d[2 * i + 1] * diag[2 * i + 1];
      im += d[2 * i] * diag[2 * i + 1] + d[2 * i + 1] * diag[2 * i];
    }
    return { re: re / n, im: im / n };
  }
  // M = D1 B1: row s of B1 scaled by (D1)_s.
  let m = eigenbasisMatrix(decomp, weights[0]);
  scaleRows(m, resolventDiagonal(decomp.values, points[0]), n);
  for (let j = 1; j < k - 1; j++) {
    const factor = eigenbasisMatrix(decomp, weights[j]);
    scaleRows(factor, resolventDiagonal(decomp.values, points[j]), n);
    m = complexProduct(m, factor, n);
  }
  const last = eigenbasisMatrix(decomp, weights[k - 1]);
  const d = resolventDiagonal(decomp.values, points[k - 1]);
  let re = 0;
  let im = 0;
  for (let s = 0; s < n; s++) {
    // Σ_r M_rs (B_k)_sr, then times (D_k)_s.
    let cr = 0;
    let ci = 0;
    for (let r = 0; r < n; r++) {
      const mr = m[2 * (r * n + s)];
      const mi = m[2 * (r * n + s) + 1];
      const br = last[2 * (s * n + r)];
      const bi = last[2 * (s * n + r) + 1];
      cr += mr * br - mi * bi;
      ci += mr * bi + mi * br;
    }
    re += cr * d[2 * s] - ci * d[2 * s + 1];
    im += cr * d[2 * s + 1] + ci * d[2 * s];
  }
  return { re: re / n, im: im / n };
}
