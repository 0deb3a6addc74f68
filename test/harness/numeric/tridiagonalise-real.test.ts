import { describe, expect, it } from 'vitest';
import { eigenvalues } from '../../../harness/numeric/eigen.js';
import { transposedRealFactor } from '../../../harness/numeric/orthogonal-factor.js';
import type { SquareMatrix } from '../../../harness/numeric/square-matrix.js';
import { tridiagonalEigenvalues } from '../../../harness/numeric/tridiagonal-eigenvalues.js';
import { fusedSweepKernel } from '../../../harness/numeric/fused-sweep-kernel.js';
import { tridiagonaliseReal, type RealReduction } from '../../../harness/numeric/tridiagonalise-real.js';
import { tridiagonaliseRealBlocked } from '../../../harness/numeric/tridiagonalise-real-blocked.js';
import { gradedHermitian, oneNorm, randomHermitian } from './spectral-fixtures.js';

/**
 * The three real tridiagonal reductions — the fused sweep with its WebAssembly SIMD kernel (the
 * default), the same sweep in scalar code, and the blocked dsytrd/dlatrd form — by LAPACK's
 * normalised ratios for a tridiagonal reduction, as in its dsyt21 test routine (LAPACK 3.x test
 * suite; from memory): with Q the product of the stored reflectors,
 *   ‖A − Q T Qᵀ‖₁/(N ‖A‖₁ ε) and ‖QᵀQ − I‖₁/(N ε),
 * both O(1) for a backward-stable reduction, held against 50 (the threshold of eigen.test.ts).
 * Sizes are chosen around each variant's block boundaries: the SIMD kernel's blocks of 4 rows with
 * 0–3 rows left over and an odd or even number of columns, the scalar sweep's blocks of 8, and the
 * blocked form's panel width nb (nb − 1, nb, nb + 1, 2nb ± 1, 2nb + 2, the last two columns in a
 * panel of their own or not). The eigenvalues of T must also agree with eigen.ts within 50 N ε ‖A‖₁.
 */
type Reduce = (a: Float64Array, n: number, keepReflectors: boolean) => RealReduction;

const VARIANTS: readonly [string, Reduce][] = [
  ['fused, SIMD kernel', (a, n, keep) => tridiagonaliseReal(a, n, keep, 'simd')],
  ['fused, scalar', (a, n, keep) => tridiagonaliseReal(a, n, keep, 'scalar')],
  ['blocked nb=32', (a, n, keep) => tridiagonaliseRealBlocked(a, n, keep)],
];
const THRESHOLD = 50;
const EPS = Number.EPSILON;

function reductionRatios(m: SquareMatrix, reduce: Reduce): { residual: number; orthogonality: number } {
  const n = m.size;
  const reduction = reduce(m.data, n, true);
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

function expectReduction(label: string, m: SquareMatrix, variant: string, reduce: Reduce): void {
  const { residual, orthogonality } = reductionRatios(m, reduce);
  expect(residual, `${variant}, ${label}: ‖A − QTQᵀ‖/(N‖A‖ε)`).toBeLessThan(THRESHOLD);
  expect(orthogonality, `${variant}, ${label}: ‖QᵀQ − I‖/(Nε)`).toBeLessThan(THRESHOLD);
  const values = tridiagonalEigenvalues(reduce(m.data, m.size, false).tridiagonal);
  const reference = eigenvalues(m);
  const tolerance = THRESHOLD * Math.max(m.size, 1) * EPS * Math.max(oneNorm(m), Number.MIN_VALUE);
  for (let k = 0; k < m.size; k++) {
    const diff = Math.abs(values[k] - reference[k]);
    expect(diff, `${variant}, ${label}: λ[${k}] ${values[k]}, eigen.ts ${reference[k]}, tolerance ${tolerance}`).toBeLessThanOrEqual(tolerance);
  }
}

function blockedWith(panelWidth: number): Reduce {
  return (a, n, keep) => tridiagonaliseRealBlocked(a, n, keep, panelWidth);
}

describe('real tridiagonal reductions: block boundaries', () => {
  it('the SIMD kernel is available on this engine (else the default silently runs the scalar sweep)', () => {
    expect(fusedSweepKernel()).not.toBeNull();
  });

  it('fused sweeps, SIMD and scalar: every N from 1 to 40, and 63 … 66', () => {
    for (const [variant, reduce] of VARIANTS.slice(0, 2)) {
      for (const n of [...Array.from({ length: 40 }, (_, k) => k + 1), 63, 64, 65, 66]) expectReduction(`random N=${n}`, randomHermitian('real', n, 3000 + n), variant, reduce);
    }
  });

  it('blocked: sizes around nb and 2nb, for nb = 1, 2, 3, 8', () => {
    for (const nb of [1, 2, 3, 8]) {
      for (const n of new Set([1, 2, 3, 4, nb - 1, nb, nb + 1, nb + 2, 2 * nb - 1, 2 * nb, 2 * nb + 1, 2 * nb + 2, 3 * nb + 5])) {
        if (n >= 1) expectReduction(`random N=${n}`, randomHermitian('real', n, 1000 * nb + n), `blocked nb=${nb}`, blockedWith(nb));
      }
    }
  });

  it('blocked: the default panel width (32) at N = 31, 32, 33, 65 and 70', () => {
    for (const n of [31, 32, 33, 65, 70]) expectReduction(`random N=${n}`, randomHermitian('real', n, 2000 + n), 'blocked nb=32', blockedWith(32));
  });
});

describe('real tridiagonal reductions: special inputs', () => {
  for (const [variant, reduce] of VARIANTS) {
    it(`${variant}: graded (24 orders of magnitude), already tridiagonal (τ = 0), zero, and near-underflow matrices`, () => {
      expectReduction('graded N=25', gradedHermitian('real', 25, 7, 12), variant, reduce);
      const n = 12;
      const data = new Float64Array(n * n);
      for (let i = 0; i < n; i++) {
        data[i * n + i] = Math.cos(i);
        if (i > 0) data[i * n + i - 1] = data[(i - 1) * n + i] = 0.5;
      }
      expectReduction('tridiagonal N=12', { field: 'real', size: n, data }, variant, reduce);
      const zero = reduce(new Float64Array(36), 6, false);
      expect(Array.from(zero.tridiagonal.diagonal)).toEqual([0, 0, 0, 0, 0, 0]);
      expect(Array.from(zero.tridiagonal.offDiagonal)).toEqual([0, 0, 0, 0, 0]);
      // Entries near the underflow threshold take dlarfg's rescaling.
      const m = randomHermitian('real', 20, 77);
      expectReduction('tiny N=20', { field: 'real', size: 20, data: m.data.map((x) => x * 1e-300) }, variant, reduce);
    });
  }

  it('blocked: reads only the lower triangle and rejects a bad panel width', () => {
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
