import { Matrix, solve } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import type { Complex } from '../../../harness/numeric/complex.js';
import { eigenpairs, eigenvalues } from '../../../harness/numeric/eigen.js';
import {
  chainTrace,
  eigenbasisDiagonal,
  eigenbasisMatrix,
  linearStatistic,
  normalisedResolventTrace,
  weightedResolventTrace,
} from '../../../harness/numeric/resolvent-statistics.js';
import type { Field, SquareMatrix } from '../../../harness/numeric/square-matrix.js';
import { complexProduct, complexSolve, type ComplexRows, identityRows } from './complex-solve.js';
import { randomHermitian, testStream } from './spectral-fixtures.js';

const POINTS: readonly Complex[] = [
  { re: 0.3, im: 0.5 },
  { re: -1.2, im: 0.05 },
  { re: 0.1, im: -0.7 },
  { re: 2.5, im: 1e-3 },
];

function rowsOf(m: SquareMatrix): ComplexRows {
  const n = m.size;
  const c = m.field === 'complex';
  return Array.from({ length: n }, (_, i) =>
    Array.from({ length: n }, (_, j) => (c ? { re: m.data[2 * (i * n + j)], im: m.data[2 * (i * n + j) + 1] } : { re: m.data[i * n + j], im: 0 })),
  );
}

/**
 * G(z) = (H − z)⁻¹ by a direct solve: for real H through ml-matrix's `solve` on the real form
 * [[H − x, y], [−y, H − x]] [Xr; Xi] = [I; 0] of (H − z)(Xr + iXi) = I; for complex H through the
 * test's own complex Gaussian elimination (complex-solve.ts).
 */
function directResolvent(h: SquareMatrix, z: Complex): ComplexRows {
  const n = h.size;
  if (h.field === 'real') {
    const block = Matrix.zeros(2 * n, 2 * n);
    const rhs = Matrix.zeros(2 * n, n);
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        const v = h.data[i * n + j] - (i === j ? z.re : 0);
        block.set(i, j, v);
        block.set(i + n, j + n, v);
      }
      block.set(i, i + n, z.im);
      block.set(i + n, i, -z.im);
      rhs.set(i, i, 1);
    }
    const x = solve(block, rhs);
    return Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => ({ re: x.get(i, j), im: x.get(i + n, j) })));
  }
  const shifted = rowsOf(h).map((row, i) => row.map((e, j) => (i === j ? { re: e.re - z.re, im: e.im - z.im } : e)));
  return complexSolve(shifted, identityRows(n));
}

function normalisedTrace(x: ComplexRows): Complex {
  let re = 0;
  let im = 0;
  for (let i = 0; i < x.length; i++) {
    re += x[i][i].re;
    im += x[i][i].im;
  }
  return { re: re / x.length, im: im / x.length };
}

/**
 * Allowed difference between the spectral and the direct computation. Both are backward stable;
 * a perturbation of size O(N ε ‖H‖) moves G(z) by O(N ε ‖H‖ ‖G‖²), with ‖G‖ ≤ 1/|Im z|, and each
 * weight multiplies by ‖A‖ ≤ its largest entry times N. Constant 100: generous against this
 * first-order bound (common practice).
 */
function tolerance(n: number, hNorm: number, points: readonly Complex[], weightNorm = 1): number {
  let g = 1;
  for (const z of points) g *= 1 / Math.abs(z.im);
  const worstEta = Math.min(...points.map((z) => Math.abs(z.im)));
  return 100 * n * Number.EPSILON * Math.max(hNorm, 1) * g * weightNorm ** points.length * (1 / worstEta);
}

function expectComplexClose(label: string, observed: Complex, expected: Complex, tol: number): void {
  const diff = Math.hypot(observed.re - expected.re, observed.im - expected.im);
  expect(diff, `${label}: observed ${observed.re}${observed.im >= 0 ? '+' : ''}${observed.im}i, expected ${expected.re}${expected.im >= 0 ? '+' : ''}${expected.im}i, tolerance ${tol}`).toBeLessThanOrEqual(tol);
}

/** Weights of each kind: diagonal, dense real non-symmetric, dense complex non-Hermitian. */
function weights(n: number, seed: number): SquareMatrix[] {
  const draw = testStream(seed);
  const diag = new Float64Array(n * n);
  for (let i = 0; i < n; i++) diag[i * n + i] = 1 + draw();
  const dense = Float64Array.from({ length: n * n }, () => draw());
  const complex = Float64Array.from({ length: 2 * n * n }, () => draw());
  return [
    { field: 'real', size: n, data: diag },
    { field: 'real', size: n, data: dense },
    { field: 'complex', size: n, data: complex },
  ];
}

const FIELDS: readonly Field[] = ['real', 'complex'];
const N = 14;

describe('resolvent statistics against direct solves of (H − z)X = I', () => {
  for (const field of FIELDS) {
    const h = randomHermitian(field, N, field === 'real' ? 31 : 32);
    const hNorm = Math.sqrt(N);
    const dec = eigenpairs(h);

    it(`${field}: ⟨G(z)⟩ from the spectrum`, () => {
      for (const z of POINTS) {
        expectComplexClose(`⟨G(${z.re}+${z.im}i)⟩`, normalisedResolventTrace(eigenvalues(h), z), normalisedTrace(directResolvent(h, z)), tolerance(N, hNorm, [z]));
      }
    });

    it(`${field}: ⟨G(z)A⟩ from the eigenbasis diagonal, for diagonal, dense real and complex weights`, () => {
      for (const a of weights(N, 40)) {
        const diag = eigenbasisDiagonal(dec, a);
        for (const z of POINTS) {
          const expected = normalisedTrace(complexProduct(directResolvent(h, z), rowsOf(a)));
          expectComplexClose(`⟨G(z)A⟩ ${a.field}`, weightedResolventTrace(dec.values, diag, z), expected, tolerance(N, hNorm, [z], N));
        }
      }
    });

    it(`${field}: chain traces of length 1, 2 and 3 against products of explicit resolvents`, () => {
      const ws = weights(N, 41);
      for (let k = 1; k <= 3; k++) {
        const pts = POINTS.slice(0, k);
        // Mix the weight kinds along the chain.
        const chosen = pts.map((_, j) => ws[(j + k) % ws.length]);
        let product = identityRows(N);
        for (let j = 0; j < k; j++) product = complexProduct(complexProduct(product, directResolvent(h, pts[j])), rowsOf(chosen[j]));
        expectComplexClose(`chain k=${k}`, chainTrace(dec, pts, chosen), normalisedTrace(product), tolerance(N, hNorm, pts, N));
      }
    });
  }

  it('the eigenbasis matrix V*AV has the diagonal of eigenbasisDiagonal and the trace of A', () => {
    for (const field of FIELDS) {
      const dec = eigenpairs(randomHermitian(field, 9, 50));
      for (const a of weights(9, 51)) {
        const b = eigenbasisMatrix(dec, a);
        const diag = eigenbasisDiagonal(dec, a);
        let trRe = 0;
        let trIm = 0;
        for (let i = 0; i < 9; i++) {
          expect(Math.abs(b[2 * (i * 9 + i)] - diag[2 * i])).toBeLessThan(1e-13);
          expect(Math.abs(b[2 * (i * 9 + i) + 1] - diag[2 * i + 1])).toBeLessThan(1e-13);
          trRe += diag[2 * i];
          trIm += diag[2 * i + 1];
        }
        let aRe = 0;
        let aIm = 0;
        for (let i = 0; i < 9; i++) {
          aRe += a.field === 'complex' ? a.data[2 * (i * 9 + i)] : a.data[i * 9 + i];
          aIm += a.field === 'complex' ? a.data[2 * (i * 9 + i) + 1] : 0;
        }
        // Tr V*AV = Tr A (V unitary); rounding O(N ε ‖A‖).
        expect(Math.abs(trRe - aRe) + Math.abs(trIm - aIm)).toBeLessThan(1e-12);
      }
    }
  });

  it('rejects mismatched inputs with a RangeError', () => {
    const dec = eigenpairs(randomHermitian('real', 5, 60));
    const w = weights(4, 61)[0];
    expect(() => eigenbasisDiagonal(dec, w)).toThrow(RangeError);
    expect(() => chainTrace(dec, POINTS.slice(0, 2), [weights(5, 62)[0]])).toThrow(RangeError);
    expect(() => chainTrace(dec, [], [])).toThrow(RangeError);
    expect(() => weightedResolventTrace(dec.values, new Float64Array(3), POINTS[0])).toThrow(RangeError);
    expect(() => normalisedResolventTrace(new Float64Array(0), POINTS[0])).toThrow(RangeError);
  });
});

describe('linearStatistic', () => {
  it('Tr H and Tr H² equal the trace and the squared Frobenius norm (exact identities)', () => {
    for (const field of FIELDS) {
      const h = randomHermitian(field, 20, 70);
      const values = eigenvalues(h);
      let trace = 0;
      let frobenius2 = 0;
      const stride = field === 'complex' ? 2 : 1;
      for (let i = 0; i < 20; i++) trace += h.data[stride * (i * 20 + i)];
      for (const x of h.data) frobenius2 += x * x;
      // Eigenvalue errors O(N ε ‖H‖) each, summed over N (common practice bound).
      expect(Math.abs(linearStatistic(values, (x) => x) - trace)).toBeLessThan(1e-12);
      expect(Math.abs(linearStatistic(values, (x) => x * x) - frobenius2)).toBeLessThan(1e-12);
    }
  });

  it('compensates cancellation: 1e16 + 1 − 1e16 = 1, where plain summation gives 0', () => {
    expect(linearStatistic(Float64Array.of(1e16, 1, -1e16), (x) => x)).toBe(1);
  });
});
