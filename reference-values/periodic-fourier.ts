/**
 * Discrete Fourier coefficients of a periodic sample, a_n = (1/M) Σ_j F_j e^{−2πinj/M},
 * n = 0 … M − 1 (n ≥ M/2 stands for n − M), for the trapezoid-rule Fourier analysis in
 * mesoscopic-variance.ts.
 *
 * Method: iterative radix-2 Cooley–Tukey FFT with bit-reversed input order, O(M log M); M must be a
 * power of two. Twiddle factors are computed directly as cos/sin of 2πk/M (no recurrence), so the
 * error is O(ε log M) relative to (Σ F_j²)^{1/2}/√M. J. W. Cooley and J. W. Tukey, 1965, "An
 * algorithm for the machine calculation of complex Fourier series", Math. Comp. 19, 297–301
 * (citation from memory); the iterative in-place form is common practice.
 */
export function periodicFourierCoefficients(values: Float64Array): ComplexSequence {
  return discreteFourierTransform({ re: values, im: new Float64Array(values.length) });
}

/** Complex numbers as two arrays of real and imaginary parts. */
export interface ComplexSequence {
  readonly re: Float64Array;
  readonly im: Float64Array;
}

/**
 * The sample F_j = Σ_n a_n e^{2πinj/M} from coefficients a_n (the inverse of
 * `periodicFourierCoefficients`): M·conj(DFT(conj a)), with the same FFT.
 */
export function periodicSynthesis(coefficients: ComplexSequence): ComplexSequence {
  const M = coefficients.re.length;
  const t = discreteFourierTransform({ re: coefficients.re, im: coefficients.im.map((v) => -v) });
  return { re: t.re.map((v) => v * M), im: t.im.map((v) => -v * M) };
}

/** a_n = (1/M) Σ_j F_j e^{−2πinj/M} for complex F (module note). */
function discreteFourierTransform(values: ComplexSequence): ComplexSequence {
  const M = values.re.length;
  if (M < 1 || (M & (M - 1)) !== 0 || values.im.length !== M) {
    throw new RangeError(`periodicFourierCoefficients: length must be a power of two, got ${M}`);
  }
  const re = new Float64Array(M);
  const im = new Float64Array(M);
  const bits = Math.round(Math.log2(M));
  for (let j = 0; j < M; j++) {
    let r = 0;
    for (let b = 0, x = j; b < bits; b++, x >>= 1) r = (r << 1) | (x & 1);
    re[r] = values.re[j];
    im[r] = values.im[j];
  }
  for (let half = 1; half < M; half *= 2) {
    const step = (Math.PI / half) * -1;
    for (let k = 0; k < half; k++) {
      const wr = Math.cos(step * k);
      const wi = Math.sin(step * k);
      for (let start = 0; start < M; start += 2 * half) {
        const p = start + k;
        const q = p + half;
        const tr = wr * re[q] - wi * im[q];
        const ti = wr * im[q] + wi * re[q];
        re[q] = re[p] - tr;
        im[q] = im[p] - ti;
        re[p] += tr;
        im[p] += ti;
      }
    }
  }
  for (let n = 0; n < M; n++) {
    re[n] /= M;
    im[n] /= M;
  }
  return { re, im };
}
