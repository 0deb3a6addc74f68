import { complexProduct, conjugateTransposeProduct } from './complex-matrix-product.js';
import type { SpectralDecomposition } from './spectral-decomposition.js';
import { asComplex, type SquareMatrix } from './square-matrix.js';

/**
 * A weight seen in the eigenbasis, B = V* A V (N×N, complex interleaved, row-major), for a
 * decomposition H = V Λ V* from `eigenpairs`. A need not be Hermitian, and a real decomposition
 * takes complex weights (V is promoted).
 *
 * Method: W = A V, then B = V* W, each as row-major axpy loops (contiguous inner loops); real V
 * with real A is done in real arithmetic. Cost 4N³ flops real, 16N³ complex. Each entry of B has
 * absolute error O(N ε ‖A‖) (standard bound for matrix products, Higham 2002, Accuracy and
 * Stability of Numerical Algorithms, 2nd ed., SIAM, §3.5).
 */
export function eigenbasisMatrix(decomp: SpectralDecomposition, weight: SquareMatrix): Float64Array {
  const n = checkedWeight(decomp, weight, 'eigenbasisMatrix');
  if (decomp.field === 'real' && weight.field === 'real') return interleave(realEigenbasisMatrix(decomp.vectors, weight.data, n));
  const v = complexVectors(decomp);
  return conjugateTransposeProduct(v, complexProduct(asComplex(weight).data, v, n), n);
}

/** Checks that the weight matches the decomposition; returns N. */
export function checkedWeight(decomp: SpectralDecomposition, weight: SquareMatrix, caller: string): number {
  const n = decomp.size;
  if (weight.size !== n) throw new RangeError(`${caller}: weight is ${weight.size}×${weight.size}, decomposition is ${n}×${n}`);
  const expected = (weight.field === 'complex' ? 2 : 1) * n * n;
  if (weight.data.length !== expected) {
    throw new RangeError(`${caller}: ${weight.field} weight of size ${n} needs ${expected} numbers, got ${weight.data.length}`);
  }
  return n;
}

/** V as complex interleaved (a copy with zero imaginary parts when the decomposition is real). */
export function complexVectors(decomp: SpectralDecomposition): Float64Array {
  if (decomp.field === 'complex') return decomp.vectors;
  const out = new Float64Array(2 * decomp.vectors.length);
  for (let k = 0; k < decomp.vectors.length; k++) out[2 * k] = decomp.vectors[k];
  return out;
}

function realEigenbasisMatrix(v: Float64Array, a: Float64Array, n: number): Float64Array {
  const w = new Float64Array(n * n);
  for (let r = 0; r < n; r++) {
    const wr = r * n;
    for (let s = 0; s < n; s++) {
      const ars = a[wr + s];
      if (ars === 0) continue;
      const vs = s * n;
      for (let k = 0; k < n; k++) w[wr + k] += ars * v[vs + k];
    }
  }
  const b = new Float64Array(n * n);
  for (let r = 0; r < n; r++) {
    const wr = r * n;
    for (let i = 0; i < n; i++) {
      const c = v[wr + i];
      const bi = i * n;
      for (let k = 0; k < n; k++) b[bi + k] += c * w[wr + k];
    }
  }
  return b;
}

function interleave(x: Float64Array): Float64Array {
  const out = new Float64Array(2 * x.length);
  for (let k = 0; k < x.length; k++) out[2 * k] = x[k];
  return out;
}
