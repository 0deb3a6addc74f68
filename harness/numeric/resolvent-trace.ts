import type { Complex } from './complex.js';

/**
 * Normalised resolvent traces from a spectrum, O(N) per spectral parameter z.
 *
 * ⟨G(z)⟩ = Tr (H − z)⁻¹ / N = (1/N) Σ_i 1/(λ_i − z), and with a weight A,
 * ⟨G(z)A⟩ = Tr((H − z)⁻¹ A)/N = (1/N) Σ_i (V*AV)_ii/(λ_i − z), since G(z) = V diag(1/(λ − z)) V*
 * (THEORY.md, "Conventions"). The diagonal (V*AV)_ii comes from `eigenbasisDiagonal`.
 *
 * Method: each 1/(λ_i − z) by Smith's division (Smith 1962, Comm. ACM 5(8), 435), so no
 * intermediate overflows; sums in plain order (the terms are O(1/η) at worst and the sum's
 * relative error is O(N ε) times the condition Σ|t_i|/|Σ t_i|; common practice). A real z equal
 * to an eigenvalue gives an infinite or NaN result, as the resolvent does not exist there.
 */
export function normalisedResolventTrace(values: Float64Array, z: Complex): Complex {
  const n = values.length;
  if (n === 0) throw new RangeError('normalisedResolventTrace: empty spectrum (N = 0)');
  let re = 0;
  let im = 0;
  for (let i = 0; i < n; i++) {
    inverseOf(values[i] - z.re, -z.im);
    re += inverseRe;
    im += inverseIm;
  }
  return { re: re / n, im: im / n };
}

/**
 * ⟨G(z)A⟩ = (1/N) Σ_i diag_i/(λ_i − z), diag = (V*AV)_ii complex interleaved (length 2N), as
 * returned by `eigenbasisDiagonal` for the same decomposition.
 */
export function weightedResolventTrace(values: Float64Array, diag: Float64Array, z: Complex): Complex {
  const n = values.length;
  if (n === 0) throw new RangeError('weightedResolventTrace: empty spectrum (N = 0)');
  if (diag.length !== 2 * n) {
    throw new RangeError(`weightedResolventTrace: diagonal needs 2N = ${2 * n} numbers (complex interleaved), got ${diag.length}`);
  }
  let re = 0;
  let im = 0;
  for (let i = 0; i < n; i++) {
    inverseOf(values[i] - z.re, -z.im);
    const ar = diag[2 * i];
    const ai = diag[2 * i + 1];
    re += ar * inverseRe - ai * inverseIm;
    im += ar * inverseIm + ai * inverseRe;
  }
  return { re: re / n, im: im / n };
}

/** 1/(λ − z) for every eigenvalue, complex interleaved (length 2N): the diagonal of D(z). */
export function resolventDiagonal(values: Float64Array, z: Complex): Float64Array {
  const out = new Float64Array(2 * values.length);
  for (let i = 0; i < values.length; i++) {
    inverseOf(values[i] - z.re, -z.im);
    out[2 * i] = inverseRe;
    out[2 * i + 1] = inverseIm;
  }
  return out;
}

let inverseRe = 0;
let inverseIm = 0;

/** 1/(a + ib) by Smith's algorithm, into module scratch (no allocation in the O(N) loops). */
function inverseOf(a: number, b: number): void {
  if (Math.abs(a) >= Math.abs(b)) {
    const r = b / a;
    const den = a + b * r;
    inverseRe = 1 / den;
    inverseIm = -r / den;
  } else {
    const r = a / b;
    const den = a * r + b;
    inverseRe = r / den;
    inverseIm = -1 / den;
  }
}
