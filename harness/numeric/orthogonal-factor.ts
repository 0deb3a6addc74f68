/**
 * The transposed orthogonal (or unitary) factor of a Householder tridiagonalisation, Qᵀ with
 * Q = H_0 H_1 ⋯ H_{N−3}, formed from the stored reflectors. Row r of the result is column r of Q,
 * the layout that the QL iteration (tridiagonal-ql.ts) rotates.
 *
 * Method: backward accumulation (Golub and Van Loan 2013, §5.1.6; LAPACK dorg2l/dorgtr and
 * zungtr, Anderson et al. 1999): M ← H_k M for k = N − 3 down to 0, starting from M = I, so each
 * step touches only the trailing (N − k − 1)² block. On Mᵀ a reflector acts on each row x as
 * x ← x − τ (x · conj(v)) vᵀ, a dot product and an axpy along a contiguous row; two reflectors
 * (k and k − 1) are applied per pass over a row, using the precomputed v_kᵀ conj(v_{k−1}), which
 * halves the passes (the idea of the compact WY form, Schreiber and Van Loan 1989, at width 2).
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
  let k = n - 3;
  for (; k >= 1; k -= 2) {
    // Reflectors k and k − 1 together: x ← (x − τ_k s₁ v_k) − τ_{k−1} s₂ v_{k−1} with s₁ = x·v_k
    // and s₂ = x·v_{k−1} − τ_k s₁ (v_k·v_{k−1}) (v_k[k] = 0, v_{k−1}[k] = 1).
    const a = k * n;
    const b = (k - 1) * n;
    let vavb = 0;
    for (let j = k + 1; j < n; j++) vavb += reflectors[a + j] * reflectors[b + j];
    let r = k;
    for (; r < n && (n - r) % 2 === 1; r++) applyPairToRows(qt, reflectors, n, k, tau[k], tau[k - 1], vavb, r, 1);
    for (; r < n; r += 2) applyPairToRows(qt, reflectors, n, k, tau[k], tau[k - 1], vavb, r, 2);
  }
  if (k === 0) {
    const t = tau[0];
    for (let r = 1; r < n; r++) {
      const row = r * n;
      let s = 0;
      for (let j = 1; j < n; j++) s += qt[row + j] * reflectors[j];
      const f = t * s;
      for (let j = 1; j < n; j++) qt[row + j] -= f * reflectors[j];
    }
  }
  return qt;
}

/**
 * Reflectors k and k − 1 on rows r … r + count − 1 of Qᵀ (count 1 or 2; two rows share each
 * load of the reflector entries).
 */
function applyPairToRows(
  qt: Float64Array,
  refl: Float64Array,
  n: number,
  k: number,
  ta: number,
  tb: number,
  vavb: number,
  r: number,
  count: number,
): void {
  const a = k * n;
  const b = (k - 1) * n;
  const row0 = r * n;
  const row1 = count === 2 ? row0 + n : row0;
  const bk = refl[b + k];
  let s1 = 0;
  let s2 = qt[row0 + k] * bk;
  let t1 = 0;
  let t2 = qt[row1 + k] * bk;
  for (let j = k + 1; j < n; j++) {
    const va = refl[a + j];
    const vb = refl[b + j];
    const x = qt[row0 + j];
    const y = qt[row1 + j];
    s1 += x * va;
    s2 += x * vb;
    t1 += y * va;
    t2 += y * vb;
  }
  const f1 = ta * s1;
  const f2 = tb * (s2 - f1 * vavb);
  const g1 = ta * t1;
  const g2 = tb * (t2 - g1 * vavb);
  qt[row0 + k] -= f2 * bk;
  if (count === 2) qt[row1 + k] -= g2 * bk;
  else {
    // One row: the second set of sums is the same row; leave it unapplied.
    for (let j = k + 1; j < n; j++) qt[row0 + j] -= f1 * refl[a + j] + f2 * refl[b + j];
    return;
  }
  for (let j = k + 1; j < n; j++) {
    const va = refl[a + j];
    const vb = refl[b + j];
    qt[row0 + j] -= f1 * va + f2 * vb;
    qt[row1 + j] -= g1 * va + g2 * vb;
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
