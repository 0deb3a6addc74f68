import { describe, expect, it } from 'vitest';
import { kolmogorovTail } from '../../../harness/estimators/kolmogorov-tail.js';
import { twoSampleKolmogorovSmirnov } from '../../../harness/estimators/two-sample-kolmogorov-smirnov.js';
import { randomStream } from '../../../harness/numeric/random-stream.js';

describe('kolmogorovTail', () => {
  // Q(λ) from scipy.special.kolmogorov (SciPy 1.17.1), an independent implementation, computed
  // once and written here; both branches of ours and the switch at 1.18 are covered.
  const table: Array<[number, number]> = [
    [0.3, 0.9999906941986655],
    [0.5, 0.9639452436648751],
    [1.0, 0.26999967167735456],
    [1.17, 0.12939004218561884],
    [1.18, 0.1234538094297657],
    [1.19, 0.11774229287977166],
    [1.36, 0.049485876755377876],
    [1.63, 0.009846364888486529],
    [2.0, 0.0006709252557796953],
    [3.0, 3.045995948942526e-8],
  ];
  for (const [lambda, q] of table) {
    it(`matches SciPy at λ = ${lambda} to 1e-12 relative`, () => {
      expect(Math.abs(kolmogorovTail(lambda) - q) / q).toBeLessThan(1e-12);
    });
  }

  it('is 1 at and below 0 and NaN for NaN', () => {
    expect(kolmogorovTail(0)).toBe(1);
    expect(kolmogorovTail(-1)).toBe(1);
    expect(kolmogorovTail(NaN)).toBeNaN();
  });
});

describe('twoSampleKolmogorovSmirnov', () => {
  it('finds the largest gap between the empirical distribution functions (SciPy ks_2samp agrees)', () => {
    // scipy.stats.ks_2samp([0.1, 0.4, 0.7, 0.9], [0.2, 0.3, 0.5, 0.6, 0.8, 1.0]).statistic = 0.25.
    expect(twoSampleKolmogorovSmirnov([0.1, 0.4, 0.7, 0.9], [0.2, 0.3, 0.5, 0.6, 0.8, 1.0]).distance).toBe(0.25);
  });

  it('steps past ties within and across samples before comparing', () => {
    // After 1: 1/4 − 0; after 2: 3/4 − 2/3; after 3: 1 − 2/3 = 1/3; scipy's ks_2samp gives 1/3 too.
    const ks = twoSampleKolmogorovSmirnov([1, 2, 2, 3], [2, 2, 4]);
    expect(ks.distance).toBeCloseTo(1 / 3, 15);
    expect(ks.effectiveSize).toBeCloseTo(12 / 7, 15);
  });

  it('gives distance 0 and p = 1 for identical samples, and does not reorder its inputs', () => {
    const x = [3, 1, 2];
    const ks = twoSampleKolmogorovSmirnov(x, [2, 3, 1]);
    expect(ks.distance).toBe(0);
    expect(ks.pValue).toBe(1);
    expect(x).toEqual([3, 1, 2]);
  });

  it('gives distance 1 for separated samples', () => {
    expect(twoSampleKolmogorovSmirnov([1, 2, 3], [4, 5]).distance).toBe(1);
  });

  it('rejects at about its nominal rate when both samples share one law, and nearly always under a shift', () => {
    // 2000 pairs of 60 normals each: the rejection rate at 5 % must lie inside the binomial band
    // 0.05 ± 4·√(0.05·0.95/2000) (about ±0.02); a shift of 0.8 standard deviations is found almost always.
    const trials = 2000;
    let nullRejections = 0;
    let shiftRejections = 0;
    for (let t = 0; t < trials; t++) {
      const s = randomStream(99, 'ks-calibration', t);
      const x = Array.from({ length: 60 }, () => s.nextNormal());
      const y = Array.from({ length: 60 }, () => s.nextNormal());
      if (twoSampleKolmogorovSmirnov(x, y).pValue <= 0.05) nullRejections++;
      if (twoSampleKolmogorovSmirnov(x, y.map((v) => v + 0.8)).pValue <= 0.05) shiftRejections++;
    }
    expect(Math.abs(nullRejections / trials - 0.05)).toBeLessThan(4 * Math.sqrt((0.05 * 0.95) / trials));
    expect(shiftRejections / trials).toBeGreaterThan(0.95);
  });

  it('returns NaN for a NaN among the values rather than a false pass', () => {
    expect(twoSampleKolmogorovSmirnov([1, NaN], [1, 2]).pValue).toBeNaN();
  });
});
