import { describe, expect, it } from 'vitest';
import { largestEigenvalue, sturmBisection } from '../../../harness/numeric/sturm-bisection.js';
import type { SymmetricTridiagonal } from '../../../harness/numeric/symmetric-tridiagonal.js';
import { tridiagonalEigenvalues } from '../../../harness/numeric/tridiagonal-eigenvalues.js';
import { testStream } from './spectral-fixtures.js';

/**
 * Sturm bisection against the root-free QL eigenvalues of the same tridiagonal matrices. Both are
 * accurate to a small multiple of ε‖T‖ in absolute terms (Demmel, Dhillon and Ren 1995 for the
 * guarded Sturm count; Golub and Van Loan 2013, §8.3.5 for QL), so they must agree within
 * THRESHOLD·N·ε·‖T‖, THRESHOLD = 50 as in the LAPACK ratio tests of eigen.test.ts.
 */
const THRESHOLD = 50;

function norm(t: SymmetricTridiagonal): number {
  let m = 0;
  const n = t.diagonal.length;
  for (let i = 0; i < n; i++) m = Math.max(m, Math.abs(t.diagonal[i]) + (i > 0 ? Math.abs(t.offDiagonal[i - 1]) : 0) + (i < n - 1 ? Math.abs(t.offDiagonal[i]) : 0));
  return m;
}

function expectAllAgree(label: string, t: SymmetricTridiagonal): void {
  const n = t.diagonal.length;
  const reference = tridiagonalEigenvalues(t);
  const bisection = sturmBisection(t);
  const tolerance = THRESHOLD * n * Number.EPSILON * Math.max(norm(t), Number.MIN_VALUE);
  for (let k = 0; k < n; k++) {
    const value = bisection.eigenvalue(k);
    const diff = Math.abs(value - reference[k]);
    expect(diff, `${label}: N=${n} k=${k} bisection ${value}, QL ${reference[k]}, difference ${diff}, tolerance ${tolerance}`).toBeLessThanOrEqual(tolerance);
  }
  expect(largestEigenvalue(t)).toBe(bisection.eigenvalue(n - 1));
  expect(bisection.lower).toBeLessThanOrEqual(reference[0]);
  expect(bisection.upper).toBeGreaterThanOrEqual(reference[n - 1]);
}

function randomTridiagonal(n: number, seed: number): SymmetricTridiagonal {
  const draw = testStream(seed);
  return { diagonal: Float64Array.from({ length: n }, draw), offDiagonal: Float64Array.from({ length: n - 1 }, draw) };
}

describe('Sturm count', () => {
  it('counts the eigenvalues below x: between consecutive QL eigenvalues it equals the index', () => {
    const t = randomTridiagonal(40, 7);
    const values = tridiagonalEigenvalues(t);
    const bisection = sturmBisection(t);
    expect(bisection.countBelow(values[0] - 1)).toBe(0);
    expect(bisection.countBelow(values[39] + 1)).toBe(40);
    for (let k = 1; k < 40; k++) expect(bisection.countBelow((values[k - 1] + values[k]) / 2), `between λ${k - 1} and λ${k}`).toBe(k);
  });

  it('survives an exactly zero pivot (the dstebz guard): T = tridiag(1; 0, 0, 0) at x = 0', () => {
    // d − x = 0 for every row: the first pivot is exactly zero, and without the guard the next
    // one would be 0 − 1/0 = −∞ and the one after 0 − 1/(−∞) = 0 again.
    const t: SymmetricTridiagonal = { diagonal: new Float64Array(4), offDiagonal: new Float64Array(3).fill(1) };
    // Eigenvalues 2cos(kπ/5): two negative, two positive (Toeplitz closed form, as in tridiagonal-ql.test.ts).
    expect(sturmBisection(t).countBelow(0)).toBe(2);
    expectAllAgree('zero diagonal', t);
  });
});

describe('Sturm bisection against QL eigenvalues', () => {
  it('random matrices, N = 1 … 200', () => {
    for (const n of [1, 2, 3, 10, 57, 200]) expectAllAgree(`random seed ${n}`, randomTridiagonal(n, 300 + n));
  });

  it('graded matrices (entries from 1 down to 1e-30), both ways round', () => {
    const n = 30;
    const diagonal = Float64Array.from({ length: n }, (_, i) => 10 ** -i * (1 + 0.1 * Math.sin(i)));
    const offDiagonal = Float64Array.from({ length: n - 1 }, (_, i) => 10 ** (-i - 0.5));
    expectAllAgree('graded down', { diagonal, offDiagonal });
    expectAllAgree('graded up', { diagonal: diagonal.slice().reverse(), offDiagonal: offDiagonal.slice().reverse() });
  });

  it("clustered: Wilkinson's W21+ (pairs of eigenvalues agreeing to 1e-14) and a split matrix with repeated eigenvalues", () => {
    // W21+: diagonal |10 − i|, i = 0 … 20, off-diagonal 1 (J. H. Wilkinson, The Algebraic Eigenvalue
    // Problem, Oxford, 1965, ch. 5, §45).
    const w: SymmetricTridiagonal = { diagonal: Float64Array.from({ length: 21 }, (_, i) => Math.abs(10 - i)), offDiagonal: new Float64Array(20).fill(1) };
    expectAllAgree('W21+', w);
    // Three identical unreduced blocks: every eigenvalue is triple.
    const block = randomTridiagonal(5, 11);
    const diagonal = new Float64Array(15);
    const offDiagonal = new Float64Array(14);
    for (let b = 0; b < 3; b++) {
      diagonal.set(block.diagonal, 5 * b);
      offDiagonal.set(block.offDiagonal, 5 * b);
    }
    expectAllAgree('three equal blocks', { diagonal, offDiagonal });
  });

  it('entries near the ends of the double range are scaled, not overflowed', () => {
    for (const s of [1e200, 1e-200]) {
      const t = randomTridiagonal(25, 5);
      expectAllAgree(`scaled by ${s}`, { diagonal: t.diagonal.map((x) => x * s), offDiagonal: t.offDiagonal.map((x) => x * s) });
    }
  });

  it('a coarse tolerance stops early and stays within it', () => {
    const t = randomTridiagonal(80, 9);
    const exact = tridiagonalEigenvalues(t)[79];
    for (const tolerance of [1e-3, 1e-8]) expect(Math.abs(largestEigenvalue(t, tolerance) - exact)).toBeLessThanOrEqual(tolerance);
  });

  it('rejects empty and non-finite input and bad indices', () => {
    expect(() => sturmBisection({ diagonal: new Float64Array(0), offDiagonal: new Float64Array(0) })).toThrow(RangeError);
    expect(() => sturmBisection({ diagonal: Float64Array.of(1, Number.NaN), offDiagonal: Float64Array.of(1) })).toThrow(/non-finite/);
    expect(() => sturmBisection(randomTridiagonal(3, 1)).eigenvalue(3)).toThrow(RangeError);
  });
});
