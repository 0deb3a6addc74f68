import { describe, expect, it } from 'vitest';
import { chainStatistics } from '../../../harness/numeric/chain-statistics.js';
import { complex, type Complex } from '../../../harness/numeric/complex.js';
import { eigenpairs } from '../../../harness/numeric/eigen.js';
import { randomStream } from '../../../harness/numeric/random-stream.js';
import { chainTrace } from '../../../harness/numeric/resolvent-statistics.js';
import { sampleMatrix } from '../../../harness/numeric/sample-wigner.js';
import { diagonalMatrix, identityMatrix, zeroMatrix, type SquareMatrix } from '../../../harness/numeric/square-matrix.js';
import { weightKind } from '../../../harness/numeric/weight-kind.js';

function generalWeight(n: number, seed: number): SquareMatrix {
  const m = zeroMatrix('complex', n);
  const s = randomStream(seed, 'chain-statistics-weight', 0);
  for (let k = 0; k < m.data.length; k++) m.data[k] = s.nextNormal();
  return m;
}

function shift(n: number): SquareMatrix {
  const m = zeroMatrix('real', n);
  for (let i = 0; i < n; i++) m.data[i * n + ((i + 1) % n)] = 1;
  return m;
}

describe('weightKind', () => {
  it('tells the identity, diagonal and general weights apart, exactly', () => {
    expect(weightKind(identityMatrix('real', 4))).toBe('identity');
    expect(weightKind(identityMatrix('complex', 4))).toBe('identity');
    expect(weightKind(diagonalMatrix('real', [1, 2, 3]))).toBe('diagonal');
    expect(weightKind(shift(4))).toBe('general');
    const almost = identityMatrix('real', 3);
    almost.data[4] = 1 + Number.EPSILON;
    expect(weightKind(almost)).toBe('diagonal');
  });
});

describe('chainStatistics', () => {
  for (const kind of ['goe', 'gue'] as const) {
    it(`agrees with chainTrace (one decomposition per chain) for every shape of chain, ${kind}`, () => {
      const n = 24;
      const h = sampleMatrix({ kind }, n, randomStream(3, 'chain-statistics', kind === 'goe' ? 0 : 1));
      const I = identityMatrix('real', n);
      const D = diagonalMatrix('real', Array.from({ length: n }, (_, i) => (i % 3) - 1));
      const P = shift(n);
      const A = generalWeight(n, 5);
      const z1 = complex(-0.7, 0.4);
      const z2 = complex(0.3, -0.9);
      const z3 = complex(2.2, 0.2);
      const chains = [
        { points: [z1], weights: [I] },
        { points: [z1, z2, z1], weights: [I, I, I] },
        { points: [z2], weights: [D] },
        { points: [z1], weights: [A] },
        { points: [z1, z2], weights: [I, P] },
        { points: [z1, z2], weights: [D, I] },
        { points: [z1, z2], weights: [A, P] },
        { points: [z3, z1, z2], weights: [D, A, I] },
      ];
      const decomposition = eigenpairs(h);
      const values = chainStatistics(h, [{ points: [], weights: [] }, ...chains]);
      expect(values[0]).toEqual({ re: 1, im: 0 });
      chains.forEach((chain, j) => {
        const expected: Complex = chainTrace(decomposition, chain.points, chain.weights);
        const scale = Math.max(1, Math.hypot(expected.re, expected.im));
        // Both are O(N ε κ) accurate (chain-trace.ts); 1e-11 relative leaves room for the
        // different summation orders.
        expect(Math.hypot(values[j + 1].re - expected.re, values[j + 1].im - expected.im) / scale).toBeLessThan(1e-11);
      });
    });
  }

  it('rejects a chain whose weights do not match its points', () => {
    const h = sampleMatrix({ kind: 'goe' }, 5, randomStream(1, 'x', 0));
    expect(() => chainStatistics(h, [{ points: [complex(0, 1)], weights: [] }])).toThrow(RangeError);
  });
});
