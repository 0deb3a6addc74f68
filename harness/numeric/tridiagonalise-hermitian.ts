import { stridedNorm } from './householder-norm.js';
import type { SymmetricTridiagonal } from './symmetric-tridiagonal.js';

/**
 * Householder reduction of a complex Hermitian matrix to REAL symmetric tridiagonal form,
 * T = (Q D)* A (Q D), reading the LOWER triangle only (entries (i, j), i ≥ j; the strict upper
 * triangle and the imaginary parts of the diagonal are ignored). Complex interleaved storage.
 *
 * Method: step k uses the Hermitian reflector H_k = I − τ_k v v* (τ_k = 2/‖v‖² real, v[k + 1] = 1)
 * that maps x = A[k + 1 …, k] to β_k e₁ with β_k = −e^{i arg x₀} ‖x‖ (no cancellation in
 * v = x − β_k e₁); the trailing block is updated as A₂₂ − v w* − w v* with p = τ A₂₂ v and
 * w = p − (τ/2)(v* p) v (Golub and Van Loan 2013, §8.3.1, in complex arithmetic; LAPACK zhetd2
 * with UPLO = 'L', which instead picks a complex τ to make β real). Q* A Q is then Hermitian
 * tridiagonal with complex subdiagonal β_k; the diagonal unitary D = diag(δ), δ_0 = 1,
 * δ_{k+1} = δ_k β_k/|β_k|, turns it into the real symmetric T with subdiagonal |β_k|
 * (Wilkinson 1965, The Algebraic Eigenvalue Problem, §5.39 for the idea; common practice). The
 * eigenvectors of A are then Q D S for T = S Λ Sᵀ.
 *
 * As in tridiagonalise-real.ts, the rank-2 update of step k and the matrix–vector product of step
 * k + 1 are fused into one sweep along contiguous rows of the lower triangle, and the sweep hands
 * over the next step's column contiguously. Cost (16/3)N³ real flops.
 *
 * References: G. H. Golub and C. F. Van Loan, Matrix Computations, 4th ed., 2013, §5.1.13
 * (complex Householder) and §8.3.1. E. Anderson et al., LAPACK Users' Guide, 3rd ed., SIAM, 1999
 * (zhetd2, zhetrd, zlarfg).
 */
export interface HermitianReduction {
  readonly tridiagonal: SymmetricTridiagonal;
  /** Row k, entries k + 1 … N − 1 (complex interleaved) hold v_k; null unless kept. */
  readonly reflectors: Float64Array | null;
  /** τ_k (real), k = 0 … N − 3. */
  readonly tau: Float64Array;
  /** D's diagonal, complex interleaved (length 2N). */
  readonly phases: Float64Array;
}

/** a (N×N complex interleaved, row-major, lower triangle read) is overwritten. */
export function tridiagonaliseHermitian(a: Float64Array, n: number, keepReflectors: boolean): HermitianReduction {
  const diagonal = new Float64Array(n);
  const offDiagonal = new Float64Array(Math.max(n - 1, 0));
  const tau = new Float64Array(Math.max(n - 2, 0));
  const beta = new Float64Array(2 * Math.max(n - 1, 0));
  const phases = new Float64Array(2 * n);
  const result = { tridiagonal: { diagonal, offDiagonal }, reflectors: keepReflectors ? a : null, tau, phases };
  if (n === 0) return result;
  if (n <= 2) {
    diagonal[0] = a[0];
    if (n === 2) {
      beta[0] = a[2 * n];
      beta[1] = a[2 * n + 1];
      diagonal[1] = a[2 * (n + 1)];
    }
    return finishPhases(result, beta, n);
  }
  const v0 = new Float64Array(2 * n);
  const v1 = new Float64Array(2 * n);
  const w = new Float64Array(2 * n);
  const q = new Float64Array(2 * n);
  let v = v0;
  let u = v1;
  let column = new Float64Array(2 * n);
  let nextColumn = new Float64Array(2 * n);
  for (let i = 0; i < n; i++) {
    column[2 * i] = a[2 * i * n];
    column[2 * i + 1] = a[2 * i * n + 1];
  }
  diagonal[0] = column[0];
  tau[0] = makeReflector(column, a, n, 0, v, beta);
  fusedUpdateAndProduct(a, n, 1, v, w, v, q, column);
  for (let k = 0; k <= n - 3; k++) {
    const t = tau[k];
    // w = p − (τ/2)(v* p) v, p = τ q; v* q is real in exact arithmetic (τ v* A v).
    let vq = 0;
    for (let i = k + 1; i < n; i++) vq += v[2 * i] * q[2 * i] + v[2 * i + 1] * q[2 * i + 1];
    const half = 0.5 * t * t * vq;
    for (let i = 2 * (k + 1); i < 2 * n; i++) w[i] = t * q[i] - half * v[i];
    const c = k + 1;
    const vcr = v[2 * c];
    const vci = v[2 * c + 1];
    const wcr = w[2 * c];
    const wci = w[2 * c + 1];
    for (let i = c; i < n; i++) {
      // column_i −= v_i conj(w_c) + w_i conj(v_c)
      const vr = v[2 * i], vi = v[2 * i + 1], wr = w[2 * i], wi = w[2 * i + 1];
      column[2 * i] -= vr * wcr + vi * wci + wr * vcr + wi * vci;
      column[2 * i + 1] -= vi * wcr - vr * wci + wi * vcr - wr * vci;
    }
    diagonal[c] = column[2 * c];
    if (c <= n - 3) {
      tau[c] = makeReflector(column, a, n, c, u, beta);
    } else {
      beta[2 * c] = column[2 * c + 2];
      beta[2 * c + 1] = column[2 * c + 3];
      u.fill(0);
    }
    q.fill(0);
    fusedUpdateAndProduct(a, n, k + 2, v, w, u, q, nextColumn);
    [v, u] = [u, v];
    [column, nextColumn] = [nextColumn, column];
  }
  diagonal[n - 1] = column[2 * (n - 1)];
  return finishPhases(result, beta, n);
}

/** Fills T's off-diagonal |β_k| and D's phases from the complex subdiagonal β. */
function finishPhases(result: HermitianReduction, beta: Float64Array, n: number): HermitianReduction {
  const { offDiagonal } = result.tridiagonal;
  const phases = result.phases;
  // D: δ_{k+1} = δ_k β_k/|β_k|, so conj(δ_{k+1}) β_k δ_k = |β_k|.
  phases[0] = 1;
  for (let k = 0; k < n - 1; k++) {
    const br = beta[2 * k];
    const bi = beta[2 * k + 1];
    const mod = Math.hypot(br, bi);
    offDiagonal[k] = mod;
    const pr = phases[2 * k];
    const pi = phases[2 * k + 1];
    if (mod === 0) {
      phases[2 * k + 2] = pr;
      phases[2 * k + 3] = pi;
    } else {
      const cr = br / mod;
      const ci = bi / mod;
      phases[2 * k + 2] = pr * cr - pi * ci;
      phases[2 * k + 3] = pr * ci + pi * cr;
    }
  }
  return result;
}

/**
 * Hermitian reflector for column c: x = column[c + 1 …] (complex), H x = β e₁ with
 * β = −e^{i arg x₀}‖x‖; v (v[c + 1] = 1) goes to `v` and to row c of `a`, β to beta[c]; returns τ.
 */
function makeReflector(column: Float64Array, a: Float64Array, n: number, c: number, v: Float64Array, beta: Float64Array): number {
  v.fill(0);
  const r = c + 1;
  const store = 2 * c * n;
  const ar = column[2 * r];
  const ai = column[2 * r + 1];
  v[2 * r] = 1;
  a[store + 2 * r] = 1;
  a[store + 2 * r + 1] = 0;
  const tailNorm = Math.hypot(stridedNorm(column, 2 * r + 2, n - r - 1, 2), stridedNorm(column, 2 * r + 3, n - r - 1, 2));
  if (tailNorm === 0) {
    beta[2 * c] = ar;
    beta[2 * c + 1] = ai;
    return 0;
  }
  const alphaMod = Math.hypot(ar, ai);
  const xnorm = Math.hypot(alphaMod, tailNorm);
  const phr = alphaMod === 0 ? 1 : ar / alphaMod;
  const phi = alphaMod === 0 ? 0 : ai / alphaMod;
  beta[2 * c] = -phr * xnorm;
  beta[2 * c + 1] = -phi * xnorm;
  // v = x/(x₀ − β) below its first entry; x₀ − β = e^{iθ}(|x₀| + ‖x‖), so 1/(x₀ − β) = e^{−iθ}/(|x₀| + ‖x‖).
  const denom = alphaMod + xnorm;
  const sr = phr / denom;
  const si = -phi / denom;
  let tail2 = 0;
  for (let i = r + 1; i < n; i++) {
    const xr = column[2 * i];
    const xi = column[2 * i + 1];
    const vr = xr * sr - xi * si;
    const vi = xr * si + xi * sr;
    v[2 * i] = vr;
    v[2 * i + 1] = vi;
    a[store + 2 * i] = vr;
    a[store + 2 * i + 1] = vi;
    tail2 += vr * vr + vi * vi;
  }
  return 2 / (1 + tail2);
}

/**
 * One sweep over the lower triangle of the trailing block (rows and columns lo … N − 1):
 * A ← A − v w* − w v*, q += A u with the updated Hermitian A, column[i] ← A[i][lo].
 */
function fusedUpdateAndProduct(
  a: Float64Array,
  n: number,
  lo: number,
  v: Float64Array,
  w: Float64Array,
  u: Float64Array,
  q: Float64Array,
  column: Float64Array,
): void {
  for (let i = lo; i < n; i++) {
    const row = 2 * i * n;
    const vr = v[2 * i], vi = v[2 * i + 1];
    const wr = w[2 * i], wi = w[2 * i + 1];
    const ur = u[2 * i], ui = u[2 * i + 1];
    let sr = 0;
    let si = 0;
    for (let j = lo; j < i; j++) {
      const jr = 2 * j;
      const vjr = v[jr], vji = v[jr + 1];
      const wjr = w[jr], wji = w[jr + 1];
      // x = a_ij − v_i conj(w_j) − w_i conj(v_j)
      const xr = a[row + jr] - (vr * wjr + vi * wji) - (wr * vjr + wi * vji);
      const xi = a[row + jr + 1] - (vi * wjr - vr * wji) - (wi * vjr - wr * vji);
      a[row + jr] = xr;
      a[row + jr + 1] = xi;
      const ujr = u[jr], uji = u[jr + 1];
      // (A u)_i += x u_j; (A u)_j += conj(x) u_i
      sr += xr * ujr - xi * uji;
      si += xr * uji + xi * ujr;
      q[jr] += xr * ur + xi * ui;
      q[jr + 1] += xr * ui - xi * ur;
    }
    const dk = row + 2 * i;
    const d = a[dk] - 2 * (vr * wr + vi * wi);
    a[dk] = d;
    a[dk + 1] = 0;
    q[2 * i] += sr + d * ur;
    q[2 * i + 1] += si + d * ui;
    column[2 * i] = a[row + 2 * lo];
    column[2 * i + 1] = a[row + 2 * lo + 1];
  }
}
