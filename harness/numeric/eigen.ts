import { scaleRows } from './complex-matrix-product.js';
import { transposedRealFactor, transposedUnitaryFactor } from './orthogonal-factor.js';
import type { SpectralDecomposition } from './spectral-decomposition.js';
import { expectedDataLength, type SquareMatrix } from './square-matrix.js';
import { tridiagonalEigenvalues } from './tridiagonal-eigenvalues.js';
import { tridiagonalEigenpairs } from './tridiagonal-ql.js';
import { tridiagonaliseHermitian } from './tridiagonalise-hermitian.js';
import { tridiagonaliseReal } from './tridiagonalise-real.js';

/**
 * The harness's Hermitian eigen-solver: eigenvalues, or eigenvalues and eigenvectors, of a real
 * symmetric or complex Hermitian matrix.
 *
 * Only the LOWER triangle is read (entries (i, j) with i ≥ j, and only the real part of the
 * diagonal): the matrix is taken to be Hermitian, with the upper triangle the conjugate transpose
 * of the lower. A non-finite entry in the lower triangle is a RangeError.
 *
 * Method: Householder reduction to real symmetric tridiagonal form (tridiagonalise-real.ts,
 * tridiagonalise-hermitian.ts; Golub and Van Loan 2013, §8.3.1; LAPACK dsytrd/zhetrd), then
 * implicit QL with Wilkinson shifts: root-free for eigenvalues alone (tridiagonal-eigenvalues.ts,
 * after LAPACK dsterf), with Givens rotations accumulated onto the Householder factor for
 * eigenvectors (orthogonal-factor.ts and tridiagonal-ql.ts, after LAPACK dorgtr and dsteqr;
 * Numerical Recipes tred2/tqli). The real reduction's inner loop runs as a WebAssembly SIMD kernel
 * where the engine has one (fused-sweep-kernel.ts), else in scalar code.
 *
 * Accuracy (Golub and Van Loan 2013, §8.3.5): the computed eigenvalues are exact for a matrix
 * within O(N ε ‖A‖) of A, so each has absolute error O(N ε ‖A‖); the eigenvectors satisfy
 * ‖AV − VΛ‖ = O(N ε ‖A‖) and ‖V*V − I‖ = O(N ε).
 *
 * Cost: eigenvalues (4/3)N³ flops (real) or (16/3)N³ (complex) plus O(N²); eigenpairs adds the
 * accumulation ((4/3)N³) and the rotations (about 6N³; complex twice that).
 *
 * References: G. H. Golub and C. F. Van Loan, Matrix Computations, 4th ed., Johns Hopkins
 * University Press, 2013, §8.3. E. Anderson et al., LAPACK Users' Guide, 3rd ed., SIAM, 1999.
 * W. H. Press et al., Numerical Recipes, 3rd ed., Cambridge University Press, 2007, §11.3–11.4.
 */
export function eigenvalues(m: SquareMatrix): Float64Array {
  const n = checkedSize(m, 'eigenvalues');
  const tridiagonal =
    m.field === 'real'
      ? tridiagonaliseReal(m.data, n, false).tridiagonal
      : tridiagonaliseHermitian(Float64Array.from(m.data), n, false).tridiagonal;
  return tridiagonalEigenvalues(tridiagonal);
}

/** Eigenvalues (ascending) and orthonormal eigenvectors; see `eigenvalues` for method and input. */
export function eigenpairs(m: SquareMatrix): SpectralDecomposition {
  const n = checkedSize(m, 'eigenpairs');
  if (m.field === 'real') {
    const reduction = tridiagonaliseReal(m.data, n, true);
    const rows = reduction.reflectors !== null && n >= 3 ? transposedRealFactor(reduction.reflectors, reduction.tau, n) : identity(n, 1);
    const values = tridiagonalEigenpairs(reduction.tridiagonal, rows, n);
    return sortedDecomposition('real', n, values, rows);
  }
  const work = Float64Array.from(m.data);
  const reduction = tridiagonaliseHermitian(work, n, true);
  const rows = n >= 3 ? transposedUnitaryFactor(work, reduction.tau, n) : identity(n, 2);
  // Row r of (Q D)ᵀ is δ_r times row r of Qᵀ.
  scaleRows(rows, reduction.phases, n);
  const values = tridiagonalEigenpairs(reduction.tridiagonal, rows, 2 * n);
  return sortedDecomposition('complex', n, values, rows);
}

function checkedSize(m: SquareMatrix, caller: string): number {
  const n = m.size;
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`${caller}: matrix size must be a non-negative integer, got ${n}`);
  if (m.data.length !== expectedDataLength(m.field, n)) {
    throw new RangeError(`${caller}: ${m.field} matrix of size ${n} needs ${expectedDataLength(m.field, n)} numbers, got ${m.data.length}`);
  }
  const stride = m.field === 'complex' ? 2 : 1;
  for (let i = 0; i < n; i++) {
    for (let k = i * n * stride; k <= (i * n + i) * stride; k++) {
      if (!Number.isFinite(m.data[k])) {
        const j = Math.floor(k / stride) - i * n;
        throw new RangeError(`${caller}: entry (${i}, ${j}) is ${m.data[k]}; the matrix must be finite`);
      }
    }
  }
  return n;
}

function identity(n: number, stride: number): Float64Array {
  const out = new Float64Array(stride * n * n);
  for (let i = 0; i < n; i++) out[stride * (i * n + i)] = 1;
  return out;
}

/** Sorts the eigenvalues ascending and lays the eigenvector rows out as columns of V. */
function sortedDecomposition(field: 'real' | 'complex', n: number, values: Float64Array, rows: Float64Array): SpectralDecomposition {
  const order = Array.from({ length: n }, (_, i) => i).sort((x, y) => values[x] - values[y]);
  const sorted = Float64Array.from(order, (i) => values[i]);
  const stride = field === 'complex' ? 2 : 1;
  const vectors = new Float64Array(stride * n * n);
  for (let j = 0; j < n; j++) {
    const src = stride * order[j] * n;
    for (let r = 0; r < n; r++) {
      vectors[stride * (r * n + j)] = rows[src + stride * r];
      if (stride === 2) vectors[2 * (r * n + j) + 1] = rows[src + 2 * r + 1];
    }
  }
  return { field, size: n, values: sorted, vectors };
}
