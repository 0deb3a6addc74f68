import { fusedSweep, packedRowOffset as rowOffset, sweepWorkspace } from './fused-sweep.js';
import { fusedSweepKernel } from './fused-sweep-kernel.js';
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
 * takes columns in blocks so each loaded v_j, w_j, v′_j and product entry serves several matrix
 * entries (fused-sweep.ts). This halves the passes over the trailing matrix compared with dsytd2;
 * the flop count, (4/3)N³, is unchanged. (The fusion is the one-pass form of the matrix–vector
 * products that dominate LAPACK's dlatrd/dsytrd; the arrangement is our own, chosen by timing.)
 * With `sweep = 'simd'` (the default) the bulk of each sweep runs in a WebAssembly SIMD kernel on
 * pairs of doubles (fused-sweep-kernel.ts), about 3× faster than the scalar loop on Node 20; where
 * WebAssembly SIMD is missing, or with `sweep = 'scalar'`, the scalar loop runs. The arithmetic
 * per matrix entry is the same; the product sums are grouped differently, so the two differ at
 * rounding level. The
 * blocked dsytrd form (tridiagonalise-real-blocked.ts) was measured too and is slower on V8.
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

/** a: N×N row-major, lower triangle read (not modified); `sweep` chooses the sweep's inner loop (see above). */
export function tridiagonaliseReal(a: Float64Array, n: number, keepReflectors: boolean, sweep: 'simd' | 'scalar' = 'simd'): RealReduction {
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
  const { workspace, kernel } = sweepWorkspace(n, sweep === 'simd' ? fusedSweepKernel() : null);
  const p = workspace.packed;
  for (let i = 0; i < n; i++) for (let j = 0; j <= i; j++) p[rowOffset(n, j) + i] = a[i * n + j];
  const [first, second, w, q] = workspace.vectors;
  let v = first;
  let u = second;
  w.fill(0);
  q.fill(0);
  diagonal[0] = p[0];
  let reflector = makeReflector(p, n, 0, v, reflectors);
  // q = A₂₂ v₀ by the same sweep with a zero update (w = 0).
  fusedSweep(p, n, 1, v, w, v, q, kernel);
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
    fusedSweep(p, n, c + 1, v, w, u, q, kernel);
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
