import { describe, expect, it } from 'vitest';
import { eigenpairs } from '../../../harness/numeric/eigen.js';
import { eigenbasisDiagonal } from '../../../harness/numeric/resolvent-statistics.js';
import { randomStream } from '../../../harness/numeric/random-stream.js';
import { sampleMatrix } from '../../../harness/numeric/sample-wigner.js';
import { sparseEigenbasisDiagonal, sparseEntries } from '../../../harness/numeric/sparse-eigenbasis-diagonal.js';
import { zeroMatrix, type Field } from '../../../harness/numeric/square-matrix.js';

/** A weight with three non-zeros per row at scattered columns, complex when asked. */
function scattered(field: Field, n: number): ReturnType<typeof zeroMatrix> {
  const m = zeroMatrix(field, n);
  const s = randomStream(2, 'sparse-weight', n);
  const stride = field === 'complex' ? 2 : 1;
  for (let r = 0; r < n; r++) {
    for (const c of [r, (r * 7 + 3) % n, (r + 5) % n]) {
      m.data[stride * (r * n + c)] = s.nextNormal();
      if (stride === 2) m.data[2 * (r * n + c) + 1] = s.nextNormal();
    }
  }
  return m;
}

describe('sparseEigenbasisDiagonal', () => {
  for (const [kind, field] of [
    ['goe', 'real'],
    ['goe', 'complex'],
    ['gue', 'real'],
    ['gue', 'complex'],
  ] as const) {
    it(`agrees with the dense eigenbasis diagonal (${kind} matrix, ${field} weight)`, () => {
      const n = 30;
      const decomposition = eigenpairs(sampleMatrix({ kind }, n, randomStream(4, 'sparse-diagonal', 0)));
      const weight = scattered(field, n);
      const entries = sparseEntries(weight, 3 * n)!;
      const sparse = sparseEigenbasisDiagonal(decomposition, entries);
      const dense = eigenbasisDiagonal(decomposition, weight);
      // Both sum the same products in different orders: agreement to a few hundred ε of ‖A‖ ~ 10.
      for (let k = 0; k < 2 * n; k++) expect(Math.abs(sparse[k] - dense[k])).toBeLessThan(1e-12);
    });
  }

  it('refuses a weight with more non-zeros than the limit', () => {
    const weight = scattered('real', 10);
    const count = sparseEntries(weight, 100)!.rows.length;
    expect(sparseEntries(weight, count - 1)).toBeNull();
    expect(sparseEntries(weight, count)?.rows.length).toBe(count);
    expect(sparseEntries(zeroMatrix('real', 4), 0)?.rows.length).toBe(0);
  });
});
