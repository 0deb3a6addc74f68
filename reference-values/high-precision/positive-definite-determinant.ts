import { type DoubleDouble, ddParts } from './double-double.js';

/**
 * det A for a symmetric positive definite m×m matrix in double-double, given as two row-major
 * Float64Arrays (high and low parts) of which the lower triangle is read and overwritten.
 *
 * Method: the LDLᵀ factorisation without pivoting (Golub and Van Loan 2013, Matrix Computations,
 * 4th ed., §4.1–4.2), stable for positive definite matrices, det A = Π d_k: a third of the work of
 * LU with pivoting. A pivot d_k ≤ 0 means the matrix is not positive definite and is refused.
 * The Fredholm matrices I ∓ B of the Tracy–Widom determinants qualify: B is symmetric with
 * spectrum inside (−1, 1) since det(I − B²) = F2 ∈ (0, 1). The update a_ij −= l_ik·a_jk, where
 * the time goes, runs on a scratch pair (ddParts.mulTo, ddParts.addTo), building no objects.
 */
export function positiveDefiniteDeterminant(hi: Float64Array, lo: Float64Array, m: number): DoubleDouble {
  let detHi = 1;
  let detLo = 0;
  const column = new Float64Array(2 * m); // a_jk for j > k, before scaling: the multipliers' numerators
  const scratch = new Float64Array(2);
  for (let k = 0; k < m; k++) {
    const dHi = hi[k * m + k];
    const dLo = lo[k * m + k];
    if (!(dHi > 0)) throw new RangeError(`positiveDefiniteDeterminant: pivot ${k} is ${dHi}, the matrix is not positive definite`);
    [detHi, detLo] = ddParts.mul(detHi, detLo, dHi, dLo);
    for (let j = k + 1; j < m; j++) {
      column[2 * j] = hi[j * m + k];
      column[2 * j + 1] = lo[j * m + k];
    }
    const [rHi, rLo] = ddParts.div(1, 0, dHi, dLo);
    for (let i = k + 1; i < m; i++) {
      // l_ik = a_ik·(1/d_k), then a_ij −= l_ik·a_jk for k < j ≤ i (lower triangle)
      ddParts.mulTo(scratch, column[2 * i], column[2 * i + 1], rHi, rLo);
      const lHi = scratch[0];
      const lLo = scratch[1];
      const row = i * m;
      for (let j = k + 1; j <= i; j++) {
        ddParts.mulTo(scratch, lHi, lLo, column[2 * j], column[2 * j + 1]);
        ddParts.addTo(scratch, hi[row + j], lo[row + j], -scratch[0], -scratch[1]);
        hi[row + j] = scratch[0];
        lo[row + j] = scratch[1];
      }
    }
  }
  return { hi: detHi, lo: detLo };
}
