import { describe, expect, it } from 'vitest';
import { eigenvalues } from '../../../harness/numeric/eigen.js';
import { transposedRealFactor } from '../../../harness/numeric/orthogonal-factor.js';
import type { SquareMatrix } from '../../../harness/numeric/square-matrix.js';
import { tridiagonalEigenvalues } from '../../../harness/numeric/tridiagonal-eigenvalues.js';
import { tridiagonaliseRealBlocked } from '../../../harness/numeric/tridiagonalise-real-blocked.js';
import { gradedHermitian, oneNorm, randomHermitian } from './spectral-fixtures.js';

/**
 * The blocked reduction (dsytrd/dlatrd form) by LAPACK's normalised ratios for a tridiagonal
 * reduction, as in its dsyt21 test routine (LAPACK 3.x test suite; from memory): with Q the product
 * of the stored reflectors,
 *   ‖A − Q T Qᵀ‖₁/(N ‖A‖₁ ε) and ‖QᵀQ − I‖₁/(N ε),
 * both O(1) for a backward-stable reduction, held against 50 (the threshold of eigen.test.ts).
 * Sizes are chosen around the panel width nb (nb − 1, nb, nb + 1, 2nb ± 1, 2nb + 2, and the last
 * two columns falling in a panel of their own or not), so every panel boundary case runs.
 * The eigenvalues of T must also agree with the default path's (eigen.ts) within 50 N ε ‖A‖₁.
 */
const THRESHOLD = 50;
const EPS = Number.EPSILON;

function reductionRatios(m: SquareMatrix, panelWidth: number): { residual: number; orthogonality: number } {
  const n = m.size;
  const reduction = tridiagonaliseRealBlocked(m.data, n, true, panelWidth);
  const reflectors = reduction.reflectors ?? new Float64Array(0);
  // Row r of qt is column r of Q.
  const qt = n >= 3 ? transposedRealFactor(reflectors, reduction.tau, n) : identity(n);
  const { diagonal, offDiagonal } = reduction.tridiagonal;
  // (T Qᵀ)[r][j] from the three non-zero entries of row r of T.
  const tqt = new Float64Array(n * n);
  for (let r = 0; r < n; r++) {
    for (let j = 0; j < n; j++) {
      let x = diagonal[r] * qt[r * n + j];
      if (r > 0) x += offDiagonal[r - 1] * qt[(r - 1) * n + j];
      if (r < n - 1) x += offDiagonal[r] * qt[(r + 1) * n + j];
      tqt[r * n + j] = x;
    }
  }
  const residual = new Float64Array(n * n);
  const gram = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      let qtq = 0;
      let a = 0;
      for (let r = 0; r < n; r++) {
        a += qt[r * n + i] * tqt[r * n + j];
        qtq += qt[i * n + r] * qt[j * n + r];
      }
      residual[i * n + j] = m.data[Math.max(i, j) * n + Math.min(i, j)] - a;
      gram[i * n + j] = qtq - (i === j ? 1 : 0);
    }
  }
  const norm = Math.max(oneNorm(m), Number.MIN_VALUE);
  return {
    residual: columnSumNorm(residual, n) / (Math.max(n, 1) * norm * EPS),
    orthogonality: columnSumNorm(gram, n) / (Math.max(n, 1) * EPS),
  };
}

function columnSumNorm(x: Float64Array, n: number): number {
  let best = 0;
  for (let j = 0; j < n; j++) {
    let s = 0;
    for (let i = 0; i < n; i++) s += Math.abs(x[i * n + j]);
    best = Math.max(best, s);
  }
  return best;
}

function identity(n: number): Float64Array {
  const out = new Float64Array(n * n);
  for (let i = 0; i < n; i++) out[i * n + i] = 1;
  return out;
}

function expectReduction(label: string, m: SquareMatrix, panelWidth: number): void {
  const { residual, orthogonality } = reductionRatios(m, panelWidth);
  expect(residual, `${label} nb=${panelWidth}: ‖A − QTQᵀ‖/(N‖A‖ε)`).toBeLessThan(THRESHOLD);
  expect(orthogonality, `${label} nb=${panelWidth}: ‖QᵀQ − I‖/(Nε)`).toBeLessThan(THRESHOLD);
  const values = tridiagonalEigenvalues(tridiagonaliseRealBlocked(m.data, m.size, false, panelWidth).tridiagonal);
  const reference = eigenvalues(m);
  const tolerance = THRESHOLD * Math.max(m.size, 1) * EPS * Math.max(oneNorm(m), Number.MIN_VALUE);
  for (let k = 0; k < m.size; k++) {
    const diff = Math.abs(values[k] - reference[k]);
    expect(diff, `${label} nb=${panelWidth}: λ[${k}] blocked ${values[k]}, default ${reference[k]}, tolerance ${tolerance}`).toBeLessThanOrEqual(tolerance);
  }
}

describe('blocked Householder reduction (dsytrd/dlatrd form)', () => {
  it('panel boundaries: sizes around nb and 2nb, for nb = 1, 2, 3, 8', () => {
    for (const nb of [1, 2, 3, 8]) {
      for (const n of new Set([1, 2, 3, 4, nb - 1, nb, nb + 1, nb + 2, 2 * nb - 1, 2 * nb, 2 * nb + 1, 2 * nb + 2, 3 * nb + 5])) {
        if (n >= 1) expectReduction(`random N=${n}`, randomHermitian('real', n, 1000 * nb + n), nb);
      }
    }
  });

  it('the default panel width (32) at N = 31, 32, 33, 65 and 70', () => {
    for (const n of [31, 32, 33, 65, 70]) expectReduction(`random N=${n}`, randomHermitian('real', n, 2000 + n), 32);
  });

  it('graded (24 orders of magnitude), already tridiagonal (τ = 0) and zero matrices', () => {
    expectReduction('graded N=25', gradedHermitian('real', 25, 7, 12), 4);
    const n = 12;
    const data = new Float64Array(n * n);
    for (let i = 0; i < n; i++) {
      data[i * n + i] = Math.cos(i);
      if (i > 0) data[i * n + i - 1] = data[(i - 1) * n + i] = 0.5;
    }
    expectReduction('tridiagonal N=12', { field: 'real', size: n, data }, 5);
    const zero = tridiagonaliseRealBlocked(new Float64Array(36), 6, false, 2);
    expect(Array.from(zero.tridiagonal.diagonal)).toEqual([0, 0, 0, 0, 0, 0]);
    expect(Array.from(zero.tridiagonal.offDiagonal)).toEqual([0, 0, 0, 0, 0]);
  });

  it('entries near the underflow threshold take dlarfg’s rescaling and still reduce stably', () => {
    const m = randomHermitian('real', 20, 77);
    const tiny: SquareMatrix = { field: 'real', size: 20, data: m.data.map((x) => x * 1e-300) };
    expectReduction('tiny N=20', tiny, 6);
  });

  it('reads only the lower triangle and rejects a bad panel width', () => {
    const m = randomHermitian('real', 10, 5);
    const scrambled = Float64Array.from(m.data);
    for (let i = 0; i < 10; i++) for (let j = i + 1; j < 10; j++) scrambled[i * 10 + j] = 1e300;
    const a = tridiagonaliseRealBlocked(m.data, 10, false, 3).tridiagonal;
    const b = tridiagonaliseRealBlocked(scrambled, 10, false, 3).tridiagonal;
    expect(Array.from(b.diagonal)).toEqual(Array.from(a.diagonal));
    expect(Array.from(b.offDiagonal)).toEqual(Array.from(a.offDiagonal));
    expect(() => tridiagonaliseRealBlocked(m.data, 10, false, 0)).toThrow(RangeError);
  });
});
