/**
 * Shared steps of the two QL iterations (tridiagonal-eigenvalues.ts, tridiagonal-ql.ts), as in
 * LAPACK dsterf and dsteqr (Anderson et al., LAPACK Users' Guide, 3rd ed., SIAM, 1999): splitting
 * the tridiagonal (d, e) into unreduced blocks, scaling a block into a safe range, and reversing
 * a block (which turns dsteqr's QR branch into the QL branch).
 */
const EPS = Number.EPSILON / 2;
const SAFE_MIN = 2.2250738585072014e-308;
const SCALE_UP_LIMIT = Math.sqrt(1 / SAFE_MIN) / 3;
const SCALE_DOWN_LIMIT = Math.sqrt(SAFE_MIN) / (EPS * EPS);

/**
 * End of the unreduced block that starts at `start`: the first m ≥ start with
 * |e_m| ≤ ε √|d_m| √|d_{m+1}| (that e_m is set to zero), or N − 1.
 */
export function blockEnd(d: Float64Array, e: Float64Array, start: number): number {
  const n = d.length;
  let m = start;
  for (; m < n - 1; m++) {
    const tst = Math.abs(e[m]);
    if (tst === 0) break;
    if (tst <= Math.sqrt(Math.abs(d[m])) * Math.sqrt(Math.abs(d[m + 1])) * EPS) {
      e[m] = 0;
      break;
    }
  }
  return m;
}

/**
 * Scales rows and columns l … lend so the largest entry lies in [√safmin/ε², √safmax/3], as dsterf
 * and dsteqr do; returns the factor applied (1 when none was needed, 0 for a zero block, which
 * is left alone). A non-finite entry is a RangeError.
 */
export function scaleBlock(d: Float64Array, e: Float64Array, l: number, lend: number, caller: string): number {
  let anorm = 0;
  for (let i = l; i <= lend; i++) anorm = Math.max(anorm, Math.abs(d[i]));
  for (let i = l; i < lend; i++) anorm = Math.max(anorm, Math.abs(e[i]));
  if (!Number.isFinite(anorm) || Number.isNaN(anorm)) throw new RangeError(`${caller}: non-finite entry in the tridiagonal matrix`);
  if (anorm === 0) return 0;
  let scale = 1;
  if (anorm > SCALE_UP_LIMIT) scale = SCALE_UP_LIMIT / anorm;
  else if (anorm < SCALE_DOWN_LIMIT) scale = SCALE_DOWN_LIMIT / anorm;
  if (scale !== 1) {
    for (let i = l; i <= lend; i++) d[i] *= scale;
    for (let i = l; i < lend; i++) e[i] *= scale;
  }
  return scale;
}

/** Reverses rows and columns l … lend of the tridiagonal (d, e). */
export function reverseBlock(d: Float64Array, e: Float64Array, l: number, lend: number): void {
  for (let i = l, j = lend; i < j; i++, j--) {
    const t = d[i];
    d[i] = d[j];
    d[j] = t;
  }
  for (let i = l, j = lend - 1; i < j; i++, j--) {
    const t = e[i];
    e[i] = e[j];
    e[j] = t;
  }
}

/**
 * Runs `solve(l, lend)` on each unreduced block of (d, e) in turn, scaled into the safe range
 * (and scaled back afterwards); `solve` must leave the block's eigenvalues in d[l … lend]. This is
 * the outer loop of dsterf and dsteqr.
 */
export function forEachUnreducedBlock(d: Float64Array, e: Float64Array, caller: string, solve: (l: number, lend: number) => void): void {
  const n = d.length;
  let l1 = 0;
  while (l1 < n) {
    if (l1 > 0) e[l1 - 1] = 0;
    const lend = blockEnd(d, e, l1);
    const l = l1;
    l1 = lend + 1;
    if (lend === l) continue;
    const scale = scaleBlock(d, e, l, lend, caller);
    if (scale === 0) continue;
    solve(l, lend);
    if (scale !== 1) for (let i = l; i <= lend; i++) d[i] /= scale;
  }
}
