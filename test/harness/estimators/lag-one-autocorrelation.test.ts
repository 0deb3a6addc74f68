import { describe, expect, it } from 'vitest';
import { lagOneAutocorrelation } from '../../../harness/estimators/lag-one-autocorrelation.js';
import { randomStream } from '../../../harness/numeric/random-stream.js';

describe('lagOneAutocorrelation', () => {
  it('matches the definition on a worked example', () => {
    // x = 1, 2, 3, 4 (mean 2.5): deviations −1.5, −0.5, 0.5, 1.5; Σ d_t d_{t+1} = 0.75 − 0.25 + 0.75 = 1.25,
    // Σ d² = 5, so r1 = 0.25.
    const r = lagOneAutocorrelation([1, 2, 3, 4]);
    expect(r.estimate).toBeCloseTo(0.25, 15);
    expect(r.expectedUnderIndependence).toBe(-0.25);
    expect(r.standardError).toBe(0.5);
  });

  it('is near −1/K with spread 1/√K for independent samples (Bartlett 1946)', () => {
    const z: number[] = [];
    for (let rep = 0; rep < 400; rep++) {
      const s = randomStream(3, 'autocorrelation-test', rep);
      const x = Array.from({ length: 500 }, () => s.nextNormal());
      const r = lagOneAutocorrelation(x);
      z.push((r.estimate - r.expectedUnderIndependence) / r.standardError);
    }
    const mean = z.reduce((a, b) => a + b, 0) / z.length;
    const sd = Math.sqrt(z.reduce((a, b) => a + (b - mean) ** 2, 0) / (z.length - 1));
    expect(Math.abs(mean)).toBeLessThan(0.2); // 4 standard errors of a mean of 400 unit normals
    expect(sd).toBeGreaterThan(0.88);
    expect(sd).toBeLessThan(1.12);
  });

  it('finds the coefficient of an AR(1) series, and 1/2 for pairs of repeated samples', () => {
    const s = randomStream(5, 'autocorrelation-ar1', 0);
    const phi = 0.6;
    const x = [s.nextNormal()];
    for (let t = 1; t < 20000; t++) x.push(phi * x[t - 1] + Math.sqrt(1 - phi * phi) * s.nextNormal());
    expect(lagOneAutocorrelation(x).estimate).toBeCloseTo(phi, 1);
    // Each value twice in a row (a random stream reused for consecutive samples): the lag-1 pairs
    // are alternately identical and independent, so r1 → 1/2.
    const white = Array.from({ length: 10000 }, () => s.nextNormal());
    const repeated = Array.from({ length: 20000 }, (_, t) => white[Math.floor(t / 2)]);
    expect(Math.abs(lagOneAutocorrelation(repeated).estimate - 0.5)).toBeLessThan(0.03);
  });
});
