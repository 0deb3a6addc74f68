import { describe, expect, it } from 'vitest';
import type { SymmetricTridiagonal } from '../../../harness/numeric/symmetric-tridiagonal.js';
import { tridiagonalEigenvalues } from '../../../harness/numeric/tridiagonal-eigenvalues.js';
import { tridiagonalEigenpairs } from '../../../harness/numeric/tridiagonal-ql.js';

/**
 * The tridiagonal QL iterations on their own, against the closed form for the symmetric Toeplitz
 * tridiagonal matrix tridiag(b, a, b) of order N: eigenvalues a + 2b cos(kπ/(N + 1)), k = 1 … N,
 * eigenvectors x_j = sin(jkπ/(N + 1)) (standard result; e.g. G. D. Smith, Numerical Solution of
 * Partial Differential Equations, 3rd ed., Oxford, 1985, §2.11).
 */
function toeplitz(n: number, a: number, b: number): SymmetricTridiagonal {
  return { diagonal: new Float64Array(n).fill(a), offDiagonal: new Float64Array(Math.max(n - 1, 0)).fill(b) };
}

function closedForm(n: number, a: number, b: number): number[] {
  return Array.from({ length: n }, (_, k) => a + 2 * b * Math.cos(((k + 1) * Math.PI) / (n + 1))).sort((x, y) => x - y);
}

// Both sides are accurate to a few ulps of ‖T‖ ≤ |a| + 2|b|; 50 N ulp as in the LAPACK ratios.
const tol = (n: number, a: number, b: number): number => 50 * n * Number.EPSILON * (Math.abs(a) + 2 * Math.abs(b));

describe('tridiagonal QL against the Toeplitz closed form', () => {
  it('eigenvalues, root-free QL (dsterf variant)', () => {
    for (const [n, a, b] of [[1, 0.5, 1], [2, -1, 0.25], [17, 0.3, -1], [64, 2, 1e-3], [40, 1e-200, 3e-200], [40, 1e200, -2e200]]) {
      const values = tridiagonalEigenvalues(toeplitz(n, a, b));
      const expected = closedForm(n, a, b);
      for (let k = 0; k < n; k++) expect(Math.abs(values[k] - expected[k]), `N=${n} a=${a} b=${b} k=${k}`).toBeLessThanOrEqual(tol(n, a, b));
    }
  });

  it('eigenpairs: values match and each row is a unit eigenvector of T', () => {
    for (const [n, a, b] of [[5, 0, 1], [30, -0.7, 0.4]]) {
      const rows = new Float64Array(n * n);
      for (let i = 0; i < n; i++) rows[i * n + i] = 1;
      const values = tridiagonalEigenpairs(toeplitz(n, a, b), rows, n);
      const sorted = Array.from(values).sort((x, y) => x - y);
      const expected = closedForm(n, a, b);
      for (let k = 0; k < n; k++) expect(Math.abs(sorted[k] - expected[k])).toBeLessThanOrEqual(tol(n, a, b));
      for (let j = 0; j < n; j++) {
        let norm2 = 0;
        for (let i = 0; i < n; i++) {
          const x = rows[j * n + i];
          norm2 += x * x;
          // (T x)_i − λ x_i
          const tx = a * x + (i > 0 ? b * rows[j * n + i - 1] : 0) + (i < n - 1 ? b * rows[j * n + i + 1] : 0);
          expect(Math.abs(tx - values[j] * x)).toBeLessThanOrEqual(tol(n, a, b));
        }
        expect(Math.abs(norm2 - 1)).toBeLessThanOrEqual(50 * n * Number.EPSILON);
      }
    }
  });

  it('throws a RangeError on non-finite input instead of iterating', () => {
    const bad: SymmetricTridiagonal = { diagonal: Float64Array.of(1, Number.NaN, 2), offDiagonal: Float64Array.of(0.5, 0.5) };
    expect(() => tridiagonalEigenvalues(bad)).toThrow(RangeError);
    expect(() => tridiagonalEigenpairs(bad, new Float64Array(9), 3)).toThrow(RangeError);
    const inf: SymmetricTridiagonal = { diagonal: Float64Array.of(1, 2), offDiagonal: Float64Array.of(Number.POSITIVE_INFINITY) };
    expect(() => tridiagonalEigenvalues(inf)).toThrow(/non-finite/);
  });
});
