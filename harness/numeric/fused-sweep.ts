import { FUSED_SWEEP_ROWS, type FusedSweepKernel, type FusedSweepWorkspace } from './fused-sweep-kernel.js';

/**
 * Packed layout (LAPACK's packed 'L', as in dsptrd): packed row i is column i of the lower
 * triangle, N − i numbers; entry (i, j), j ≥ i, lives at packedRowOffset(N, i) + j.
 */
export function packedRowOffset(n: number, i: number): number {
  return i * n - (i * (i - 1)) / 2 - i;
}

const rowOffset = packedRowOffset;

/**
 * The packed array and four vectors for a reduction of order N, and the kernel to sweep them with:
 * in the kernel's memory when there is a kernel and the arrays fit there (so it works on them in
 * place), else fresh arrays and no kernel.
 */
export function sweepWorkspace(n: number, kernel: FusedSweepKernel | null): { workspace: FusedSweepWorkspace; kernel: FusedSweepKernel | null } {
  const inKernel = kernel?.workspace(n) ?? null;
  if (inKernel !== null) return { workspace: inKernel, kernel };
  return { workspace: { packed: new Float64Array((n * (n + 1)) / 2), vectors: Array.from({ length: 4 }, () => new Float64Array(n)) }, kernel: null };
}

/**
 * One fused sweep of the Householder reduction (tridiagonalise-real.ts): over the trailing block
 * (rows and columns lo … N − 1 of the packed lower triangle), A ← A − v wᵀ − w vᵀ and q += A u with
 * the updated A, each off-diagonal entry (i, j), j > i, serving both (Au)_i and (Au)_j. With a
 * kernel (fused-sweep-kernel.ts) the off-diagonal rectangles of blocks of rows go to it and the
 * rest is done here; without, packed rows are taken 8 at a time in scalar code.
 */
export function fusedSweep(
  p: Float64Array,
  n: number,
  lo: number,
  v: Float64Array,
  w: Float64Array,
  u: Float64Array,
  q: Float64Array,
  kernel: FusedSweepKernel | null,
): void {
  if (kernel !== null) {
    simdUpdateAndProduct(p, n, lo, v, w, u, q, kernel);
    return;
  }
  // Rows that do not fill a block of 8 are taken one at a time first, so the optimising
  // compiler has seen both paths before it compiles the hot loop.
  let i = lo;
  const single = (n - lo) % 8;
  for (; i < lo + single; i++) oneRowUpdateAndProduct(p, n, i, v, w, u, q);
  for (; i < n; i += 8) {
    // The 8×8 diagonal block first: rows i … i + 7, their columns up to i + 7.
    diagonalBlockUpdateAndProduct(p, n, i, 8, v, w, u, q);
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

/**
 * The same sweep with the off-diagonal rectangles of blocks of FUSED_SWEEP_ROWS rows done by the
 * WebAssembly SIMD kernel (fused-sweep-kernel.ts) and the rest here: the leftover rows, the
 * diagonal triangles, and the one unpaired column of each block when its count is odd.
 */
function simdUpdateAndProduct(p: Float64Array, n: number, lo: number, v: Float64Array, w: Float64Array, u: Float64Array, q: Float64Array, kernel: FusedSweepKernel): void {
  const rows = FUSED_SWEEP_ROWS;
  let i = lo;
  const single = (n - lo) % rows;
  for (; i < lo + single; i++) oneRowUpdateAndProduct(p, n, i, v, w, u, q);
  const first = i;
  for (; i < n; i += rows) {
    diagonalBlockUpdateAndProduct(p, n, i, rows, v, w, u, q);
    const j = i + rows;
    if ((n - j) % 2 === 1) {
      const vj = v[j];
      const wj = w[j];
      const uj = u[j];
      let qj = 0;
      for (let r = i, o = rowOffset(n, i); r < i + rows; o += n - r - 1, r++) {
        const x = p[o + j] - v[r] * wj - w[r] * vj;
        p[o + j] = x;
        q[r] += x * uj;
        qj += x * u[r];
      }
      q[j] += qj;
    }
  }
  if (first < n) kernel.rectangles(n, first, rowOffset(n, first), p, v, w, u, q);
}

/** Rows i … i + size − 1 of the sweep, their columns up to i + size − 1 (the triangle at the diagonal). */
function diagonalBlockUpdateAndProduct(p: Float64Array, n: number, i: number, size: number, v: Float64Array, w: Float64Array, u: Float64Array, q: Float64Array): void {
  for (let r = i; r < i + size; r++) {
    const o = rowOffset(n, r);
    const vr = v[r];
    const wr = w[r];
    const ur = u[r];
    const d = p[o + r] - 2 * vr * wr;
    p[o + r] = d;
    let s = d * ur;
    for (let j = r + 1; j < i + size; j++) {
      const x = p[o + j] - vr * w[j] - wr * v[j];
      p[o + j] = x;
      s += x * u[j];
      q[j] += x * ur;
    }
    q[r] += s;
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
