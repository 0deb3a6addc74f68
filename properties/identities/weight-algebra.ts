import type { Complex } from '../../harness/numeric/complex.js';
import { entryIm, entryRe, zeroMatrix, type SquareMatrix } from '../../harness/numeric/square-matrix.js';

/**
 * The few matrix operations the identities need on weights, over the layout of square-matrix.ts
 * (row-major, complex entries interleaved).
 */

/** A* = conjugate transpose (the transpose, for a real matrix). */
export function adjoint(a: SquareMatrix): SquareMatrix {
  const n = a.size;
  const out = zeroMatrix(a.field, n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      if (a.field === 'real') {
        out.data[j * n + i] = a.data[i * n + j];
      } else {
        out.data[2 * (j * n + i)] = a.data[2 * (i * n + j)];
        out.data[2 * (j * n + i) + 1] = -a.data[2 * (i * n + j) + 1];
      }
    }
  }
  return out;
}

/** αA + βB for complex scalars α, β; complex storage whatever the inputs' fields. */
export function linearCombination(alpha: Complex, a: SquareMatrix, beta: Complex, b: SquareMatrix): SquareMatrix {
  const n = a.size;
  const out = zeroMatrix('complex', n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const ar = entryRe(a, i, j);
      const ai = entryIm(a, i, j);
      const br = entryRe(b, i, j);
      const bi = entryIm(b, i, j);
      out.data[2 * (i * n + j)] = alpha.re * ar - alpha.im * ai + beta.re * br - beta.im * bi;
      out.data[2 * (i * n + j) + 1] = alpha.re * ai + alpha.im * ar + beta.re * bi + beta.im * br;
    }
  }
  return out;
}
