import { describe, expect, it } from 'vitest';
import { meanStandardError, summariseMoments, varianceStandardError } from '../../../harness/estimators/moment-summary.js';
import { randomStream } from '../../../harness/numeric/random-stream.js';

describe('summariseMoments', () => {
  it('gives the exact moments of a small sample', () => {
    // 1, 2, 3, 4: mean 5/2, centred ±1/2, ±3/2; s² = 5/3; m₄ = (2·(1/16) + 2·(81/16))/4 = 41/16.
    const m = summariseMoments([1, 2, 3, 4]);
    expect(m.mean).toBe(2.5);
    expect(m.variance).toBeCloseTo(5 / 3, 15);
    expect(m.fourthCentralMoment).toBeCloseTo(41 / 16, 15);
    expect(meanStandardError(m)).toBeCloseTo(Math.sqrt(5 / 12), 15);
  });

  it('keeps its accuracy far from zero (two passes)', () => {
    const m = summariseMoments([1e9 + 1, 1e9 + 2, 1e9 + 3, 1e9 + 4]);
    expect(m.variance).toBeCloseTo(5 / 3, 6);
    expect(m.fourthCentralMoment).toBeCloseTo(41 / 16, 6);
  });

  it('refuses fewer than two observations', () => {
    expect(() => summariseMoments([1])).toThrow(RangeError);
  });

  it('has a variance standard error that matches the spread of s² over repeated samples', () => {
    // Exponential observations (μ₄ = 9σ⁴, far from normal): 400 samples of 200, the spread of s²
    // against the mean of the estimated √((m₄ − s⁴)/n); they agree within 10 % (the spread's own
    // relative error with 400 repetitions is about 1/√800 ≈ 3.5 %, plus O(1/n) terms).
    const estimates: number[] = [];
    const errors: number[] = [];
    for (let r = 0; r < 400; r++) {
      const s = randomStream(5, 'exponential', r);
      const m = summariseMoments(Array.from({ length: 200 }, () => -Math.log(s.nextUniform())));
      estimates.push(m.variance);
      errors.push(varianceStandardError(m));
    }
    const spread = summariseMoments(estimates);
    const meanError = errors.reduce((a, b) => a + b, 0) / errors.length;
    // Var(s²) = (μ₄ − σ⁴)/n = 8/200 for the unit exponential: the true spread is √0.04 = 0.2.
    expect(Math.abs(Math.sqrt(spread.variance) - 0.2) / 0.2).toBeLessThan(0.1);
    expect(Math.abs(meanError - 0.2) / 0.2).toBeLessThan(0.1);
  });
});
