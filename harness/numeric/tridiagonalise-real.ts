import { stridedNorm } from './householder-norm.js';
import type { SymmetricTridiagonal } from './symmetric-tridiagonal.js';

/**
 * Householder reduction of a real symmetric matrix to tridiagonal form, T = Qᵀ A Q, reading the
 * LOWER triangle only (entries (i, j) with i ≥ j; the strict upper triangle is ignored).
 *
 * Method (Golub and Van Loan 2013, §8.3.1; LAPACK dsytd2 with UPLO = 'L'): step k builds the
 * reflector H_k = I − τ_k v_k v_kᵀ (v_k zero above row k + 1, v_k[k + 1] = 1) that zeroes column k
 * below the subdiagonal, then updates the trailing block A₂₂ ← H_k A₂₂ H_k as the symmetric
 * rank-2 update A₂₂ − v wᵀ − w vᵀ with p = τ A₂₂ v and w = p − (τ/2)(pᵀv) v.
 *
 * Performance: the matrix is held row-major and only its lower triangle is touched, so every
 * inner loop runs along a contiguous row. The rank-2 update of step k and the symmetric
 * matrix–vector product A₂₂ v_{k+1} of step k + 1 are fused into one sweep (the next reflector is
 * formed from the one column the sweep would otherwise have to finish first), and the sweep takes
 * two rows at a time so each loaded v_j, w_j, v′_j and product entry serves two matrix entries.
 * This halves the passes over the trailing matrix compared with dsytd2; the flop count,
 * (4/3)N³, is unchanged. The sweep also hands over, contiguously, the column the next step starts
 * from, so no step walks down a column of the row-major array. (The fusion is the row-oriented form of the "one pass" idea in LAPACK's
 * dlatrd/dsytrd blocking, where the matrix–vector products dominate; arrangement our own.)
 *
 * Accuracy: backward stable, T = Qᵀ(A + E)Q with ‖E‖ = O(N ε ‖A‖) (Golub and Van Loan 2013,
 * §8.3.1; Wilkinson 1965, The Algebraic Eigenvalue Problem, ch. 3).
 *
 * References: G. H. Golub and C. F. Van Loan, Matrix Computations, 4th ed., Johns Hopkins
 * University Press, 2013, §5.1.2 (house) and §8.3.1. E. Anderson et al., LAPACK Users' Guide,
 * 3rd ed., SIAM, 1999 (dsytd2, dsytrd, dlarfg). W. H. Press et al., Numerical Recipes, 3rd ed.,
 * Cambridge University Press, 2007, §11.3 (tred2).
 */
export interface RealReduction {
  readonly tridiagonal: SymmetricTridiagonal;
  /**
   * N×N row-major work array whose row k, columns k + 1 … N − 1, holds v_k (v_k[k + 1] = 1);
   * present only when the reflectors were kept.
   */
  readonly reflectors: Float64Array | null;
  /** τ_k for k = 0 … N − 3 (τ_k = 0 means H_k = I). */
  readonly tau: Float64Array;
}

const SAFE_MIN = 2.2250738585072014e-308;

/** a (N×N, row-major, lower triangle read) is overwritten. */
export function tridiagonaliseReal(a: Float64Array, n: number, keepReflectors: boolean): RealReduction {
  const diagonal = new Float64Array(n);
  const offDiagonal = new Float64Array(Math.max(n - 1, 0));
  const tau = new Float64Array(Math.max(n - 2, 0));
  const result = { tridiagonal: { diagonal, offDiagonal }, reflectors: keepReflectors ? a : null, tau };
  if (n === 0) return result;
  if (n <= 2) {
    diagonal[0] = a[0];
    if (n === 2) {
      offDiagonal[0] = a[n];
      diagonal[1] = a[n + 1];
    }
    return result;
  }
  let v = new Float64Array(n);
  let u = new Float64Array(n);
  const w = new Float64Array(n);
  const q = new Float64Array(n);
  // `column` holds the column c = k + 1 of the current step, rows c … N − 1, as the previous
  // steps left it; `nextColumn` receives column k + 2 from the sweep.
  let column = new Float64Array(n);
  let nextColumn = new Float64Array(n);
  for (let i = 0; i < n; i++) column[i] = a[i * n];
  diagonal[0] = column[0];
  let reflector = makeReflector(column, a, n, 0, v);
  // p = τ₀ A₂₂ v₀ (q = A₂₂ v₀ here), by the same sweep with a zero update (w = 0).
  fusedUpdateAndProduct(a, n, 1, v, w, v, q, column);
  for (let k = 0; k <= n - 3; k++) {
    const t = reflector.tau;
    offDiagonal[k] = reflector.beta;
    tau[k] = t;
    // w = p − (τ/2)(pᵀv) v with p = τ q.
    let qv = 0;
    for (let i = k + 1; i < n; i++) qv += q[i] * v[i];
    const half = 0.5 * t * t * qv;
    for (let i = k + 1; i < n; i++) w[i] = t * q[i] - half * v[i];
    // Finish column c = k + 1; the next reflector is formed from it.
    const c = k + 1;
    const vc = v[c];
    const wc = w[c];
    for (let i = c; i < n; i++) column[i] -= v[i] * wc + w[i] * vc;
    diagonal[c] = column[c];
    if (c <= n - 3) {
      reflector = makeReflector(column, a, n, c, u);
    } else {
      offDiagonal[c] = column[c + 1];
      u.fill(0);
    }
    q.fill(0);
    fusedUpdateAndProduct(a, n, k + 2, v, w, u, q, nextColumn);
    [v, u] = [u, v];
    [column, nextColumn] = [nextColumn, column];
  }
  diagonal[n - 1] = column[n - 1];
  return result;
}

/**
 * Reflector for column c (dlarfg, Anderson et al. 1999): x = column[c + 1 …], returns τ and β with
 * (I − τ v vᵀ) x = β e₁; v goes to `v` (indices c + 1 …, v[c + 1] = 1, zero elsewhere) and to
 * row c of `a` right of the diagonal (the reflector store, never read as matrix data).
 */
function makeReflector(column: Float64Array, a: Float64Array, n: number, c: number, v: Float64Array): { tau: number; beta: number } {
  v.fill(0);
  const r = c + 1;
  const store = c * n;
  let alpha = column[r];
  let xnorm = stridedNorm(column, r + 1, n - r - 1, 1);
  v[r] = 1;
  a[store + r] = 1;
  if (xnorm === 0) return { tau: 0, beta: alpha };
  let beta = -Math.sign(alpha || 1) * Math.hypot(alpha, xnorm);
  // dlarfg's rescaling when |β| is below the safe minimum, so 1/(α − β) cannot overflow.
  let rescale = 1;
  let steps = 0;
  while (Math.abs(beta) < SAFE_MIN && steps < 20) {
    steps++;
    rescale /= SAFE_MIN;
    for (let i = r + 1; i < n; i++) column[i] /= SAFE_MIN;
    alpha /= SAFE_MIN;
    beta /= SAFE_MIN;
  }
  if (steps > 0) {
    xnorm = stridedNorm(column, r + 1, n - r - 1, 1);
    beta = -Math.sign(alpha || 1) * Math.hypot(alpha, xnorm);
  }
  const tau = (beta - alpha) / beta;
  const s = 1 / (alpha - beta);
  for (let i = r + 1; i < n; i++) {
    const vi = column[i] * s;
    v[i] = vi;
    a[store + i] = vi;
  }
  return { tau, beta: beta / rescale };
}

/**
 * One sweep over the lower triangle of the trailing block (rows and columns lo … N − 1):
 * A ← A − v wᵀ − w vᵀ, q += A u with the updated A (symmetric product from the lower triangle),
 * and column[i] ← A[i][lo] (the next step's column, copied while its row is in cache).
 * Rows are taken in blocks of 8 so that each column's v_j, w_j, u_j and q_j are loaded once per
 * block; the block size was chosen by timing (our scratch measurements, N = 500–1000).
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
  // Rows that do not fill a block of 8 are taken one at a time first (they are the shortest),
  // so the optimising compiler has seen both paths before it compiles the hot loop.
  let i = lo;
  const single = (n - lo) % 8;
  for (; i < lo + single; i++) oneRowUpdateAndProduct(a, n, lo, i, v, w, u, q, column);
  for (; i < n; i += 8) {
    const r0 = i * n;
    const r1 = r0 + n;
    const r2 = r1 + n;
    const r3 = r2 + n;
    const r4 = r3 + n;
    const r5 = r4 + n;
    const r6 = r5 + n;
    const r7 = r6 + n;
    const v0 = v[i];
    const w0 = w[i];
    const u0 = u[i];
    let s0 = 0;
    const v1 = v[i + 1];
    const w1 = w[i + 1];
    const u1 = u[i + 1];
    let s1 = 0;
    const v2 = v[i + 2];
    const w2 = w[i + 2];
    const u2 = u[i + 2];
    let s2 = 0;
    const v3 = v[i + 3];
    const w3 = w[i + 3];
    const u3 = u[i + 3];
    let s3 = 0;
    const v4 = v[i + 4];
    const w4 = w[i + 4];
    const u4 = u[i + 4];
    let s4 = 0;
    const v5 = v[i + 5];
    const w5 = w[i + 5];
    const u5 = u[i + 5];
    let s5 = 0;
    const v6 = v[i + 6];
    const w6 = w[i + 6];
    const u6 = u[i + 6];
    let s6 = 0;
    const v7 = v[i + 7];
    const w7 = w[i + 7];
    const u7 = u[i + 7];
    let s7 = 0;
    for (let j = lo; j < i; j++) {
      const vj = v[j];
      const wj = w[j];
      const uj = u[j];
      const x0 = a[r0 + j] - v0 * wj - w0 * vj;
      a[r0 + j] = x0;
      s0 += x0 * uj;
      const x1 = a[r1 + j] - v1 * wj - w1 * vj;
      a[r1 + j] = x1;
      s1 += x1 * uj;
      const x2 = a[r2 + j] - v2 * wj - w2 * vj;
      a[r2 + j] = x2;
      s2 += x2 * uj;
      const x3 = a[r3 + j] - v3 * wj - w3 * vj;
      a[r3 + j] = x3;
      s3 += x3 * uj;
      const x4 = a[r4 + j] - v4 * wj - w4 * vj;
      a[r4 + j] = x4;
      s4 += x4 * uj;
      const x5 = a[r5 + j] - v5 * wj - w5 * vj;
      a[r5 + j] = x5;
      s5 += x5 * uj;
      const x6 = a[r6 + j] - v6 * wj - w6 * vj;
      a[r6 + j] = x6;
      s6 += x6 * uj;
      const x7 = a[r7 + j] - v7 * wj - w7 * vj;
      a[r7 + j] = x7;
      s7 += x7 * uj;
      q[j] += x0 * u0 + x1 * u1 + x2 * u2 + x3 * u3 + x4 * u4 + x5 * u5 + x6 * u6 + x7 * u7;
    }
    // The diagonal block: rows i … i + R − 1, columns i … own diagonal.
    for (let r = 0; r < 8; r++) {
      const ir = i + r;
      const row = ir * n;
      const vr = v[ir];
      const wr = w[ir];
      const ur = u[ir];
      let s = 0;
      for (let j = i; j < ir; j++) {
        const x = a[row + j] - vr * w[j] - wr * v[j];
        a[row + j] = x;
        s += x * u[j];
        q[j] += x * ur;
      }
      const d = a[row + ir] - 2 * vr * wr;
      a[row + ir] = d;
      q[ir] += s + d * ur;
    }
    q[i] += s0;
    q[i + 1] += s1;
    q[i + 2] += s2;
    q[i + 3] += s3;
    q[i + 4] += s4;
    q[i + 5] += s5;
    q[i + 6] += s6;
    q[i + 7] += s7;
    column[i] = a[r0 + lo];
    column[i + 1] = a[r1 + lo];
    column[i + 2] = a[r2 + lo];
    column[i + 3] = a[r3 + lo];
    column[i + 4] = a[r4 + lo];
    column[i + 5] = a[r5 + lo];
    column[i + 6] = a[r6 + lo];
    column[i + 7] = a[r7 + lo];
  }
}

/** Row i, columns lo … i, of `fusedUpdateAndProduct`. */
function oneRowUpdateAndProduct(
  a: Float64Array,
  n: number,
  lo: number,
  i: number,
  v: Float64Array,
  w: Float64Array,
  u: Float64Array,
  q: Float64Array,
  column: Float64Array,
): void {
  const row = i * n;
  const vi = v[i];
  const wi = w[i];
  const ui = u[i];
  let s = 0;
  for (let j = lo; j < i; j++) {
    const x = a[row + j] - vi * w[j] - wi * v[j];
    a[row + j] = x;
    s += x * u[j];
    q[j] += x * ui;
  }
  const d = a[row + i] - 2 * vi * wi;
  a[row + i] = d;
  q[i] += s + d * ui;
  column[i] = a[row + lo];
}
