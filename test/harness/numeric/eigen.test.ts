import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { eigenpairs, eigenvalues } from '../../../harness/numeric/eigen.js';
import type { Field, SquareMatrix } from '../../../harness/numeric/square-matrix.js';
import { diagonalMatrix } from '../../../harness/numeric/square-matrix.js';
import {
  gradedHermitian,
  oneNorm,
  orthogonalityRatio,
  randomHermitian,
  realEmbedding,
  realRows,
  residualRatio,
  withSpectrum,
} from './spectral-fixtures.js';

/**
 * The threshold on LAPACK's normalised test ratios: 50, the value in LAPACK's symmetric
 * eigensolver test input TESTING/sep.in (LAPACK 3.x test suite; figure as given in our brief and
 * from memory). A correct backward-stable solver gives ratios of order 1.
 */
const THRESHOLD = 50;
const ULP = Number.EPSILON;
const FIELDS: readonly Field[] = ['real', 'complex'];

/** Eigenvalue agreement allowed between two backward-stable solvers: each is within O(N ulp ‖A‖). */
function eigenvalueTolerance(m: SquareMatrix): number {
  return THRESHOLD * Math.max(m.size, 1) * ULP * Math.max(oneNorm(m), Number.MIN_VALUE);
}

function expectClose(label: string, observed: ArrayLike<number>, expected: ArrayLike<number>, tolerance: number): void {
  expect(observed.length, `${label}: length`).toBe(expected.length);
  for (let i = 0; i < expected.length; i++) {
    const diff = Math.abs(observed[i] - expected[i]);
    expect(diff, `${label}: λ[${i}] observed ${observed[i]}, expected ${expected[i]}, tolerance ${tolerance}`).toBeLessThanOrEqual(tolerance);
  }
}

function expectStable(label: string, m: SquareMatrix): void {
  const dec = eigenpairs(m);
  const residual = residualRatio(m, dec);
  const orthogonality = orthogonalityRatio(dec);
  expect(residual, `${label}: ‖AV − VΛ‖/(N‖A‖ulp)`).toBeLessThan(THRESHOLD);
  expect(orthogonality, `${label}: ‖V*V − I‖/(N ulp)`).toBeLessThan(THRESHOLD);
  for (let i = 1; i < dec.values.length; i++) expect(dec.values[i], `${label}: ascending`).toBeGreaterThanOrEqual(dec.values[i - 1]);
  // eigenvalues() and eigenpairs() run different QL variants; both are backward stable.
  expectClose(`${label}: eigenvalues() vs eigenpairs()`, eigenvalues(m), dec.values, eigenvalueTolerance(m));
}

describe('eigenvalues and eigenpairs: small and special inputs', () => {
  it('N = 0 gives empty results', () => {
    for (const field of FIELDS) {
      const m: SquareMatrix = { field, size: 0, data: new Float64Array(0) };
      expect(eigenvalues(m)).toEqual(new Float64Array(0));
      const dec = eigenpairs(m);
      expect(dec.values.length).toBe(0);
      expect(dec.vectors.length).toBe(0);
    }
  });

  it('N = 1 gives the entry and the unit vector', () => {
    expect(Array.from(eigenvalues({ field: 'real', size: 1, data: Float64Array.of(-2.5) }))).toEqual([-2.5]);
    const dec = eigenpairs({ field: 'complex', size: 1, data: Float64Array.of(3, 0) });
    expect(Array.from(dec.values)).toEqual([3]);
    expect(Array.from(dec.vectors)).toEqual([1, 0]);
  });

  it('N = 2 matches the closed form (a + c)/2 ± √(((a − c)/2)² + |b|²) (common practice)', () => {
    const a = 0.3;
    const c = -1.1;
    const b = { re: 0.7, im: -0.4 };
    const root = Math.hypot((a - c) / 2, Math.hypot(b.re, b.im));
    const expected = [(a + c) / 2 - root, (a + c) / 2 + root];
    const m: SquareMatrix = { field: 'complex', size: 2, data: Float64Array.of(a, 0, b.re, -b.im, b.re, b.im, c, 0) };
    expectClose('complex 2×2', eigenvalues(m), expected, 4 * ULP * 2);
    expectClose('complex 2×2 pairs', eigenpairs(m).values, expected, 4 * ULP * 2);
    for (const field of FIELDS) for (const seed of [1, 2, 3]) expectStable(`${field} N=2 seed ${seed}`, randomHermitian(field, 2, seed));
  });

  it('a diagonal matrix gives its sorted diagonal exactly', () => {
    const diag = [3, -1, 0, 2.5, -1, 7e-9, -4e12];
    const sorted = [...diag].sort((x, y) => x - y);
    for (const field of FIELDS) {
      const m = diagonalMatrix(field, diag);
      expect(Array.from(eigenvalues(m))).toEqual(sorted);
      expect(Array.from(eigenpairs(m).values)).toEqual(sorted);
      expectStable(`${field} diagonal`, m);
    }
  });

  it('reads only the lower triangle', () => {
    for (const field of FIELDS) {
      const m = randomHermitian(field, 9, 4);
      const scrambled = Float64Array.from(m.data);
      const stride = field === 'complex' ? 2 : 1;
      for (let i = 0; i < 9; i++) for (let j = i + 1; j < 9; j++) scrambled[stride * (i * 9 + j)] = 1e300 * (i - j);
      const other: SquareMatrix = { field, size: 9, data: scrambled };
      expect(Array.from(eigenvalues(other))).toEqual(Array.from(eigenvalues(m)));
      expect(Array.from(eigenpairs(other).vectors)).toEqual(Array.from(eigenpairs(m).vectors));
    }
  });

  it('rejects non-finite entries and malformed input with a RangeError', () => {
    for (const field of FIELDS) {
      for (const bad of [Number.NaN, Number.POSITIVE_INFINITY]) {
        const m = randomHermitian(field, 6, 5);
        m.data[(field === 'complex' ? 2 : 1) * (4 * 6 + 2)] = bad;
        expect(() => eigenvalues(m)).toThrow(RangeError);
        expect(() => eigenpairs(m)).toThrow(/entry \(4, 2\)/);
      }
    }
    expect(() => eigenvalues({ field: 'real', size: 3, data: new Float64Array(8) })).toThrow(RangeError);
  });
});

describe('eigenvalues against ml-matrix (independent implementation, EigenvalueDecomposition)', () => {
  it('real symmetric random matrices', () => {
    for (const [n, seed] of [[3, 11], [10, 12], [40, 13]]) {
      const m = randomHermitian('real', n, seed);
      const reference = new EigenvalueDecomposition(new Matrix(realRows(m)), { assumeSymmetric: true }).realEigenvalues;
      const sorted = [...reference].sort((x, y) => x - y);
      expectClose(`real N=${n}`, eigenvalues(m), sorted, eigenvalueTolerance(m));
      expectClose(`real N=${n} pairs`, eigenpairs(m).values, sorted, eigenvalueTolerance(m));
    }
  });

  it('complex Hermitian via the real embedding [[A, −B], [B, A]], each eigenvalue doubled', () => {
    for (const [n, seed] of [[4, 21], [17, 22], [30, 23]]) {
      const m = randomHermitian('complex', n, seed);
      const reference = new EigenvalueDecomposition(new Matrix(realEmbedding(m)), { assumeSymmetric: true }).realEigenvalues;
      const sorted = [...reference].sort((x, y) => x - y);
      const everyOther = sorted.filter((_, i) => i % 2 === 0);
      // The pairs must really be doubled: adjacent members of a pair agree to rounding.
      for (let i = 0; i < n; i++) expect(Math.abs(sorted[2 * i + 1] - sorted[2 * i])).toBeLessThanOrEqual(eigenvalueTolerance(m));
      expectClose(`complex N=${n}`, eigenvalues(m), everyOther, eigenvalueTolerance(m));
      expectClose(`complex N=${n} pairs`, eigenpairs(m).values, everyOther, eigenvalueTolerance(m));
    }
  });
});

describe('LAPACK-style residual and orthogonality ratios below 50', () => {
  for (const field of FIELDS) {
    it(`${field}: random matrices, N = 1 … 60`, () => {
      for (const n of [1, 2, 3, 4, 5, 8, 20, 60]) expectStable(`${field} random N=${n}`, randomHermitian(field, n, 100 + n));
    });

    it(`${field}: graded matrices (entries over 24 orders of magnitude)`, () => {
      for (const n of [6, 25]) expectStable(`${field} graded N=${n}`, gradedHermitian(field, n, 200 + n, 12));
      // Graded the other way round, so the large entries come last.
      const m = gradedHermitian(field, 25, 300, 12);
      const n = 25;
      const stride = field === 'complex' ? 2 : 1;
      const flipped = new Float64Array(m.data.length);
      for (let i = 0; i < n; i++) {
        for (let j = 0; j < n; j++) {
          for (let c = 0; c < stride; c++) flipped[stride * ((n - 1 - i) * n + (n - 1 - j)) + c] = m.data[stride * (i * n + j) + c];
        }
      }
      expectStable(`${field} graded reversed`, { field, size: n, data: flipped });
    });

    it(`${field}: clustered eigenvalues (gaps of 1e-13 and 1e-15)`, () => {
      const spectrum = [
        ...Array.from({ length: 8 }, (_, k) => 1 + k * 1e-13),
        ...Array.from({ length: 6 }, (_, k) => -0.5 + k * 1e-15),
        ...Array.from({ length: 6 }, (_, k) => 0.25 * k),
      ];
      const m = withSpectrum(field, spectrum, 400);
      expectStable(`${field} clustered`, m);
      // The prescribed spectrum is exact up to the rounding of forming U Λ U* (Weyl: O(N ulp ‖A‖)).
      expectClose(`${field} clustered spectrum`, eigenvalues(m), [...spectrum].sort((x, y) => x - y), eigenvalueTolerance(m));
    });

    it(`${field}: a tridiagonal matrix (reflectors with τ = 0) and a zero matrix`, () => {
      const n = 12;
      const stride = field === 'complex' ? 2 : 1;
      const data = new Float64Array(stride * n * n);
      for (let i = 0; i < n; i++) {
        data[stride * (i * n + i)] = Math.cos(i);
        if (i > 0) {
          data[stride * (i * n + i - 1)] = 0.5;
          data[stride * ((i - 1) * n + i)] = 0.5;
        }
      }
      expectStable(`${field} tridiagonal`, { field, size: n, data });
      const zero: SquareMatrix = { field, size: 5, data: new Float64Array(stride * 25) };
      expect(Array.from(eigenvalues(zero))).toEqual([0, 0, 0, 0, 0]);
      expect(orthogonalityRatio(eigenpairs(zero))).toBe(0);
    });
  }

  it('one moderate case: N = 150, real and complex', () => {
    expectStable('real random N=150', randomHermitian('real', 150, 500));
    expectStable('complex random N=150', randomHermitian('complex', 150, 501));
  });
});
