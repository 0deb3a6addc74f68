import type { SymmetricTridiagonal } from './symmetric-tridiagonal.js';

/**
 * Eigenvalues of a real symmetric tridiagonal matrix T, one at a time, by bisection on Sturm
 * counts: O(N) per bisection step, so the largest eigenvalue to full precision costs about 60·N
 * operations, against O(N²) for all eigenvalues by QL.
 *
 * Method. The number of eigenvalues of T below x equals the number of negative pivots of the
 * LDLᵀ factorisation of T − xI (Sylvester's law of inertia), computed by the recurrence
 * q₀ = d₀ − x, q_i = (d_i − x) − e²_{i−1}/q_{i−1} (Barth, Martin and Wilkinson 1967; Golub and
 * Van Loan 2013, §8.4.1). A pivot with |q| ≤ pivmin is replaced by −pivmin, with
 * pivmin = safmin·max(1, max e²) (LAPACK dstebz/dlaebz's guard): the count is then that of a
 * matrix within O(ε‖T‖) of T, and the recurrence never divides by zero or overflows (Kahan 1966;
 * Demmel, Dhillon and Ren 1995). Bisection keeps an interval [lo, hi] with count(lo) ≤ k < count(hi),
 * starting from the Gershgorin bounds widened as dstebz widens them, until it is no wider than the
 * requested absolute tolerance, or 2ε·max(|lo|, |hi|) + pivmin, or until the midpoint no longer
 * differs from an end.
 *
 * Accuracy: with tolerance 0 the result is within a small multiple of ε‖T‖ of the k-th eigenvalue
 * (Demmel, Dhillon and Ren 1995, for this guarded recurrence), like the QL eigenvalues
 * (tridiagonal-eigenvalues.ts). Matrices with entries beyond 1e±150 are scaled first so that e²
 * cannot overflow or underflow.
 *
 * References: W. Barth, R. S. Martin and J. H. Wilkinson, "Calculation of the eigenvalues of a
 * symmetric tridiagonal matrix by the method of bisection", Numer. Math. 9 (1967) 386–393.
 * G. H. Golub and C. F. Van Loan, Matrix Computations, 4th ed., 2013, §8.4.1. E. Anderson et al.,
 * LAPACK Users' Guide, 3rd ed., SIAM, 1999 (dstebz, dlaebz). W. Kahan, "Accurate eigenvalues of a
 * symmetric tri-diagonal matrix", Tech. Rep. CS41, Stanford, 1966. J. W. Demmel, I. S. Dhillon and
 * H. Ren, "On the correctness of some bisection-like parallel eigenvalue algorithms in floating
 * point arithmetic", Electron. Trans. Numer. Anal. 3 (1995) 116–149.
 */
export interface SturmBisection {
  /** Number of eigenvalues below x (ties at x counted as below, as dlaebz does). */
  countBelow(x: number): number;
  /** The k-th smallest eigenvalue, k = 0 … N − 1, to absolute `tolerance` (0: full precision). */
  eigenvalue(k: number, tolerance?: number): number;
  /** Gershgorin bounds [lower, upper] that contain every eigenvalue. */
  readonly lower: number;
  readonly upper: number;
}

const EPS = Number.EPSILON / 2;
const SAFE_MIN = 2.2250738585072014e-308;
const SCALE_LIMIT_HIGH = 1e150;
const SCALE_LIMIT_LOW = 1e-150;

/** Prepares T for repeated counts (squares of the off-diagonal, pivmin, Gershgorin bounds): O(N). */
export function sturmBisection(t: SymmetricTridiagonal): SturmBisection {
  const n = t.diagonal.length;
  if (n === 0) throw new RangeError('sturmBisection: the matrix is empty');
  if (t.offDiagonal.length < n - 1) throw new RangeError(`sturmBisection: ${n - 1} off-diagonal entries needed, got ${t.offDiagonal.length}`);
  let size = 0;
  for (let i = 0; i < n; i++) size = Math.max(size, Math.abs(t.diagonal[i]));
  for (let i = 0; i < n - 1; i++) size = Math.max(size, Math.abs(t.offDiagonal[i]));
  if (!Number.isFinite(size)) throw new RangeError('sturmBisection: non-finite entry in the tridiagonal matrix');
  const scale = size > SCALE_LIMIT_HIGH || (size > 0 && size < SCALE_LIMIT_LOW) ? 1 / size : 1;
  const d = new Float64Array(n);
  const e2 = new Float64Array(n);
  for (let i = 0; i < n; i++) d[i] = t.diagonal[i] * scale;
  let maxE2 = 0;
  for (let i = 0; i < n - 1; i++) {
    const e = t.offDiagonal[i] * scale;
    e2[i] = e * e;
    maxE2 = Math.max(maxE2, e2[i]);
  }
  const pivmin = SAFE_MIN * Math.max(1, maxE2);
  // Gershgorin discs, widened as dstebz widens them (FUDGE = 2.1) so rounding in the counts at
  // the ends cannot put an eigenvalue outside.
  let gl = d[0];
  let gu = d[0];
  let previous = 0;
  for (let i = 0; i < n; i++) {
    const next = i < n - 1 ? Math.sqrt(e2[i]) : 0;
    gl = Math.min(gl, d[i] - previous - next);
    gu = Math.max(gu, d[i] + previous + next);
    previous = next;
  }
  const tnorm = Math.max(Math.abs(gl), Math.abs(gu));
  const fudge = 2.1 * (tnorm * EPS * n + 2 * pivmin);
  const lower = gl - fudge;
  const upper = gu + fudge;

  const count = (x: number): number => {
    let negatives = 0;
    let q = d[0] - x;
    if (Math.abs(q) <= pivmin) q = -pivmin;
    if (q <= 0) negatives++;
    for (let i = 1; i < n; i++) {
      q = d[i] - x - e2[i - 1] / q;
      if (Math.abs(q) <= pivmin) q = -pivmin;
      if (q <= 0) negatives++;
    }
    return negatives;
  };

  return {
    lower: lower / scale,
    upper: upper / scale,
    countBelow: (x) => count(x * scale),
    eigenvalue(k, tolerance = 0) {
      if (!Number.isInteger(k) || k < 0 || k >= n) throw new RangeError(`sturmBisection: eigenvalue index must be an integer in [0, ${n - 1}], got ${k}`);
      if (!(tolerance >= 0)) throw new RangeError(`sturmBisection: tolerance must be ≥ 0, got ${tolerance}`);
      let lo = lower;
      let hi = upper;
      const absoluteTolerance = tolerance * scale;
      for (;;) {
        const width = hi - lo;
        if (width <= Math.max(absoluteTolerance, 2 * EPS * Math.max(Math.abs(lo), Math.abs(hi)) + pivmin)) break;
        const mid = lo + 0.5 * width;
        if (mid <= lo || mid >= hi) break;
        if (count(mid) > k) hi = mid;
        else lo = mid;
      }
      return (lo + 0.5 * (hi - lo)) / scale;
    },
  };
}

/** The largest eigenvalue of T by Sturm bisection, to absolute `tolerance` (0: full precision). */
export function largestEigenvalue(t: SymmetricTridiagonal, tolerance = 0): number {
  return sturmBisection(t).eigenvalue(t.diagonal.length - 1, tolerance);
}
