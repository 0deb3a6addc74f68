import { EigenvalueDecomposition, Matrix, solve } from 'ml-matrix';
import type { Complex } from '../../harness/numeric/complex.js';
import { asComplex, frobeniusNorm, type SquareMatrix } from '../../harness/numeric/square-matrix.js';
import { realEmbedding } from '../harness/numeric/spectral-fixtures.js';

/**
 * What the example kernels should answer, computed here with ml-matrix alone, through the real
 * embedding E(M) = [[Re M, −Im M], [Im M, Re M]], a ring homomorphism from complex n×n to real
 * 2n×2n matrices (common practice): E(M)⁻¹E(B) = E(M⁻¹B), E(XY) = E(X)E(Y), and Tr X is read off
 * the blocks. Eigenvalues by ml-matrix's symmetric eigensolver, resolvents by its LU `solve`, so the
 * resolvent path shares no algorithm with the kernels (numpy's LAPACK, or the Node kernel's own
 * complex elimination).
 */
export function eigenvaluesByMlMatrix(m: SquareMatrix): number[] {
  const doubled = new EigenvalueDecomposition(new Matrix(realEmbedding(m)), { assumeSymmetric: true }).realEigenvalues.sort((a, b) => a - b);
  // E(H) has each eigenvalue of H twice.
  return Array.from({ length: m.size }, (_, k) => (doubled[2 * k] + doubled[2 * k + 1]) / 2);
}

function shifted(m: SquareMatrix, z: Complex): SquareMatrix {
  const c = asComplex(m);
  const data = Float64Array.from(c.data);
  for (let i = 0; i < m.size; i++) {
    data[2 * (i * m.size + i)] -= z.re;
    data[2 * (i * m.size + i) + 1] -= z.im;
  }
  return { field: 'complex', size: m.size, data };
}

/** E((H − z)⁻¹A) by LU. */
function resolventTimes(m: SquareMatrix, z: Complex, weight: SquareMatrix): Matrix {
  return solve(new Matrix(realEmbedding(shifted(m, z))), new Matrix(realEmbedding(weight)));
}

/** Tr X / n from E(X): the top-left block carries Re X, the bottom-left block Im X. */
function normalisedTraceOfEmbedding(x: Matrix, n: number): Complex {
  let re = 0;
  let im = 0;
  for (let i = 0; i < n; i++) {
    re += x.get(i, i);
    im += x.get(n + i, i);
  }
  return { re: re / n, im: im / n };
}

export function resolventTraceByMlMatrix(m: SquareMatrix, points: readonly Complex[], weight: SquareMatrix): Complex[] {
  return points.map((z) => normalisedTraceOfEmbedding(resolventTimes(m, z, weight), m.size));
}

export function chainTraceByMlMatrix(m: SquareMatrix, points: readonly Complex[], weights: readonly SquareMatrix[]): Complex {
  let product = Matrix.eye(2 * m.size);
  points.forEach((z, j) => {
    product = product.mmul(resolventTimes(m, z, weights[j]));
  });
  return normalisedTraceOfEmbedding(product, m.size);
}

/**
 * Error allowances, from the standard perturbation bounds, with a generous constant because both
 * sides round (common practice):
 * - eigenvalues: a backward-stable solver returns the exact spectrum of H + E with ‖E‖ = O(Nε‖H‖),
 *   and by Weyl's inequality each eigenvalue moves by at most ‖E‖₂ (G. H. Golub and C. F. Van Loan,
 *   2013, Matrix Computations, 4th ed., §8.1.2; section number from memory);
 * - a linear solve with H − z: relative error O(Nε κ), κ = ‖H − z‖/Im z since ‖(H − z)⁻¹‖₂ ≤ 1/|Im z|
 *   (N. J. Higham, 2002, Accuracy and Stability of Numerical Algorithms, 2nd ed., SIAM, ch. 7 and 9;
 *   from memory); the trace of G(z)A is at most ‖A‖/|Im z| in size.
 */
export const allowances = {
  eigenvalue(m: SquareMatrix): number {
    return 64 * m.size * Number.EPSILON * frobeniusNorm(m);
  },

  resolvent(m: SquareMatrix, z: Complex, weight: SquareMatrix): number {
    const eta = Math.abs(z.im);
    const kappa = (frobeniusNorm(m) + Math.hypot(z.re, z.im)) / eta;
    return 64 * m.size * Number.EPSILON * kappa * (frobeniusNorm(weight) / eta);
  },

  chain(m: SquareMatrix, points: readonly Complex[], weights: readonly SquareMatrix[]): number {
    let relative = 0;
    let size = 1;
    points.forEach((z, j) => {
      const eta = Math.abs(z.im);
      relative += (frobeniusNorm(m) + Math.hypot(z.re, z.im)) / eta;
      size *= frobeniusNorm(weights[j]) / eta;
    });
    return 64 * m.size * Number.EPSILON * relative * size;
  },
};
