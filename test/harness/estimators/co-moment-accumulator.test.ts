import { describe, expect, it } from 'vitest';
import {
  addObservation,
  coMomentEntry,
  combineCoMoments,
  complexVariance,
  covarianceMatrixEntry,
  emptyCoMoments,
  packedIndex,
  combineShiftedCoMoments,
  type CoMoments,
} from '../../../harness/estimators/co-moment-accumulator.js';
import { randomStream } from '../../../harness/numeric/random-stream.js';
import { foldInBlocks, stateBits, type StreamingDriver } from '../../support/streaming-estimator-checks.js';

const WIDTH = 3;
const COUNT = 2000;

/** Rows of width 3 with means ≈ 200, −50, 0.3 and O(1) correlated fluctuations (N·m traces are like this). */
function largeMeanRows(): Float64Array[] {
  const s = randomStream(11, 'co-moment-rows', 0);
  return Array.from({ length: COUNT }, () => {
    const a = s.nextNormal();
    const b = s.nextNormal();
    return Float64Array.of(200 + a, -50 + 0.5 * a + b, 0.3 + 0.01 * b);
  });
}

/** The two-pass covariance C_ij/(n − 1), centring by the exact sample means first. */
function twoPassCovariance(rows: readonly Float64Array[], i: number, j: number): number {
  const n = rows.length;
  const mi = rows.reduce((a, r) => a + r[i], 0) / n;
  const mj = rows.reduce((a, r) => a + r[j], 0) / n;
  return rows.reduce((a, r) => a + (r[i] - mi) * (r[j] - mj), 0) / (n - 1);
}

const rows = largeMeanRows();
const driver: StreamingDriver<CoMoments> = {
  empty: () => emptyCoMoments(WIDTH),
  observe: (state, k) => addObservation(state, rows[k]),
  combine: combineCoMoments,
};

describe('co-moment accumulator', () => {
  it('gives the worked example exactly: means and Σ(x − x̄)(y − ȳ) by hand', () => {
    // x = 1, 2, 3, 6 (mean 3), y = 2, 4, 7, 3 (mean 4): Σ(x − x̄)² = 4 + 1 + 0 + 9 = 14,
    // Σ(y − ȳ)² = 4 + 0 + 9 + 1 = 14, Σ(x − x̄)(y − ȳ) = 4 + 0 + 0 − 3 = 1.
    const state = emptyCoMoments(2);
    for (const row of [[1, 2], [2, 4], [3, 7], [6, 3]]) addObservation(state, row);
    expect(state.count).toBe(4);
    expect(Array.from(state.mean)).toEqual([3, 4]);
    expect(coMomentEntry(state, 0, 0)).toBeCloseTo(14, 13);
    expect(coMomentEntry(state, 1, 1)).toBeCloseTo(14, 13);
    expect(coMomentEntry(state, 0, 1)).toBeCloseTo(1, 13);
    expect(coMomentEntry(state, 1, 0)).toBe(coMomentEntry(state, 0, 1));
    expect(covarianceMatrixEntry(state, 0, 1)).toBeCloseTo(1 / 3, 14);
  });

  it('packs the upper triangle column by column, every entry once', () => {
    const seen = new Set<number>();
    for (let j = 0; j < 6; j++) for (let i = 0; i <= j; i++) seen.add(packedIndex(i, j));
    expect([...seen].sort((a, b) => a - b)).toEqual(Array.from({ length: 21 }, (_, k) => k));
    expect(packedIndex(4, 2)).toBe(packedIndex(2, 4));
  });

  it('matches the two-pass covariance on data with means ≈ 200 to 1e-12 relative', () => {
    const state = foldInBlocks(driver, COUNT, []);
    for (let i = 0; i < WIDTH; i++) {
      for (let j = i; j < WIDTH; j++) {
        const exact = twoPassCovariance(rows, i, j);
        // Relative to √(Var_i Var_j), since a covariance may be near 0.
        const scale = Math.sqrt(twoPassCovariance(rows, i, i) * twoPassCovariance(rows, j, j));
        expect(Math.abs(covarianceMatrixEntry(state, i, j) - exact) / scale).toBeLessThan(1e-12);
      }
    }
    expect(complexVariance(state, 0)).toBeCloseTo(twoPassCovariance(rows, 0, 0) + twoPassCovariance(rows, 1, 1), 10);
  });

  it('gives the one-pass result to 1e-12 relative for any split into consecutive blocks, and the same bits for the same split', () => {
    const onePass = foldInBlocks(driver, COUNT, []);
    for (const cuts of [[1000], [1, 2, 1999], [0, 0, 700, 700, 1300, 2000], [333, 666, 999, 1332, 1665]]) {
      const blocks = foldInBlocks(driver, COUNT, cuts);
      expect(blocks.count).toBe(COUNT);
      onePass.mean.forEach((m, i) => expect(Math.abs(blocks.mean[i] - m) / Math.abs(m)).toBeLessThan(1e-12));
      for (let j = 0; j < WIDTH; j++) {
        for (let i = 0; i <= j; i++) {
          const scale = Math.sqrt(coMomentEntry(onePass, i, i) * coMomentEntry(onePass, j, j));
          expect(Math.abs(coMomentEntry(blocks, i, j) - coMomentEntry(onePass, i, j)) / scale).toBeLessThan(1e-12);
        }
      }
      expect(stateBits(foldInBlocks(driver, COUNT, cuts))).toEqual(stateBits(blocks));
    }
  });

  it('is a pure combine: inputs unchanged, an empty side returns the other bit for bit', () => {
    const left = foldInBlocks(driver, 800, []);
    const right = emptyCoMoments(WIDTH);
    for (let k = 800; k < COUNT; k++) addObservation(right, rows[k]);
    const before = [stateBits(left), stateBits(right)];
    const first = combineCoMoments(left, right);
    expect([stateBits(left), stateBits(right)]).toEqual(before);
    expect(stateBits(combineCoMoments(left, right))).toEqual(stateBits(first));
    expect(stateBits(combineCoMoments(left, emptyCoMoments(WIDTH)))).toEqual(stateBits(left));
    expect(stateBits(combineCoMoments(emptyCoMoments(WIDTH), right))).toEqual(stateBits(right));
    expect(combineCoMoments(emptyCoMoments(WIDTH), emptyCoMoments(WIDTH)).count).toBe(0);
  });

  it('survives a structured clone and a JSON codec of its arrays bit for bit (the state is plain data)', () => {
    const left = foldInBlocks(driver, 1200, []);
    const right = emptyCoMoments(WIDTH);
    for (let k = 1200; k < COUNT; k++) addObservation(right, rows[k]);
    const expected = stateBits(combineCoMoments(left, right));
    expect(stateBits(combineCoMoments(structuredClone(left), structuredClone(right)))).toEqual(expected);
    // JSON writes each double in the shortest form that reads back to it (ECMAScript Number::toString).
    const json = (s: CoMoments) => JSON.stringify({ count: s.count, mean: Array.from(s.mean), comoment: Array.from(s.comoment) });
    const parse = (text: string): CoMoments => {
      const o = JSON.parse(text) as { count: number; mean: number[]; comoment: number[] };
      return { count: o.count, mean: Float64Array.from(o.mean), comoment: Float64Array.from(o.comoment) };
    };
    expect(stateBits(combineCoMoments(parse(json(left)), parse(json(right))))).toEqual(expected);
  });

  it('rejects mismatched widths, too few samples and different shifts', () => {
    expect(() => addObservation(emptyCoMoments(2), [1, 2, 3])).toThrow(RangeError);
    expect(() => combineCoMoments(emptyCoMoments(2), emptyCoMoments(3))).toThrow(RangeError);
    const one = emptyCoMoments(1);
    addObservation(one, [5]);
    expect(() => covarianceMatrixEntry(one, 0, 0)).toThrow(RangeError);
    expect(() => emptyCoMoments(0)).toThrow(RangeError);
    const shifted = (shifts: Float64Array) => ({ shifts, moments: emptyCoMoments(2) });
    expect(combineShiftedCoMoments(shifted(Float64Array.of(1, 2)), shifted(Float64Array.of(1, 2))).shifts).toEqual(Float64Array.of(1, 2));
    expect(() => combineShiftedCoMoments(shifted(Float64Array.of(1, 2)), shifted(Float64Array.of(1, 2 + 2 ** -51)))).toThrow(RangeError);
  });
});
