// Eigenvalues of a real symmetric or complex Hermitian matrix with ml-matrix, for the example kernel.
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';

/**
 * Eigenvalues, ascending, of { size, field, data } by ml-matrix's symmetric eigensolver
 * (Householder tridiagonalisation and QL, after JAMA). A complex Hermitian H = A + iB goes through
 * the real symmetric embedding [[A, −B], [B, A]]: (A + iB)(x + iy) = λ(x + iy) gives it the
 * eigenvectors (x, y) and (−y, x) for each λ, so its spectrum is that of H with every eigenvalue
 * twice, and every other one is kept.
 */
export function hermitianEigenvalues({ size: n, field, data }) {
  if (field === 'real') {
    const rows = Array.from({ length: n }, (_, i) => Array.from(data.subarray(i * n, (i + 1) * n)));
    return new EigenvalueDecomposition(new Matrix(rows), { assumeSymmetric: true }).realEigenvalues.sort((a, b) => a - b);
  }
  const embedded = Matrix.zeros(2 * n, 2 * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const re = data[2 * (i * n + j)];
      const im = data[2 * (i * n + j) + 1];
      embedded.set(i, j, re);
      embedded.set(n + i, n + j, re);
      embedded.set(i, n + j, -im);
      embedded.set(n + i, j, im);
    }
  }
  const doubled = new EigenvalueDecomposition(embedded, { assumeSymmetric: true }).realEigenvalues.sort((a, b) => a - b);
  return doubled.filter((_, k) => k % 2 === 0);
}
