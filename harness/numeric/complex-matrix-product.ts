/**
 * Dense products of N×N complex interleaved row-major matrices, for the eigenbasis transforms and
 * chain traces. Loops run in row-major axpy order (i, s, j), so the inner loop is contiguous;
 * a zero left factor entry skips its row of work (diagonal and sparse weights are common).
 * Each entry has absolute error ≤ N ε Σ|x_is||y_sj| (Higham 2002, Accuracy and Stability of
 * Numerical Algorithms, 2nd ed., SIAM, §3.5).
 */
export function complexProduct(x: Float64Array, y: Float64Array, n: number): Float64Array {
  const out = new Float64Array(2 * n * n);
  for (let r = 0; r < n; r++) {
    const row = 2 * r * n;
    for (let s = 0; s < n; s++) {
      addScaledRow(out, row, x[row + 2 * s], x[row + 2 * s + 1], y, 2 * s * n, n);
    }
  }
  return out;
}

/** X* Y (conjugate transpose of X times Y). */
export function conjugateTransposeProduct(x: Float64Array, y: Float64Array, n: number): Float64Array {
  const out = new Float64Array(2 * n * n);
  for (let r = 0; r < n; r++) {
    const row = 2 * r * n;
    // (X*Y)_ij = Σ_r conj(X_ri) Y_rj: row r of Y, scaled by conj(X_ri), into row i.
    for (let i = 0; i < n; i++) addScaledRow(out, 2 * i * n, x[row + 2 * i], -x[row + 2 * i + 1], y, row, n);
  }
  return out;
}

/** Row s of x (N×N complex) times the complex scalar d_s, in place. */
export function scaleRows(x: Float64Array, d: Float64Array, n: number): void {
  for (let s = 0; s < n; s++) {
    const dr = d[2 * s];
    const di = d[2 * s + 1];
    for (let k = 2 * s * n; k < 2 * (s + 1) * n; k += 2) {
      const xr = x[k];
      const xi = x[k + 1];
      x[k] = xr * dr - xi * di;
      x[k + 1] = xr * di + xi * dr;
    }
  }
}

/** out[target …] += (ar + i·ai) · y[source …], N complex entries. */
function addScaledRow(out: Float64Array, target: number, ar: number, ai: number, y: Float64Array, source: number, n: number): void {
  if (ar === 0 && ai === 0) return;
  for (let k = 0; k < 2 * n; k += 2) {
    const br = y[source + k];
    const bi = y[source + k + 1];
    out[target + k] += ar * br - ai * bi;
    out[target + k + 1] += ar * bi + ai * br;
  }
}
