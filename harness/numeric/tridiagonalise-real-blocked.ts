import { householderReflector } from './householder-reflector.js';
import type { RealReduction } from './tridiagonalise-real.js';

/**
 * Blocked Householder reduction of a real symmetric matrix to tridiagonal form, T = Qᵀ A Q, reading
 * the LOWER triangle only; the same reflectors, τ and T as the unblocked reduction
 * (tridiagonalise-real.ts) up to rounding.
 *
 * Method (LAPACK dsytrd with dlatrd, UPLO = 'L'; Golub and Van Loan 2013, §8.3.1 and §5.2.3 for
 * the blocked form): the columns are taken in panels of nb. Within a panel, step i makes reflector
 * v_i from column c = k₀ + i after bringing that one column up to date with the panel's earlier
 * reflectors (A[c:, c] −= V Wᵀ[c] + W Vᵀ[c]), and forms
 *   w_i = τ_i (A₂₂ v_i − V(Wᵀv_i) − W(Vᵀv_i)) − (τ_i/2)(that·v_i) v_i,
 * where A₂₂ is the trailing matrix as it was at the start of the panel (the two corrections stand
 * for the panel's earlier rank-2 updates, which are not yet applied). After the panel the trailing
 * matrix takes all nb rank-2 updates at once, A₂₂ −= V Wᵀ + W Vᵀ (a symmetric rank-2nb update,
 * dsyr2k). So each column costs one read-only pass over the trailing matrix (the symmetric
 * matrix–vector product) instead of a read-write pass, and the update runs as a register-tiled
 * product over the panel that reads and writes each trailing entry once per panel.
 *
 * Storage: the lower triangle is copied once, transposed, into an N×N work array whose row r holds
 * column r of the lower triangle at indices r … N − 1, so every inner loop runs along a contiguous
 * row. The panel is also packed row by row as P = [V W] and Q = [W V] (row j holds the 2nb panel
 * values of index j), so A[j, r] −= Σ_q P[r, q] Q[j, q] is a dot product of two contiguous rows;
 * the update computes it for 4 × 4 tiles of (r, j) with sixteen accumulators.
 *
 * Status: not the default. On Node 20 (V8, scalar floating point) every kernel here — the
 * symmetric product, the tiled update — runs at about the rate of the scalar fused sweep of
 * tridiagonalise-real.ts (≈ 3.3 GFlop/s measured on this project's machine), so the blocked form,
 * with the same (4/3)N³ flops plus the panel's O(N²·nb) corrections, took 1.3–1.4× the CPU time of
 * that scalar sweep at N = 1000 and 2000 (best of 5, both in one process, alternating), and about
 * 3× the time of the default SIMD sweep. Blocking pays where memory traffic, not the flop rate, is
 * the limit (LAPACK with a vectorised BLAS); `npm run bench` times it in the same run as the
 * default ('eigenvalues, blocked reduction'), so the choice can be re-measured.
 *
 * Accuracy: backward stable, like the unblocked reduction (the blocked form is an exact
 * rearrangement of the same reflectors; Golub and Van Loan 2013, §8.3.1 and §5.2.3).
 *
 * References: E. Anderson et al., LAPACK Users' Guide, 3rd ed., SIAM, 1999 (dsytrd, dlatrd, dsyr2k,
 * dlarfg). G. H. Golub and C. F. Van Loan, Matrix Computations, 4th ed., Johns Hopkins University
 * Press, 2013, §5.2.3 and §8.3.1. J. J. Dongarra, S. J. Hammarling and D. C. Sorensen, "Block
 * reduction of matrices to condensed forms for eigenvalue computations", J. Comput. Appl. Math. 27
 * (1989) 215–227 (volume and pages from memory).
 */
export const DEFAULT_PANEL_WIDTH = 32;

/** a: N×N row-major, lower triangle read (not modified). */
export function tridiagonaliseRealBlocked(a: Float64Array, n: number, keepReflectors: boolean, panelWidth = DEFAULT_PANEL_WIDTH): RealReduction {
  if (!Number.isInteger(panelWidth) || panelWidth < 1) throw new RangeError(`panel width must be a positive integer, got ${panelWidth}`);
  const diagonal = new Float64Array(n);
  const offDiagonal = new Float64Array(Math.max(n - 1, 0));
  const tau = new Float64Array(Math.max(n - 2, 0));
  const reflectors = keepReflectors ? new Float64Array(n * n) : null;
  const result = { tridiagonal: { diagonal, offDiagonal }, reflectors, tau };
  if (n === 0) return result;
  const work = new Float64Array(n * n);
  for (let i = 0; i < n; i++) for (let j = 0; j <= i; j++) work[j * n + i] = a[i * n + j];
  const nb = Math.min(panelWidth, n);
  const panel = new Panel(n, nb);
  for (let k0 = 0; k0 < n; k0 += nb) {
    const width = Math.min(nb, n - k0);
    reducePanel(work, n, k0, width, panel, diagonal, offDiagonal, tau, reflectors);
    if (k0 + width < n) trailingUpdate(work, n, k0 + width, width, panel);
  }
  return result;
}

/** The panel's reflectors and w vectors, by panel column (v, w) and packed by row (p, q). */
class Panel {
  readonly v: Float64Array;
  readonly w: Float64Array;
  readonly p: Float64Array;
  readonly q: Float64Array;
  /** Scratch: Wᵀv and Vᵀv for the corrections, and the product A₂₂ v. */
  readonly wtv: Float64Array;
  readonly vtv: Float64Array;
  readonly y: Float64Array;
  readonly x: Float64Array;
  constructor(n: number, nb: number) {
    this.v = new Float64Array(nb * n);
    this.w = new Float64Array(nb * n);
    this.p = new Float64Array(2 * nb * n);
    this.q = new Float64Array(2 * nb * n);
    this.wtv = new Float64Array(nb);
    this.vtv = new Float64Array(nb);
    this.y = new Float64Array(n);
    this.x = new Float64Array(n);
  }
}

/**
 * Steps c = k0 … k0 + width − 1 (dlatrd): diagonal and off-diagonal entries of T and, for c ≤ N − 3,
 * the reflector v and its w. Leaves the panel packed in `panel.p`, `panel.q` for the update.
 */
function reducePanel(
  work: Float64Array,
  n: number,
  k0: number,
  width: number,
  panel: Panel,
  diagonal: Float64Array,
  offDiagonal: Float64Array,
  tau: Float64Array,
  reflectors: Float64Array | null,
): void {
  const { v: V, w: W, wtv, vtv, y } = panel;
  V.fill(0);
  W.fill(0);
  for (let i = 0; i < width; i++) {
    const c = k0 + i;
    const oc = c * n;
    // Bring column c (row c of work) up to date with the panel's reflectors 0 … i − 1.
    for (let r = 0; r < i; r++) {
      const vr = V[r * n + c];
      const wr = W[r * n + c];
      const ov = r * n;
      for (let j = c; j < n; j++) work[oc + j] -= V[ov + j] * wr + W[ov + j] * vr;
    }
    diagonal[c] = work[oc + c];
    if (c === n - 1) break;
    if (c === n - 2) {
      offDiagonal[c] = work[oc + c + 1];
      continue;
    }
    const vi = i * n;
    const reflector = makeReflector(work, n, c, V, vi, reflectors);
    offDiagonal[c] = reflector.beta;
    tau[c] = reflector.tau;
    if (reflector.tau === 0) continue;
    // y = A₂₂ v_i over rows and columns c + 1 … N − 1 (A₂₂ as at the start of the panel).
    symmetricProduct(work, n, c + 1, V, vi, y, panel.x);
    // Corrections for the panel's earlier updates: y −= V (Wᵀ v) + W (Vᵀ v).
    for (let r = 0; r < i; r++) {
      let sw = 0;
      let sv = 0;
      const o = r * n;
      for (let j = c + 1; j < n; j++) {
        sw += W[o + j] * V[vi + j];
        sv += V[o + j] * V[vi + j];
      }
      wtv[r] = sw;
      vtv[r] = sv;
    }
    for (let r = 0; r < i; r++) {
      const a = wtv[r];
      const b = vtv[r];
      const o = r * n;
      for (let j = c + 1; j < n; j++) y[j] -= V[o + j] * a + W[o + j] * b;
    }
    // w = τ y − (τ/2)(τ yᵀv) v.
    const t = reflector.tau;
    let yv = 0;
    for (let j = c + 1; j < n; j++) yv += y[j] * V[vi + j];
    const half = 0.5 * t * t * yv;
    for (let j = c + 1; j < n; j++) W[vi + j] = t * y[j] - half * V[vi + j];
  }
  // Pack by row for the update: P[j] = (v_0[j] … v_{nb−1}[j], w_0[j] …), Q[j] = (w …, v …).
  const nb2 = 2 * width;
  for (let j = k0 + width; j < n; j++) {
    const o = j * nb2;
    for (let r = 0; r < width; r++) {
      const vj = V[r * n + j];
      const wj = W[r * n + j];
      panel.p[o + r] = vj;
      panel.p[o + width + r] = wj;
      panel.q[o + r] = wj;
      panel.q[o + width + r] = vj;
    }
  }
}

/**
 * Reflector for column c: x = A[c + 1 …, c] (work row c; householder-reflector.ts, after dlarfg),
 * returns τ and β with (I − τ v vᵀ) x = β e₁; v goes to V[vi + c + 1 …] (v[c + 1] = 1) and, when
 * kept, to row c of `store`.
 */
function makeReflector(work: Float64Array, n: number, c: number, V: Float64Array, vi: number, store: Float64Array | null): { tau: number; beta: number } {
  const r = c + 1;
  const o = c * n;
  const reflector = householderReflector(work, o + r, n - r);
  V[vi + r] = 1;
  if (reflector.tau !== 0) V.set(work.subarray(o + r + 1, o + n), vi + r + 1);
  if (store !== null) {
    store[c * n + r] = 1;
    store.set(V.subarray(vi + r + 1, vi + n), c * n + r + 1);
  }
  return reflector;
}

/**
 * y = A x over rows and columns lo … N − 1 of the symmetric matrix held by rows (row r: A[j, r],
 * j ≥ r); x = V[xi + …]. Each off-diagonal entry serves both (Ax)_r and (Ax)_j; rows go eight at a
 * time so each loaded x_j and y_j serves eight matrix entries (eight rather than four: 1.3× faster
 * on V8, by timing).
 */
function symmetricProduct(work: Float64Array, n: number, lo: number, V: Float64Array, xi: number, y: Float64Array, x: Float64Array): void {
  y.fill(0, lo, n);
  for (let j = lo; j < n; j++) x[j] = V[xi + j];
  let r = lo;
  for (; r + 8 <= n; r += 8) {
    // The 8×8 triangle at the diagonal first.
    for (let a = r; a < r + 8; a++) {
      const o = a * n;
      const xa = x[a];
      let s = work[o + a] * xa;
      for (let j = a + 1; j < r + 8; j++) {
        const e = work[o + j];
        s += e * x[j];
        y[j] += e * xa;
      }
      y[a] += s;
    }
    const o0 = r * n;
    const o1 = o0 + n;
    const o2 = o1 + n;
    const o3 = o2 + n;
    const o4 = o3 + n;
    const o5 = o4 + n;
    const o6 = o5 + n;
    const o7 = o6 + n;
    const x0 = x[r];
    const x1 = x[r + 1];
    const x2 = x[r + 2];
    const x3 = x[r + 3];
    const x4 = x[r + 4];
    const x5 = x[r + 5];
    const x6 = x[r + 6];
    const x7 = x[r + 7];
    let s0 = 0;
    let s1 = 0;
    let s2 = 0;
    let s3 = 0;
    let s4 = 0;
    let s5 = 0;
    let s6 = 0;
    let s7 = 0;
    for (let j = r + 8; j < n; j++) {
      const xj = x[j];
      const a0 = work[o0 + j];
      const a1 = work[o1 + j];
      const a2 = work[o2 + j];
      const a3 = work[o3 + j];
      const a4 = work[o4 + j];
      const a5 = work[o5 + j];
      const a6 = work[o6 + j];
      const a7 = work[o7 + j];
      s0 += a0 * xj;
      s1 += a1 * xj;
      s2 += a2 * xj;
      s3 += a3 * xj;
      s4 += a4 * xj;
      s5 += a5 * xj;
      s6 += a6 * xj;
      s7 += a7 * xj;
      y[j] += a0 * x0 + a1 * x1 + a2 * x2 + a3 * x3 + a4 * x4 + a5 * x5 + a6 * x6 + a7 * x7;
    }
    y[r] += s0;
    y[r + 1] += s1;
    y[r + 2] += s2;
    y[r + 3] += s3;
    y[r + 4] += s4;
    y[r + 5] += s5;
    y[r + 6] += s6;
    y[r + 7] += s7;
  }
  for (; r < n; r++) {
    const o = r * n;
    const xr = x[r];
    let s = work[o + r] * xr;
    for (let j = r + 1; j < n; j++) {
      const e = work[o + j];
      s += e * x[j];
      y[j] += e * xr;
    }
    y[r] += s;
  }
}

/**
 * A₂₂ −= V Wᵀ + W Vᵀ over rows and columns lo … N − 1 (dsyr2k, lower triangle, held by rows):
 * A[j, r] −= Σ_q P[r, q] Q[j, q] for j ≥ r, in 4 × 2 tiles of (r, j) off the diagonal.
 */
function trailingUpdate(work: Float64Array, n: number, lo: number, width: number, panel: Panel): void {
  const P = panel.p;
  const Q = panel.q;
  const m = 2 * width;
  let r = lo;
  for (; r + 4 <= n; r += 4) {
    // Triangle at the diagonal: rows r … r + 3, columns up to r + 3.
    for (let a = r; a < r + 4; a++) {
      for (let j = a; j < r + 4; j++) work[a * n + j] -= dot(P, a * m, Q, j * m, m);
    }
    const p0 = r * m;
    const p1 = p0 + m;
    const p2 = p1 + m;
    const p3 = p2 + m;
    const o0 = r * n;
    const o1 = o0 + n;
    const o2 = o1 + n;
    const o3 = o2 + n;
    let j = r + 4;
    for (; j + 4 <= n; j += 4) {
      const qa = j * m;
      const qb = qa + m;
      const qc = qb + m;
      const qd = qc + m;
      let c00 = 0;
      let c01 = 0;
      let c02 = 0;
      let c03 = 0;
      let c10 = 0;
      let c11 = 0;
      let c12 = 0;
      let c13 = 0;
      let c20 = 0;
      let c21 = 0;
      let c22 = 0;
      let c23 = 0;
      let c30 = 0;
      let c31 = 0;
      let c32 = 0;
      let c33 = 0;
      for (let k = 0; k < m; k++) {
        const y0 = Q[qa + k];
        const y1 = Q[qb + k];
        const y2 = Q[qc + k];
        const y3 = Q[qd + k];
        let x = P[p0 + k];
        c00 += x * y0;
        c01 += x * y1;
        c02 += x * y2;
        c03 += x * y3;
        x = P[p1 + k];
        c10 += x * y0;
        c11 += x * y1;
        c12 += x * y2;
        c13 += x * y3;
        x = P[p2 + k];
        c20 += x * y0;
        c21 += x * y1;
        c22 += x * y2;
        c23 += x * y3;
        x = P[p3 + k];
        c30 += x * y0;
        c31 += x * y1;
        c32 += x * y2;
        c33 += x * y3;
      }
      work[o0 + j] -= c00;
      work[o0 + j + 1] -= c01;
      work[o0 + j + 2] -= c02;
      work[o0 + j + 3] -= c03;
      work[o1 + j] -= c10;
      work[o1 + j + 1] -= c11;
      work[o1 + j + 2] -= c12;
      work[o1 + j + 3] -= c13;
      work[o2 + j] -= c20;
      work[o2 + j + 1] -= c21;
      work[o2 + j + 2] -= c22;
      work[o2 + j + 3] -= c23;
      work[o3 + j] -= c30;
      work[o3 + j + 1] -= c31;
      work[o3 + j + 2] -= c32;
      work[o3 + j + 3] -= c33;
    }
    for (; j < n; j++) {
      work[o0 + j] -= dot(P, p0, Q, j * m, m);
      work[o1 + j] -= dot(P, p1, Q, j * m, m);
      work[o2 + j] -= dot(P, p2, Q, j * m, m);
      work[o3 + j] -= dot(P, p3, Q, j * m, m);
    }
  }
  for (; r < n; r++) for (let j = r; j < n; j++) work[r * n + j] -= dot(P, r * m, Q, j * m, m);
}

function dot(x: Float64Array, xo: number, y: Float64Array, yo: number, m: number): number {
  let s = 0;
  for (let k = 0; k < m; k++) s += x[xo + k] * y[yo + k];
  return s;
}
