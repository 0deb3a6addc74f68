import { describe, expect, it } from 'vitest';
import { combineMean, estimateMean, observeMean, streamingMean, type StreamingMean } from '../../../harness/estimators/streaming-mean.js';
import { randomStream } from '../../../harness/numeric/random-stream.js';
import { expectCalibrated, foldInBlocks, stateBits, type StreamingDriver } from '../../support/streaming-estimator-checks.js';

/** X = 180 + 3 Z1 + i(40 + 0.5 Z1 + Z2), complex interleaved, one sample per stream index: a trace of order N·m. */
function column(replication: number, count: number): Float64Array {
  const out = new Float64Array(2 * count);
  for (let k = 0; k < count; k++) {
    const s = randomStream(51, `streaming-mean-${replication}`, k);
    const z1 = s.nextNormal();
    out[2 * k] = 180 + 3 * z1;
    out[2 * k + 1] = 40 + 0.5 * z1 + s.nextNormal();
  }
  return out;
}

/** The centring N∫fρ a reference would supply; E[X − c] = −0.2 + 0.1i. */
const CENTRING = { re: 180.2, im: 39.9 };
const EXACT = { re: -0.2, im: 0.1 };

function driverFor(x: Float64Array): StreamingDriver<StreamingMean> {
  return {
    empty: () => streamingMean(CENTRING),
    observe: (state, k) => observeMean(state, x[2 * k], x[2 * k + 1]),
    combine: combineMean,
  };
}

const K = 2000;
const x = column(0, K);
const onePass = estimateMean(foldInBlocks(driverFor(x), K, []));

describe('streaming mean', () => {
  it('reproduces the two-pass mean, standard errors and natural size of the column to 1e-12 relative', () => {
    // Two passes over the column (the mean of X − c, then the centred sums of squares): the
    // arithmetic the fluctuation suite used before it streamed its samples.
    let re = 0;
    let im = 0;
    for (let k = 0; k < K; k++) {
      re += x[2 * k] - CENTRING.re;
      im += x[2 * k + 1] - CENTRING.im;
    }
    re /= K;
    im /= K;
    let sr = 0;
    let si = 0;
    for (let k = 0; k < K; k++) {
      sr += (x[2 * k] - CENTRING.re - re) ** 2;
      si += (x[2 * k + 1] - CENTRING.im - im) ** 2;
    }
    const standardError = { re: Math.sqrt(sr / (K - 1) / K), im: Math.sqrt(si / (K - 1) / K) };
    const naturalSize = Math.sqrt((sr + si) / (K - 1));
    // The mean of X − c is O(SE): relative to the statistic's standard deviation.
    expect(Math.abs(onePass.estimate.re - re) / onePass.naturalSize).toBeLessThan(1e-12);
    expect(Math.abs(onePass.estimate.im - im) / onePass.naturalSize).toBeLessThan(1e-12);
    expect(Math.abs(onePass.standardError.re / standardError.re - 1)).toBeLessThan(1e-12);
    expect(Math.abs(onePass.standardError.im / standardError.im - 1)).toBeLessThan(1e-12);
    expect(Math.abs(onePass.naturalSize / naturalSize - 1)).toBeLessThan(1e-12);
    expect(onePass.count).toBe(K);
  });

  it('recovers E[X − c] = −0.2 + 0.1i within 4 standard errors', () => {
    expect(Math.abs(onePass.estimate.re - EXACT.re)).toBeLessThan(4 * onePass.standardError.re);
    expect(Math.abs(onePass.estimate.im - EXACT.im)).toBeLessThan(4 * onePass.standardError.im);
    // √(Var Re X + Var Im X) = √(9 + 0.25 + 1), within a few per cent at K = 2000.
    expect(Math.abs(onePass.naturalSize / Math.sqrt(10.25) - 1)).toBeLessThan(0.05);
  });

  it('gives the one-pass result to 1e-12 relative for any split into consecutive blocks, and the same bits for the same fold', () => {
    const driver = driverFor(x);
    for (const cuts of [[1000], [1, 2, 1999], [0, 0, 300, 2000], [500, 1000, 1500]]) {
      const state = foldInBlocks(driver, K, cuts);
      const split = estimateMean(state);
      // The means are O(SE): relative to the statistic's standard deviation.
      expect(Math.abs(split.estimate.re - onePass.estimate.re) / onePass.naturalSize).toBeLessThan(1e-12);
      expect(Math.abs(split.estimate.im - onePass.estimate.im) / onePass.naturalSize).toBeLessThan(1e-12);
      expect(Math.abs(split.standardError.re / onePass.standardError.re - 1)).toBeLessThan(1e-12);
      expect(Math.abs(split.naturalSize / onePass.naturalSize - 1)).toBeLessThan(1e-12);
      expect(stateBits(foldInBlocks(driver, K, cuts))).toEqual(stateBits(state));
    }
  });

  it('has calibrated standard errors: z-scores over 200 replications of K = 300 have spread ≈ 1', () => {
    const zRe: number[] = [];
    const zIm: number[] = [];
    for (let r = 1; r <= 200; r++) {
      const m = estimateMean(foldInBlocks(driverFor(column(r, 300)), 300, [100]));
      zRe.push((m.estimate.re - EXACT.re) / m.standardError.re);
      zIm.push((m.estimate.im - EXACT.im) / m.standardError.im);
    }
    expectCalibrated(zRe);
    expectCalibrated(zIm);
  });

  it('refuses to merge states with different centrings and to estimate from fewer than two samples', () => {
    expect(() => combineMean(streamingMean({ re: 0, im: 0 }), streamingMean({ re: 0, im: 1 }))).toThrow(RangeError);
    const one = streamingMean(CENTRING);
    observeMean(one, 1, 2);
    expect(() => estimateMean(one)).toThrow(RangeError);
  });
});
