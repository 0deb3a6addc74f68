/**
 * The transposed orthogonal (or unitary) factor of a Householder tridiagonalisation, Qᵀ with
 * Q = H_0 H_1 ⋯ H_{N−3}, formed from the stored reflectors. Row r of the result is column r of Q,
 * the layout that the QL iteration (tridiagonal-ql.ts) rotates.
 *
 * Method: backward accumulation (Golub and Van Loan 2013, §5.1.6; LAPACK dorg2l/dorgtr and
 * zungtr, Anderson et al. 1999): M ← H_k M for k = N − 3 down to 0, starting from M = I, so each
 * step touches only the trailing (N − k − 1)² block. On Mᵀ a reflector acts on each row x as
 * x ← x − τ (x · conj(v)) vᵀ, a dot product and an axpy along a contiguous row. In the real case
 * two reflectors (k and k − 1) are applied per pass over a row, using the precomputed v_kᵀv_{k−1},
 * which halves the passes (the compact WY form at width 2, Schreiber and Van Loan 1989), and since
 * rows are independent, blocks of four rows take all the reflectors while they stay in cache.
 * Cost (4/3)N³ flops real, 4× that complex.
 *
 * Reflector storage: row k of `reflectors`, entries k + 1 … N − 1 (v_k[k + 1] = 1); real
 * (stride 1) or complex interleaved (stride 2), as tridiagonalise-real.ts and
 * tridiagonalise-hermitian.ts leave them. The complex reflectors are H_k = I − τ_k v_k v_k* with
 * τ_k real.
 *
 * References: G. H. Golub and C. F. Van Loan, Matrix Computations, 4th ed., 2013, §5.1.6 and
 * §5.1.7. R. Schreiber and C. Van Loan, "A storage-efficient WY representation for products of
 * Householder transformations", SIAM J. Sci. Stat. Comput. 10 (1989) 53–57.
 */
export function transposedRealFactor(reflectors: Float64Array, tau: Float64Array, n: number): Float64Array {
  const qt = new Float64Array(n * n);
  for (let i = 0; i < n; i++) qt[i * n + i] = 1;
  // v_k·v_{k−1} over j > k, for every k (pairs start at either parity, see below).
  const pairDot = new Float64Array(n);
  for (let k = 1; k <= n - 3; k++) {
    let s = 0;
    for (let j = k + 1; j < n; j++) s += reflectors[k * n + j] * reflectors[(k - 1) * n + j];
    pairDot[k] = s;
  }
  // Rows are independent: each block of four rows takes every reflector in turn while it stays in
  // cache. Row r is still e_r until reflector r − 1 (H_k mixes columns k + 1 …), so a block
  // starting at row r0 begins with reflector r0 + 2.
  for (let r0 = 0; r0 < n; r0 += 4) {
    const count = Math.min(4, n - r0);
    let k = Math.min(n - 3, r0 + count - 2);
    for (; k >= 1; k -= 2) {
      if (count === 4) applyPairToFourRows(qt, reflectors, n, k, tau[k], tau[k - 1], pairDot[k], r0);
      else for (let r = r0; r < r0 + count; r++) applyPairToRow(qt, reflectors, n, k, tau[k], tau[k - 1], pairDot[k], r);
    }
    if (k === 0) {
      for (let r = r0; r < r0 + count; r++) {
        const row = r * n;
        let s = 0;
        for (let j = 1; j < n; j++) s += qt[row + j] * reflectors[j];
        const f = tau[0] * s;
        for (let j = 1; j < n; j++) qt[row + j] -= f * reflectors[j];
      }
    }
  }
  return qt;
}

/**
 * Reflectors k and k − 1 on one row x of Qᵀ: x ← (x − τ_k s₁ v_k) − τ_{k−1} s₂ v_{k−1} with
 * s₁ = x·v_k and s₂ = x·v_{k−1} − τ_k s₁ (v_k·v_{k−1}) (v_k[k] = 0, v_{k−1}[k] = 1).
 */
function applyPairToRow(qt: Float64Array, refl: Float64Array, n: number, k: number, ta: number, tb: number, vavb: number, r: number): void {
  const a = k * n;
  const b = (k - 1) * n;
  const row = r * n;
  const bk = refl[b + k];
  let s1 = 0;
  let s2 = qt[row + k] * bk;
  for (let j = k + 1; j < n; j++) {
    const x = qt[row + j];
    s1 += x * refl[a + j];
    s2 += x * refl[b + j];
  }
  const f1 = ta * s1;
  const f2 = tb * (s2 - f1 * vavb);
  qt[row + k] -= f2 * bk;
  for (let j = k + 1; j < n; j++) qt[row + j] -= f1 * refl[a + j] + f2 * refl[b + j];
}

/** `applyPairToRow` on rows r0 … r0 + 3 at once, sharing each load of the reflector entries. */
function applyPairToFourRows(qt: Float64Array, refl: Float64Array, n: number, k: number, ta: number, tb: number, vavb: number, r0: number): void {
  const a = k * n;
  const b = (k - 1) * n;
  const o0 = r0 * n;
  const o1 = o0 + n;
  const o2 = o1 + n;
  const o3 = o2 + n;
  const bk = refl[b + k];
  let p0 = 0;
  let p1 = 0;
  let p2 = 0;
  let p3 = 0;
  let q0 = qt[o0 + k] * bk;
  let q1 = qt[o1 + k] * bk;
  let q2 = qt[o2 + k] * bk;
  let q3 = qt[o3 + k] * bk;
  for (let j = k + 1; j < n; j++) {
    const va = refl[a + j];
    const vb = refl[b + j];
    const x0 = qt[o0 + j];
    const x1 = qt[o1 + j];
    const x2 = qt[o2 + j];
    const x3 = qt[o3 + j];
    p0 += x0 * va;
    q0 += x0 * vb;
    p1 += x1 * va;
    q1 += x1 * vb;
    p2 += x2 * va;
    q2 += x2 * vb;
    p3 += x3 * va;
    q3 += x3 * vb;
  }
  p0 *= ta;
  p1 *= ta;
  p2 *= ta;
  p3 *= ta;
  q0 = tb * (q0 - p0 * vavb);
  q1 = tb * (q1 - p1 * vavb);
  q2 = tb * (q2 - p2 * vavb);
  q3 = tb * (q3 - p3 * vavb);
  qt[o0 + k] -= q0 * bk;
  qt[o1 + k] -= q1 * bk;
  qt[o2 + k] -= q2 * bk;
  qt[o3 + k] -= q3 * bk;
  for (let j = k + 1; j < n; j++) {
    const va = refl[a + j];
    const vb = refl[b + j];
    qt[o0 + j] -= p0 * va + q0 * vb;
    qt[o1 + j] -= p1 * va + q1 * vb;
    qt[o2 + j] -= p2 * va + q2 * vb;
    qt[o3 + j] -= p3 * va + q3 * vb;
  }
}

/** The complex counterpart: `reflectors` and the result are complex interleaved. */
export function transposedUnitaryFactor(reflectors: Float64Array, tau: Float64Array, n: number): Float64Array {
  const qt = new Float64Array(2 * n * n);
  for (let i = 0; i < n; i++) qt[2 * (i * n + i)] = 1;
  for (let k = n - 3; k >= 0; k--) {
    const t = tau[k];
    if (t === 0) continue;
    const a = 2 * k * n;
    for (let r = k + 1; r < n; r++) {
      const row = 2 * r * n;
      // s = Σ_j x_j conj(v_j); x_j ← x_j − τ s v_j.
      let sr = 0;
      let si = 0;
      for (let j = k + 1; j < n; j++) {
        const xr = qt[row + 2 * j];
        const xi = qt[row + 2 * j + 1];
        const vr = reflectors[a + 2 * j];
        const vi = reflectors[a + 2 * j + 1];
        sr += xr * vr + xi * vi;
        si += xi * vr - xr * vi;
      }
      const fr = t * sr;
      const fi = t * si;
      for (let j = k + 1; j < n; j++) {
        const vr = reflectors[a + 2 * j];
        const vi = reflectors[a + 2 * j + 1];
        qt[row + 2 * j] -= fr * vr - fi * vi;
        qt[row + 2 * j + 1] -= fr * vi + fi * vr;
      }
    }
  }
  return qt;
}
