import type { SpectralDecomposition } from './spectral-decomposition.js';
import type { SquareMatrix } from './square-matrix.js';

/** The non-zero entries of a weight, (row, column, re, im) by position. */
export interface SparseEntries {
  readonly rows: Int32Array;
  readonly columns: Int32Array;
  readonly re: Float64Array;
  readonly im: Float64Array;
}

/** The non-zero entries of `weight`, or null when there are more than `limit` of them. */
export function sparseEntries(weight: SquareMatrix, limit: number): SparseEntries | null {
  const n = weight.size;
  const stride = weight.field === 'complex' ? 2 : 1;
  const rows: number[] = [];
  const columns: number[] = [];
  const re: number[] = [];
  const im: number[] = [];
  for (let r = 0; r < n; r++) {
    for (let s = 0; s < n; s++) {
      const k = stride * (r * n + s);
      const a = weight.data[k];
      const b = stride === 2 ? weight.data[k + 1] : 0;
      if (a === 0 && b === 0) continue;
      if (rows.length === limit) return null;
      rows.push(r);
      columns.push(s);
      re.push(a);
      im.push(b);
    }
  }
  return { rows: Int32Array.from(rows), columns: Int32Array.from(columns), re: Float64Array.from(re), im: Float64Array.from(im) };
}

/**
 * The diagonal of V*AV for a sparse weight A, complex interleaved (2N numbers), as
 * `eigenbasisDiagonal` (eigenbasis-diagonal.ts) gives it, in O(nnz·N) operations and no N×N
 * temporaries: (V*AV)_ii = Σ_{(r,s): A_rs ≠ 0} conj(V_ri) A_rs V_si, each non-zero adding one pass over
 * rows r and s of V (contiguous in the row-major layout). For the diagonal and shift weights of the
 * fluctuation checks (N non-zeros) that is O(N²), against the dense routine's O(N²) conversions per
 * call. Each entry has absolute error O(nnz_row ε ‖A‖) (sums of products of unit-vector entries;
 * Higham 2002, Accuracy and Stability of Numerical Algorithms, 2nd ed., SIAM, §3.1).
 */
export function sparseEigenbasisDiagonal(decomp: SpectralDecomposition, entries: SparseEntries): Float64Array {
  const n = decomp.size;
  const v = decomp.vectors;
  const out = new Float64Array(2 * n);
  const complexVectors = decomp.field === 'complex';
  for (let e = 0; e < entries.rows.length; e++) {
    const r = entries.rows[e];
    const s = entries.columns[e];
    const ar = entries.re[e];
    const ai = entries.im[e];
    if (!complexVectors) {
      const rowR = r * n;
      const rowS = s * n;
      for (let i = 0; i < n; i++) {
        const p = v[rowR + i] * v[rowS + i];
        out[2 * i] += ar * p;
        out[2 * i + 1] += ai * p;
      }
      continue;
    }
    const rowR = 2 * r * n;
    const rowS = 2 * s * n;
    for (let i = 0; i < n; i++) {
      // conj(V_ri)·V_si, then times A_rs.
      const xr = v[rowR + 2 * i];
      const xi = -v[rowR + 2 * i + 1];
      const yr = v[rowS + 2 * i];
      const yi = v[rowS + 2 * i + 1];
      const pr = xr * yr - xi * yi;
      const pi = xr * yi + xi * yr;
      out[2 * i] += ar * pr - ai * pi;
      out[2 * i + 1] += ar * pi + ai * pr;
    }
  }
  return out;
}
