import { describe, expect, it } from 'vitest';
import { lagOneAutocorrelation } from '../../../harness/estimators/lag-one-autocorrelation.js';
import {
  combineAutocorrelation,
  estimateAutocorrelation,
  observeAutocorrelation,
  streamingAutocorrelation,
  type StreamingAutocorrelation,
} from '../../../harness/estimators/streaming-autocorrelation.js';
import { randomStream } from '../../../harness/numeric/random-stream.js';
import { expectCalibrated, foldInBlocks, stateBits, type StreamingDriver } from '../../support/streaming-estimator-checks.js';

/** x_t = 200 + y_t with y_t = φ y_{t−1} + √(1 − φ²) Z_t (stationary AR(1) of unit variance; φ = 0 is white noise). */
function series(phi: number, replication: number, count: number): Float64Array {
  const s = randomStream(41, `streaming-autocorrelation-${phi}-${replication}`, 0);
  const out = new Float64Array(count);
  let y = s.nextNormal();
  for (let t = 0; t < count; t++) {
    if (t > 0) y = phi * y + Math.sqrt(1 - phi * phi) * s.nextNormal();
    out[t] = 200 + y;
  }
  return out;
}

function driverFor(x: Float64Array, shift = x[0]): StreamingDriver<StreamingAutocorrelation> {
  return {
    empty: () => streamingAutocorrelation(shift),
    observe: (state, t) => observeAutocorrelation(state, x[t]),
    combine: combineAutocorrelation,
  };
}

const K = 2000;

describe('streaming lag-1 autocorrelation', () => {
  it('equals lagOneAutocorrelation to 1e-10 relative on series with mean ≈ 200', () => {
    for (const phi of [0, 0.5, -0.3]) {
      const x = series(phi, 0, K);
      const streamed = estimateAutocorrelation(foldInBlocks(driverFor(x), K, []));
      const columnBased = lagOneAutocorrelation(x);
      expect(Math.abs(streamed.estimate / columnBased.estimate - 1)).toBeLessThan(1e-10);
      expect(streamed.expectedUnderIndependence).toBe(columnBased.expectedUnderIndependence);
      expect(streamed.standardError).toBe(columnBased.standardError);
      expect(streamed.count).toBe(K);
      // A rough shift (five standard deviations off) costs digits of a white-noise r1 ≈ 1/√K, but
      // not against the band: within 1e-10 of 1/√K.
      const rough = estimateAutocorrelation(foldInBlocks(driverFor(x, 195), K, []));
      expect(Math.abs(rough.estimate - columnBased.estimate) / columnBased.standardError).toBeLessThan(1e-10);
    }
  });

  it('gives the one-pass result to 1e-12 relative for any split into consecutive blocks, and the same bits for the same fold', () => {
    const x = series(0.5, 1, K);
    const driver = driverFor(x);
    const onePass = estimateAutocorrelation(foldInBlocks(driver, K, []));
    for (const cuts of [[1000], [1, 2, 1999], [0, 0, 5, 6, 7, 2000], [100, 200, 300, 1500, 1999]]) {
      const state = foldInBlocks(driver, K, cuts);
      expect(Math.abs(estimateAutocorrelation(state).estimate / onePass.estimate - 1)).toBeLessThan(1e-12);
      expect(stateBits(foldInBlocks(driver, K, cuts))).toEqual(stateBits(state));
    }
  });

  it('needs blocks in series order: the straddling product belongs to the left block followed by the right', () => {
    // x = 1, 2, 3 | 10, 20, 30 about shift 0: in order the lagged sum is 2 + 6 + 30 + 200 + 600; the
    // other order straddles 30 · 1 instead of 3 · 10.
    const x = Float64Array.of(1, 2, 3, 10, 20, 30);
    const driver = driverFor(x, 0);
    const left = foldInBlocks(driver, 3, []);
    const right = driver.empty();
    for (let t = 3; t < 6; t++) driver.observe(right, t);
    expect(combineAutocorrelation(left, right).laggedSum).toBe(838);
    expect(combineAutocorrelation(right, left).laggedSum).toBe(2 + 6 + 200 + 600 + 30);
    expect(estimateAutocorrelation(combineAutocorrelation(left, right)).estimate).toBeCloseTo(lagOneAutocorrelation(x).estimate, 14);
  });

  it('recovers φ = 0.5 of an AR(1) series within 4 standard errors (Bartlett: Var r1 ≈ (1 − φ²)/K)', () => {
    // Bartlett's formula for an AR(1) series gives Var r1 ≈ (1 − φ²)/K (M. S. Bartlett, 1946,
    // J. Roy. Statist. Soc. Suppl. 8(1), 27–41; G. E. P. Box, G. M. Jenkins and G. C. Reinsel, Time
    // Series Analysis, section from memory).
    const x = series(0.5, 2, 20000);
    const r = estimateAutocorrelation(foldInBlocks(driverFor(x), 20000, [5000, 12000]));
    expect(Math.abs(r.estimate - 0.5)).toBeLessThan(4 * Math.sqrt(0.75 / 20000));
  });

  it('has the white-noise band: z = (r1 + 1/K)/SE over 200 independent series of K = 500 have spread ≈ 1', () => {
    const z: number[] = [];
    for (let r = 0; r < 200; r++) {
      const x = series(0, 10 + r, 500);
      const e = estimateAutocorrelation(foldInBlocks(driverFor(x), 500, [250]));
      z.push((e.estimate - e.expectedUnderIndependence) / e.standardError);
    }
    expectCalibrated(z);
  });

  it('refuses to merge states with different shifts and to estimate from fewer than three values', () => {
    expect(() => combineAutocorrelation(streamingAutocorrelation(0), streamingAutocorrelation(1))).toThrow(RangeError);
    const two = streamingAutocorrelation(0);
    observeAutocorrelation(two, 1);
    observeAutocorrelation(two, 2);
    expect(() => estimateAutocorrelation(two)).toThrow(RangeError);
  });
});
