import { householderReflector } from './householder-reflector.js';
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
 * Performance: the lower triangle is copied once into packed storage by columns (LAPACK's packed
 * 'L' layout, as in dsptrd): column j of the lower triangle, rows j … N − 1, is one contiguous
 * run, so the trailing block of every step is the contiguous tail of the array and every inner
 * loop runs along a contiguous run. The rank-2 update of step k and the symmetric
 * matrix–vector product A₂₂ v_{k+1} of step k + 1 are fused into one sweep (the next reflector
 * is formed first from the one column the sweep would otherwise have to finish), and the sweep
 * takes columns in blocks of 8 so each loaded v_j, w_j, v′_j and product entry serves 8
 * matrix entries. This halves the passes over the trailing matrix compared with dsytd2; the flop
 * count, (4/3)N³, is unchanged. (The fusion is the one-pass form of the matrix–vector products
 * that dominate LAPACK's dlatrd/dsytrd; the arrangement is our own, chosen by timing.)
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
  /** N×N row-major: row k, entries k + 1 … N − 1, holds v_k (v_k[k + 1] = 1); null unless kept. */
  readonly reflectors: Float64Array | null;
  /** τ_k for k = 0 … N − 3 (τ_k = 0 means H_k = I). */
  readonly tau: Float64Array;
}

/**
 * Where entry (i, j), j ≥ i, of the packed array lives: rowOffset(n, i) + j. "Row" i of the packed
 * array is column i of the lower triangle (A_ji = A_ij), N − i numbers.
 */
function rowOffset(n: number, i: number): number {
  return i * n - (i * (i - 1)) / 2 - i;
}

/** a: N×N row-major, lower triangle read (not modified). */
export function tridiagonaliseReal(a: Float64Array, n: number, keepReflectors: boolean): RealReduction {
  const diagonal = new Float64Array(n);
  const offDiagonal = new Float64Array(Math.max(n - 1, 0));
  const tau = new Float64Array(Math.max(n - 2, 0));
  const reflectors = keepReflectors ? new Float64Array(n * n) : null;
  const result = { tridiagonal: { diagonal, offDiagonal }, reflectors, tau };
  if (n === 0) return result;
  if (n <= 2) {
    diagonal[0] = a[0];
    if (n === 2) {
      offDiagonal[0] = a[n];
      diagonal[1] = a[n + 1];
    }
    return result;
  }
  const p = new Float64Array((n * (n + 1)) / 2);
  for (let i = 0; i < n; i++) for (let j = 0; j <= i; j++) p[rowOffset(n, j) + i] = a[i * n + j];
  let v = new Float64Array(n);
  let u = new Float64Array(n);
  const w = new Float64Array(n);
  const q = new Float64Array(n);
  diagonal[0] = p[0];
  let reflector = makeReflector(p, n, 0, v, reflectors);
  // q = A₂₂ v₀ by the same sweep with a zero update (w = 0).
  fusedUpdateAndProduct(p, n, 1, v, w, v, q);
  for (let k = 0; k <= n - 3; k++) {
    const t = reflector.tau;
    offDiagonal[k] = reflector.beta;
    tau[k] = t;
    // w = p − (τ/2)(pᵀv) v with p = τ q.
    let qv = 0;
    for (let i = k + 1; i < n; i++) qv += q[i] * v[i];
    const half = 0.5 * t * t * qv;
    for (let i = k + 1; i < n; i++) w[i] = t * q[i] - half * v[i];
    // Finish column c = k + 1 (the first of the trailing block); the next reflector comes from it.
    const c = k + 1;
    const o = rowOffset(n, c);
    const vc = v[c];
    const wc = w[c];
    for (let j = c; j < n; j++) p[o + j] -= vc * w[j] + wc * v[j];
    diagonal[c] = p[o + c];
    if (c <= n - 3) {
      reflector = makeReflector(p, n, c, u, reflectors);
    } else {
      offDiagonal[c] = p[o + c + 1];
      u.fill(0);
    }
    q.fill(0);
    fusedUpdateAndProduct(p, n, c + 1, v, w, u, q);
    [v, u] = [u, v];
  }
  diagonal[n - 1] = p[p.length - 1];
  return result;
}

/**
 * Reflector for column c (householder-reflector.ts, after dlarfg, Anderson et al. 1999): x =
 * A[c + 1 …, c] (packed row c, whose tail it overwrites), returns τ and β with (I − τ v vᵀ) x = β e₁;
 * v goes to `v` (indices c + 1 …, v[c + 1] = 1, zero elsewhere) and, when kept, to row c of `store`.
 */
function makeReflector(p: Float64Array, n: number, c: number, v: Float64Array, store: Float64Array | null): { tau: number; beta: number } {
  v.fill(0);
  const r = c + 1;
  const o = rowOffset(n, c);
  const reflector = householderReflector(p, o + r, n - r);
  v[r] = 1;
  if (reflector.tau !== 0) v.set(p.subarray(o + r + 1, o + n), r + 1);
  if (store !== null) {
    store[c * n + r] = 1;
    store.set(v.subarray(r + 1, n), c * n + r + 1);
  }
  return reflector;
}

/**
 * One sweep over the trailing block (rows and columns lo … N − 1, packed): A ← A − v wᵀ − w vᵀ and
 * q += A u with the updated A (each off-diagonal entry (i, j), j > i, serves both (Au)_i and
 * (Au)_j). Columns of the lower triangle are taken 8 at a time.
 */
function fusedUpdateAndProduct(
  p: Float64Array,
  n: number,
  lo: number,
  v: Float64Array,
  w: Float64Array,
  u: Float64Array,
  q: Float64Array,
): void {
  // Rows that do not fill a block of 8 are taken one at a time first, so the optimising
  // compiler has seen both paths before it compiles the hot loop.
  let i = lo;
  const single = (n - lo) % 8;
  for (; i < lo + single; i++) oneRowUpdateAndProduct(p, n, i, v, w, u, q);
  for (; i < n; i += 8) {
    // The 8×8 diagonal block first: rows i … i + 7, their columns up to i + 7.
    for (let r = i; r < i + 8; r++) {
      const o = rowOffset(n, r);
      const vr = v[r];
      const wr = w[r];
      const ur = u[r];
      const d = p[o + r] - 2 * vr * wr;
      p[o + r] = d;
      let s = d * ur;
      for (let j = r + 1; j < i + 8; j++) {
        const x = p[o + j] - vr * w[j] - wr * v[j];
        p[o + j] = x;
        s += x * u[j];
        q[j] += x * ur;
      }
      q[r] += s;
    }
    const o0 = rowOffset(n, i);
    const o1 = o0 + n - i - 1;
    const o2 = o1 + n - i - 2;
    const o3 = o2 + n - i - 3;
    const o4 = o3 + n - i - 4;
    const o5 = o4 + n - i - 5;
    const o6 = o5 + n - i - 6;
    const o7 = o6 + n - i - 7;
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
    for (let j = i + 8; j < n; j++) {
      const vj = v[j];
      const wj = w[j];
      const uj = u[j];
      const x0 = p[o0 + j] - v0 * wj - w0 * vj;
      p[o0 + j] = x0;
      s0 += x0 * uj;
      const x1 = p[o1 + j] - v1 * wj - w1 * vj;
      p[o1 + j] = x1;
      s1 += x1 * uj;
      const x2 = p[o2 + j] - v2 * wj - w2 * vj;
      p[o2 + j] = x2;
      s2 += x2 * uj;
      const x3 = p[o3 + j] - v3 * wj - w3 * vj;
      p[o3 + j] = x3;
      s3 += x3 * uj;
      const x4 = p[o4 + j] - v4 * wj - w4 * vj;
      p[o4 + j] = x4;
      s4 += x4 * uj;
      const x5 = p[o5 + j] - v5 * wj - w5 * vj;
      p[o5 + j] = x5;
      s5 += x5 * uj;
      const x6 = p[o6 + j] - v6 * wj - w6 * vj;
      p[o6 + j] = x6;
      s6 += x6 * uj;
      const x7 = p[o7 + j] - v7 * wj - w7 * vj;
      p[o7 + j] = x7;
      s7 += x7 * uj;
      q[j] += x0 * u0 + x1 * u1 + x2 * u2 + x3 * u3 + x4 * u4 + x5 * u5 + x6 * u6 + x7 * u7;
    }
    q[i] += s0;
    q[i + 1] += s1;
    q[i + 2] += s2;
    q[i + 3] += s3;
    q[i + 4] += s4;
    q[i + 5] += s5;
    q[i + 6] += s6;
    q[i + 7] += s7;
  }
}

/** Packed row i alone (its diagonal entry and entries i + 1 … N − 1). */
function oneRowUpdateAndProduct(p: Float64Array, n: number, i: number, v: Float64Array, w: Float64Array, u: Float64Array, q: Float64Array): void {
  const o = rowOffset(n, i);
  const vi = v[i];
  const wi = w[i];
  const ui = u[i];
  const d = p[o + i] - 2 * vi * wi;
  p[o + i] = d;
  let s = d * ui;
  for (let j = i + 1; j < n; j++) {
    const x = p[o + j] - vi * w[j] - wi * v[j];
    p[o + j] = x;
    s += x * u[j];
    q[j] += x * ui;
  }
  q[i] += s;
}
