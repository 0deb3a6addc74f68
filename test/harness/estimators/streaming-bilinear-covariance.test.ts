import { describe, expect, it } from 'vitest';
import { bilinearCovariance, summedBilinearCovariance } from '../../../harness/estimators/bilinear-covariance.js';
import {
  combineCovariance,
  covarianceNaturalScale,
  estimateCovariance,
  observeCovariance,
  streamingCovariance,
  type StreamingCovariance,
} from '../../../harness/estimators/streaming-bilinear-covariance.js';
import { randomStream } from '../../../harness/numeric/random-stream.js';
import { meanSquare } from '../../../properties/fluctuations/fluctuation-evidence.js';
import { expectCalibrated, foldInBlocks, stateBits, type StreamingDriver } from '../../support/streaming-estimator-checks.js';

/**
 * One sample of two pairs, laid out (x0, y0, x1, y1) complex interleaved, with means of a few
 * hundred (like N·m traces) and O(1) fluctuations. With Z1 … Z4, W1, W2 independent N(0, 1):
 *   X0 = 200 + Z1 + i(−50 + Z2), Y0 = 150 + 0.6 Z1 + 0.8 Z3 + i(0.5 Z1 + 0.3 Z2 + Z4),
 *   X1 = 120 + W1 + iW2,         Y1 = −80 + 0.5 W1 − 0.4 i W2.
 * Bilinear Cov(X, Y) = Cov(Re, Re) − Cov(Im, Im) + i(Cov(Re X, Im Y) + Cov(Im X, Re Y)):
 * Cov(X0, Y0) = 0.6 − 0.3 + 0.5i, Cov(X1, Y1) = 0.5 + 0.4, so the sum is 1.2 + 0.5i.
 */
function sampleOfPairs(replication: number, k: number): Float64Array {
  const s = randomStream(21, `streaming-covariance-${replication}`, k);
  const [z1, z2, z3, z4, w1, w2] = Array.from({ length: 6 }, () => s.nextNormal());
  return Float64Array.of(
    200 + z1, -50 + z2, 150 + 0.6 * z1 + 0.8 * z3, 0.5 * z1 + 0.3 * z2 + z4,
    120 + w1, w2, -80 + 0.5 * w1, -0.4 * w2,
  );
}
const EXACT = { re: 1.2, im: 0.5 };

/** The samples of one replication, and the driver that streams them with the first sample as the pilot shift. */
function replication(r: number, count: number) {
  const samples = Array.from({ length: count }, (_, k) => sampleOfPairs(r, k));
  const driver: StreamingDriver<StreamingCovariance> = {
    empty: () => streamingCovariance(2, samples[0]),
    observe: (state, k) => observeCovariance(state, samples[k]),
    combine: combineCovariance,
  };
  // Column c (x0, y0, x1, y1) complex interleaved, for the column-based estimators.
  const column = (c: number) => {
    const out = new Float64Array(2 * count);
    samples.forEach((v, k) => out.set(v.subarray(2 * c, 2 * c + 2), 2 * k));
    return out;
  };
  return { samples, driver, columns: [0, 1, 2, 3].map(column) };
}

const K = 2000;
const run = replication(0, K);
const onePass = estimateCovariance(foldInBlocks(run.driver, K, []));

describe('streaming bilinear covariance', () => {
  it('equals summedBilinearCovariance to 1e-10 relative on means ≈ 200, with its standard error times K/(K − 1)', () => {
    const [x0, y0, x1, y1] = run.columns;
    const columnBased = summedBilinearCovariance([[x0, y0], [x1, y1]]);
    const natural = Math.sqrt(meanSquare(x0) * meanSquare(y0)) + Math.sqrt(meanSquare(x1) * meanSquare(y1));
    expect(Math.abs(onePass.estimate.re - columnBased.estimate.re) / natural).toBeLessThan(1e-10);
    expect(Math.abs(onePass.estimate.im - columnBased.estimate.im) / natural).toBeLessThan(1e-10);
    // Both are the sample spread of the summed centred products (an algebraic identity here, not
    // only to first order); the streamed one carries the estimate's factor K/(K − 1).
    const factor = K / (K - 1);
    expect(Math.abs(onePass.standardError.re / (factor * columnBased.standardError.re) - 1)).toBeLessThan(1e-9);
    expect(Math.abs(onePass.standardError.im / (factor * columnBased.standardError.im) - 1)).toBeLessThan(1e-9);
    expect(onePass.count).toBe(K);
    expect(Math.abs(covarianceNaturalScale(foldInBlocks(run.driver, K, [])) / natural - 1)).toBeLessThan(1e-12);
  });

  it('of one pair equals bilinearCovariance', () => {
    const [x0, y0] = run.columns;
    const state = streamingCovariance(1, run.samples[0].subarray(0, 4));
    run.samples.forEach((v) => observeCovariance(state, v.subarray(0, 4)));
    const single = estimateCovariance(state);
    const columnBased = bilinearCovariance(x0, y0);
    expect(Math.abs(single.estimate.re - columnBased.estimate.re)).toBeLessThan(1e-12);
    expect(Math.abs(single.estimate.im - columnBased.estimate.im)).toBeLessThan(1e-12);
  });

  it('recovers the known covariance 1.2 + 0.5i within 4 standard errors', () => {
    expect(Math.abs(onePass.estimate.re - EXACT.re)).toBeLessThan(4 * onePass.standardError.re);
    expect(Math.abs(onePass.estimate.im - EXACT.im)).toBeLessThan(4 * onePass.standardError.im);
  });

  it('gives the one-pass result to 1e-12 relative for any split into consecutive blocks, and the same bits for the same fold', () => {
    for (const cuts of [[1000], [1, 2, 1999], [0, 500, 500, 1700, 2000], [250, 500, 750, 1000, 1250, 1500, 1750]]) {
      const state = foldInBlocks(run.driver, K, cuts);
      const split = estimateCovariance(state);
      expect(Math.abs(split.estimate.re / onePass.estimate.re - 1)).toBeLessThan(1e-12);
      expect(Math.abs(split.estimate.im / onePass.estimate.im - 1)).toBeLessThan(1e-12);
      expect(Math.abs(split.standardError.re / onePass.standardError.re - 1)).toBeLessThan(1e-12);
      expect(Math.abs(split.standardError.im / onePass.standardError.im - 1)).toBeLessThan(1e-12);
      expect(stateBits(foldInBlocks(run.driver, K, cuts))).toEqual(stateBits(state));
    }
    // Blocks sent through a structured clone (to a worker and back) fold to the same bits.
    const cloned: StreamingDriver<StreamingCovariance> = { ...run.driver, combine: (l, r) => combineCovariance(structuredClone(l), structuredClone(r)) };
    expect(stateBits(foldInBlocks(cloned, K, [700, 1400]))).toEqual(stateBits(foldInBlocks(run.driver, K, [700, 1400])));
  });

  it('has calibrated standard errors: z-scores over 200 replications of K = 400 have spread ≈ 1', () => {
    const zRe: number[] = [];
    const zIm: number[] = [];
    for (let r = 1; r <= 200; r++) {
      const { driver } = replication(r, 400);
      const c = estimateCovariance(foldInBlocks(driver, 400, [137]));
      zRe.push((c.estimate.re - EXACT.re) / c.standardError.re);
      zIm.push((c.estimate.im - EXACT.im) / c.standardError.im);
    }
    expectCalibrated(zRe);
    expectCalibrated(zIm);
  });

  it('refuses to merge states with different shifts, and input of the wrong length', () => {
    const a = streamingCovariance(1, new Float64Array(4));
    const b = streamingCovariance(1, Float64Array.of(0, 0, 0, 1));
    expect(() => combineCovariance(a, b)).toThrow(RangeError);
    expect(() => observeCovariance(a, new Float64Array(8))).toThrow(RangeError);
    expect(() => streamingCovariance(2, new Float64Array(4))).toThrow(RangeError);
    expect(() => estimateCovariance(a)).toThrow(RangeError);
  });
});
