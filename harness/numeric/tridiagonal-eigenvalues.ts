import { symmetricTwoByTwo } from './symmetric-two-by-two.js';
import { forEachUnreducedBlock, reverseBlock } from './tridiagonal-blocks.js';
import type { SymmetricTridiagonal } from './symmetric-tridiagonal.js';

/**
 * Eigenvalues of a real symmetric tridiagonal matrix, ascending, by the root-free implicit QL
 * iteration with Wilkinson shifts of Pal, Walker and Kahan, as LAPACK dsterf arranges it.
 *
 * Method: written after LAPACK dsterf (Anderson et al. 1999). The matrix splits where an
 * off-diagonal entry is negligible (|e_m| ≤ ε √|d_m| √|d_{m+1}|); each unreduced block is scaled
 * into a safe range, and its squared off-diagonal entries are then driven to zero by QL sweeps that
 * need no square roots (the Pal–Walker–Kahan recurrence for c², s², γ). dsterf chooses QL or QR
 * per block so that the iteration starts from the end with the smaller diagonal entry (the better
 * choice for graded matrices); here the block is reversed instead, which is the same iteration.
 * Blocks of order 2 are solved directly (dlae2, symmetric-two-by-two.ts).
 *
 * Cost: about 9N² flops (no eigenvectors). Accuracy: each eigenvalue has absolute error
 * O(ε ‖T‖) (Golub and Van Loan 2013, §8.3.5 and Theorem 8.1.4).
 *
 * Failure: at most 30 N QL sweeps in total (dsterf's MAXIT = 30); past that, or on a
 * non-finite entry, a RangeError is thrown rather than looping or returning garbage.
 *
 * References: E. Anderson et al., LAPACK Users' Guide, 3rd ed., SIAM, 1999 (dsterf, dlae2).
 * G. H. Golub and C. F. Van Loan, Matrix Computations, 4th ed., 2013, §8.3. B. N. Parlett, The
 * Symmetric Eigenvalue Problem, SIAM, 1998, §8.15 (the root-free QL of Pal, Walker and Kahan).
 */
export function tridiagonalEigenvalues(t: SymmetricTridiagonal): Float64Array {
  const n = t.diagonal.length;
  const d = Float64Array.from(t.diagonal);
  const e = new Float64Array(n);
  e.set(t.offDiagonal.subarray(0, Math.max(n - 1, 0)));
  const eps = Number.EPSILON / 2;
  const eps2 = eps * eps;
  const maxSweeps = 30 * n;
  let sweeps = 0;
  forEachUnreducedBlock(d, e, 'tridiagonalEigenvalues', (start, lend) => {
    let l = start;
    if (Math.abs(d[lend]) < Math.abs(d[l])) reverseBlock(d, e, l, lend);
    for (let i = l; i < lend; i++) e[i] *= e[i];
    // QL iteration on the block, with e holding squared off-diagonal entries.
    while (l <= lend) {
      let mm = l;
      for (; mm < lend; mm++) if (Math.abs(e[mm]) <= eps2 * Math.abs(d[mm] * d[mm + 1])) break;
      if (mm < lend) e[mm] = 0;
      let p = d[l];
      if (mm === l) {
        l++;
        continue;
      }
      if (mm === l + 1) {
        const pair = symmetricTwoByTwo(d[l], Math.sqrt(e[l]), d[l + 1]);
        d[l] = pair.rt1;
        d[l + 1] = pair.rt2;
        e[l] = 0;
        l += 2;
        continue;
      }
      if (sweeps === maxSweeps) {
        throw new RangeError(`tridiagonalEigenvalues: QL iteration did not converge within ${maxSweeps} sweeps (N = ${n})`);
      }
      sweeps++;
      // Wilkinson shift from the leading 2×2 of the block.
      const rte = Math.sqrt(e[l]);
      let sigma = (d[l + 1] - p) / (2 * rte);
      const r0 = Math.hypot(sigma, 1);
      sigma = p - rte / (sigma + (sigma >= 0 ? r0 : -r0));
      let c = 1;
      let s = 0;
      let gamma = d[mm] - sigma;
      p = gamma * gamma;
      for (let i = mm - 1; i >= l; i--) {
        const bb = e[i];
        const r = p + bb;
        if (i !== mm - 1) e[i + 1] = s * r;
        const oldc = c;
        c = p / r;
        s = bb / r;
        const oldgam = gamma;
        const alpha = d[i];
        gamma = c * (alpha - sigma) - s * oldgam;
        d[i + 1] = oldgam + (alpha - gamma);
        p = c !== 0 ? (gamma * gamma) / c : oldc * bb;
      }
      e[l] = s * p;
      d[l] = sigma + gamma;
    }
  });
  return d.sort();
}
