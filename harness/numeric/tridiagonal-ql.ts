import { symmetricTwoByTwo } from './symmetric-two-by-two.js';
import type { SymmetricTridiagonal } from './symmetric-tridiagonal.js';
import { forEachUnreducedBlock, reverseBlock } from './tridiagonal-blocks.js';

/**
 * Eigenvalues and eigenvectors of a real symmetric tridiagonal matrix T by the implicit QL
 * iteration with Wilkinson shifts, the rotations applied to the rows of a caller's matrix.
 *
 * On entry `rows` holds N rows of `rowLength` numbers: the rows of Zᵀ for some Z (the identity, or
 * the transposed orthogonal factor of a Householder reduction, so that Z T Zᵀ = A). On return
 * rows[j] is the eigenvector of A belonging to the returned values[j] (Z S with T = S Λ Sᵀ).
 * A complex Z is passed with interleaved rows (rowLength = 2N): the rotations are real, so they
 * act on real and imaginary parts alike. The values come back in the order of the rows, NOT sorted.
 *
 * Method: written after LAPACK dsteqr (Anderson et al. 1999) and Numerical Recipes' tqli (Press
 * et al. 2007, §11.4): split where |e_m| ≤ ε √|d_m| √|d_{m+1}|; scale each unreduced block into a
 * safe range; chase the bulge of a Wilkinson-shifted QL step with Givens rotations (dlartg);
 * order-2 blocks directly (dlaev2). dsteqr chooses QL or QR per block so the iteration starts at
 * the end with the smaller diagonal entry; here the block, and its rows, are reversed instead.
 * The rotations of one QL sweep are applied to the rows four at a time, each entry being loaded
 * and stored once per four rotations (the sweep is a chain along the rows; our arrangement).
 *
 * Cost: about 3N² flops per eigenvalue on T plus 6·N·(block size) per sweep on the rows
 * (typically ~6N³ in all). Accuracy: normwise backward stable; ‖Zᵀ Z − I‖ and the residual are
 * O(N ε) (Golub and Van Loan 2013, §8.3.5).
 *
 * Failure: at most 30 N sweeps in total (dsteqr's MAXIT = 30), then a RangeError.
 *
 * References: E. Anderson et al., LAPACK Users' Guide, 3rd ed., SIAM, 1999 (dsteqr, dlartg,
 * dlaev2, dlasr). G. H. Golub and C. F. Van Loan, Matrix Computations, 4th ed., 2013, §8.3.3–8.3.5.
 * W. H. Press et al., Numerical Recipes, 3rd ed., Cambridge University Press, 2007, §11.4 (tqli).
 */
export function tridiagonalEigenpairs(t: SymmetricTridiagonal, rows: Float64Array, rowLength: number): Float64Array {
  const n = t.diagonal.length;
  const d = Float64Array.from(t.diagonal);
  const e = new Float64Array(n);
  e.set(t.offDiagonal.subarray(0, Math.max(n - 1, 0)));
  const cosines = new Float64Array(n);
  const sines = new Float64Array(n);
  const eps = Number.EPSILON / 2;
  const eps2 = eps * eps;
  const safeMin = 2.2250738585072014e-308;
  const maxSweeps = 30 * n;
  let sweeps = 0;
  forEachUnreducedBlock(d, e, 'tridiagonalEigenpairs', (start, lend) => {
    let l = start;
    if (Math.abs(d[lend]) < Math.abs(d[l])) {
      reverseBlock(d, e, l, lend);
      reverseRows(rows, rowLength, l, lend);
    }
    while (l <= lend) {
      let mm = l;
      for (; mm < lend; mm++) {
        const tst = e[mm] * e[mm];
        if (tst <= eps2 * Math.abs(d[mm]) * Math.abs(d[mm + 1]) + safeMin) break;
      }
      if (mm < lend) e[mm] = 0;
      let p = d[l];
      if (mm === l) {
        l++;
        continue;
      }
      if (mm === l + 1) {
        const pair = symmetricTwoByTwo(d[l], e[l], d[l + 1]);
        rotateRowPair(rows, rowLength, l, pair.cs, pair.sn);
        d[l] = pair.rt1;
        d[l + 1] = pair.rt2;
        e[l] = 0;
        l += 2;
        continue;
      }
      if (sweeps === maxSweeps) {
        throw new RangeError(`tridiagonalEigenpairs: QL iteration did not converge within ${maxSweeps} sweeps (N = ${n})`);
      }
      sweeps++;
      // Wilkinson shift from the leading 2×2 of the block (dsteqr, tqli).
      let g = (d[l + 1] - p) / (2 * e[l]);
      let r = Math.hypot(g, 1);
      g = d[mm] - p + e[l] / (g + (g >= 0 ? r : -r));
      let s = 1;
      let c = 1;
      p = 0;
      for (let i = mm - 1; i >= l; i--) {
        const f = s * e[i];
        const b = c * e[i];
        r = givens(g, f);
        c = rotationCosine;
        s = rotationSine;
        if (i !== mm - 1) e[i + 1] = r;
        g = d[i + 1] - p;
        r = (d[i] - g) * s + 2 * c * b;
        p = s * r;
        d[i + 1] = g + p;
        g = c * r - b;
        cosines[i] = c;
        sines[i] = -s;
      }
      applySweep(rows, rowLength, l, mm, cosines, sines);
      d[l] -= p;
      e[l] = g;
    }
  });
  return d;
}

let rotationCosine = 1;
let rotationSine = 0;

/**
 * Plane rotation with c·f + s·g = r and −s·f + c·g = 0, c ≥ 0 (LAPACK dlartg as rewritten by
 * E. Anderson for LAPACK 3.10: scaling only outside the safe range); returns r and leaves c, s in
 * module scratch, so the QL inner loop allocates nothing.
 */
function givens(f: number, g: number): number {
  if (g === 0) {
    rotationCosine = 1;
    rotationSine = 0;
    return f;
  }
  if (f === 0) {
    rotationCosine = 0;
    rotationSine = Math.sign(g);
    return Math.abs(g);
  }
  const f1 = Math.abs(f);
  const g1 = Math.abs(g);
  const rtmin = 1.4916681462400413e-154;
  const rtmax = 4.7403759540545887e153;
  let d: number;
  let u = 1;
  if (f1 > rtmin && f1 < rtmax && g1 > rtmin && g1 < rtmax) {
    d = Math.sqrt(f * f + g * g);
  } else {
    u = Math.min(1.7976931348623157e308, Math.max(2.2250738585072014e-308, f1, g1));
    d = Math.hypot(f / u, g / u);
  }
  rotationCosine = f1 / u / d;
  const r = f >= 0 ? d : -d;
  rotationSine = g / u / r;
  return r * u;
}

/**
 * The rotations of one QL sweep, i = m − 1 down to l, each mixing rows i and i + 1:
 * row_{i+1} ← c_i row_{i+1} − s_i row_i, row_i ← s_i row_{i+1} + c_i row_i (dlasr, SIDE = 'R',
 * PIVOT = 'V', DIRECT = 'B', on Z; here on the rows of Zᵀ). After rotation i, row i + 1 is final
 * for this sweep, so the sweep runs down each column as a chain: the running "carry" is row i.
 */
function applySweep(rows: Float64Array, len: number, l: number, m: number, cs: Float64Array, sn: Float64Array): void {
  let i = m - 1;
  for (; i - 3 >= l; i -= 4) {
    const c0 = cs[i], s0 = sn[i], c1 = cs[i - 1], s1 = sn[i - 1];
    const c2 = cs[i - 2], s2 = sn[i - 2], c3 = cs[i - 3], s3 = sn[i - 3];
    const top = (i + 1) * len;
    const r0 = i * len;
    const r1 = r0 - len;
    const r2 = r1 - len;
    const r3 = r2 - len;
    for (let k = 0; k < len; k++) {
      const carry = rows[top + k];
      let x = rows[r0 + k];
      rows[top + k] = c0 * carry - s0 * x;
      let y = s0 * carry + c0 * x;
      x = rows[r1 + k];
      rows[r0 + k] = c1 * y - s1 * x;
      y = s1 * y + c1 * x;
      x = rows[r2 + k];
      rows[r1 + k] = c2 * y - s2 * x;
      y = s2 * y + c2 * x;
      x = rows[r3 + k];
      rows[r2 + k] = c3 * y - s3 * x;
      rows[r3 + k] = s3 * y + c3 * x;
    }
  }
  for (; i >= l; i--) rotateRowPair(rows, len, i, cs[i], sn[i]);
}

/** row_{i+1} ← c row_{i+1} − s row_i, row_i ← s row_{i+1} + c row_i. */
function rotateRowPair(rows: Float64Array, len: number, i: number, c: number, s: number): void {
  const lo = i * len;
  const hi = lo + len;
  for (let k = 0; k < len; k++) {
    const t = rows[hi + k];
    const x = rows[lo + k];
    rows[hi + k] = c * t - s * x;
    rows[lo + k] = s * t + c * x;
  }
}

function reverseRows(rows: Float64Array, len: number, l: number, lend: number): void {
  const tmp = new Float64Array(len);
  for (let i = l, j = lend; i < j; i++, j--) {
    tmp.set(rows.subarray(i * len, (i + 1) * len));
    rows.copyWithin(i * len, j * len, (j + 1) * len);
    rows.set(tmp, j * len);
  }
}
