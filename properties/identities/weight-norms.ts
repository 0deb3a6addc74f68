import { entryIm, entryRe, frobeniusNorm, type SquareMatrix } from '../../harness/numeric/square-matrix.js';

/**
 * Norms of a weight A that bound the traces it enters, cheap to compute and never below the
 * quantity they stand for.
 */

/**
 * An upper bound on the operator norm: ‖A‖₂ ≤ √(‖A‖₁‖A‖∞), the geometric mean of the largest
 * column and row sums of |a_ij| (Golub and Van Loan 2013, Matrix Computations, 4th ed., §2.3.3;
 * Higham 2002, Accuracy and Stability of Numerical Algorithms, 2nd ed., SIAM, §6.3; section
 * numbers from memory). Exact for diagonal matrices and for the identity.
 */
export function operatorNormBound(a: SquareMatrix): number {
  const n = a.size;
  let rowMax = 0;
  const columns = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let row = 0;
    for (let j = 0; j < n; j++) {
      const x = Math.hypot(entryRe(a, i, j), entryIm(a, i, j));
      row += x;
      columns[j] += x;
    }
    rowMax = Math.max(rowMax, row);
  }
  let columnMax = 0;
  for (let j = 0; j < n; j++) columnMax = Math.max(columnMax, columns[j]);
  return Math.sqrt(rowMax * columnMax);
}

/**
 * ⟨A*A⟩^{1/2} = ‖A‖_F/√N. It bounds a normalised trace against any matrix X:
 * |⟨XA⟩| ≤ ⟨XX*⟩^{1/2}⟨A*A⟩^{1/2} ≤ ‖X‖₂ ‖A‖_F/√N (Cauchy–Schwarz for the inner product
 * ⟨X*Y⟩, then ⟨XX*⟩ ≤ ‖X‖₂²), so with X = G(z), ‖G(z)‖₂ = 1/dist(z, spectrum) ≤ 1/|Im z|, it gives
 * |⟨G(z)A⟩| ≤ ‖A‖_F/(√N |Im z|), a valid and sharper form of ‖A‖₂/|Im z| (common practice).
 */
export function normalisedFrobeniusNorm(a: SquareMatrix): number {
  return frobeniusNorm(a) / Math.sqrt(a.size);
}
