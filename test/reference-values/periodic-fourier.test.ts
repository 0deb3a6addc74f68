import { describe, expect, it } from 'vitest';
import { periodicFourierCoefficients, periodicSynthesis } from '../../reference-values/periodic-fourier.js';

/** The defining sum a_n = (1/M) Σ_j F_j e^{−2πinj/M}, O(M²). */
function naiveCoefficients(values: Float64Array): { re: Float64Array; im: Float64Array } {
  const M = values.length;
  const re = new Float64Array(M);
  const im = new Float64Array(M);
  for (let n = 0; n < M; n++) {
    for (let j = 0; j < M; j++) {
      const angle = (-2 * Math.PI * ((n * j) % M)) / M;
      re[n] += (values[j] * Math.cos(angle)) / M;
      im[n] += (values[j] * Math.sin(angle)) / M;
    }
  }
  return { re, im };
}

describe('periodicFourierCoefficients (radix-2 FFT; Cooley and Tukey 1965)', () => {
  it('agrees with the defining sum and inverts by periodicSynthesis, to a few ε·√M relative to the data', () => {
    // Error of the FFT O(ε log M)·‖F‖/√M, of the naive sum O(ε M)·max|F|/M per coefficient: 1e-13 is ample.
    let state = 987654321;
    const next = (): number => ((state = (state * 1103515245 + 12345) % 2 ** 31) / 2 ** 31) * 2 - 1;
    for (const M of [1, 2, 8, 64, 256]) {
      const values = Float64Array.from({ length: M }, next);
      const fast = periodicFourierCoefficients(values);
      const slow = naiveCoefficients(values);
      for (let n = 0; n < M; n++) {
        expect(Math.abs(fast.re[n] - slow.re[n]), `M = ${M}, n = ${n}`).toBeLessThan(1e-13);
        expect(Math.abs(fast.im[n] - slow.im[n]), `M = ${M}, n = ${n}`).toBeLessThan(1e-13);
      }
      const back = periodicSynthesis(fast);
      for (let j = 0; j < M; j++) {
        expect(Math.abs(back.re[j] - values[j])).toBeLessThan(1e-13);
        expect(Math.abs(back.im[j])).toBeLessThan(1e-13);
      }
    }
  });

  it('rejects lengths that are not powers of two', () => {
    expect(() => periodicFourierCoefficients(new Float64Array(12))).toThrow(RangeError);
    expect(() => periodicFourierCoefficients(new Float64Array(0))).toThrow(RangeError);
  });
});
