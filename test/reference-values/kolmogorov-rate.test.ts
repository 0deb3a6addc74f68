import { describe, expect, it } from 'vitest';
import {
  KOLMOGOROV_FIT_SIZES,
  KOLMOGOROV_RATE_EXPONENT,
  KOLMOGOROV_RATE_SOURCES,
  kolmogorovSlopeRange,
  leastSquaresSlope,
  semicircleQuantile,
} from '../../reference-values/kolmogorov-rate.js';
import { semicircleCdf, semicircleDensity } from '../../reference-values/semicircle-law.js';
import { formatCitation } from '../../reference-values/citation.js';

const EPS = Number.EPSILON;

/**
 * Kolmogorov distance between the exact expected spectral distribution of an N×N GUE matrix
 * (normalised, entries of variance 1/N) and the semicircle. The eigenvalue density of X with
 * weight e^{−Tr X²/2} is (1/√2) Σ_{j<N} φ_j(y/√2)², φ_j the Hermite functions (Mehta 2004, Random
 * Matrices, 3rd ed., ch. 6; chapter from memory), so ρ_N(x) = (1/√(2N)) Σ_{j<N} φ_j(x√(N/2))².
 * φ_j = π^{−1/4} e^{−u²/2} h_j(u), h_0 = 1, h_1 = √2 u, h_{j+1} = √(2/(j+1)) u h_j − √(j/(j+1)) h_{j−1}
 * (Abramowitz and Stegun 1964, 22.7.13, normalised); the sum of h_j² is carried with a separate
 * logarithmic scale to avoid overflow. E F_N by Simpson's rule on a grid fine against the 1/N
 * oscillations.
 */
function gueExpectedKolmogorovDistance(N: number): number {
  const density = (x: number): number => {
    const u = x * Math.sqrt(N / 2);
    let previous = 0;
    let current = 1;
    let sum = 1;
    let logScale = 0;
    for (let j = 0; j + 1 < N; j++) {
      const next = Math.sqrt(2 / (j + 1)) * u * current - Math.sqrt(j / (j + 1)) * previous;
      previous = current;
      current = next;
      sum += current * current;
      if (Math.abs(current) > 1e150) {
        previous *= 1e-150;
        current *= 1e-150;
        sum *= 1e-300;
        logScale += 300 * Math.LN10;
      }
    }
    return (sum * Math.exp(logScale - u * u)) / Math.sqrt(Math.PI) / Math.sqrt(2 * N);
  };
  const a = -3;
  const steps = 24 * N; // 1/(4N) per step against oscillations of wavelength ~ 1/N
  const h = 6 / steps;
  let cdf = 0;
  let distance = 0;
  let left = density(a);
  for (let i = 0; i < steps; i += 2) {
    const mid = density(a + (i + 1) * h);
    const right = density(a + (i + 2) * h);
    // Simpson on [x_i, x_{i+2}]; check the distance at the panel ends and, by Simpson's half-panel
    // rule, at the midpoint as well
    const midCdf = cdf + (h / 12) * (5 * left + 8 * mid - right);
    cdf += (h / 3) * (left + 4 * mid + right);
    distance = Math.max(distance, Math.abs(midCdf - semicircleCdf(a + (i + 1) * h)), Math.abs(cdf - semicircleCdf(a + (i + 2) * h)));
    left = right;
  }
  expect(Math.abs(cdf - 1)).toBeLessThan(1e-9); // total mass: the quadrature resolved ρ_N
  return distance;
}

describe('kolmogorovSlopeRange', () => {
  it('states the exponent −1 and its sources', () => {
    expect(KOLMOGOROV_RATE_EXPONENT).toBe(-1);
    expect(formatCitation(KOLMOGOROV_RATE_SOURCES.expected[0])).toContain('Götze');
    expect(KOLMOGOROV_RATE_SOURCES.empirical.length).toBeGreaterThan(0);
  });

  it('bends the slope by c·S_1 per log power, S_1 between 1/ln 800 and 1/ln 100 (mean-value theorem)', () => {
    const range = kolmogorovSlopeRange('empirical');
    expect(range.slopePerLogPower).toBeGreaterThan(1 / Math.log(800));
    expect(range.slopePerLogPower).toBeLessThan(1 / Math.log(100));
    expect(range.lower).toBeLessThan(-1);
    expect(range.upper).toBeGreaterThan(-1 + range.slopePerLogPower);
    expect(range.upper).toBeLessThan(-0.5); // still separates the N^{-1} rate from N^{-1/2}
    const expected = kolmogorovSlopeRange('expected');
    expect(expected.lower).toBe(range.lower);
    expect(expected.upper).toBeLessThan(range.upper);
  });

  it('contains the slope of every model D_N = (a + b ln N)(1 + r N^{-1/3})/N with a, b ≥ 0, |r| ≤ 1', () => {
    const range = kolmogorovSlopeRange('empirical');
    const logN = KOLMOGOROV_FIT_SIZES.map(Math.log);
    for (const a of [0, 0.1, 0.5, 2]) {
      for (const b of [0, 0.05, 0.3, 1]) {
        if (a === 0 && b === 0) continue;
        for (const r of [-1, -0.3, 0, 0.5, 1]) {
          const d = KOLMOGOROV_FIT_SIZES.map((n) => ((a + b * Math.log(n)) * (1 + r * n ** (-1 / 3))) / n);
          const slope = leastSquaresSlope(logN, d.map(Math.log));
          expect(slope).toBeGreaterThanOrEqual(range.lower - 1e-12);
          expect(slope).toBeLessThanOrEqual(range.upper + 1e-12);
        }
      }
    }
  });

  it('contains the fitted slope of the exact GUE expected distance over N = 100…800 (Hermite kernel)', () => {
    const distances = KOLMOGOROV_FIT_SIZES.map(gueExpectedKolmogorovDistance);
    // O(1/N) (Götze and Tikhomirov 2016): N·D_N stays of order one (it was 0.0313 to 0.0317 when
    // this test was written; the bounds below are deliberately loose)
    for (const [i, n] of KOLMOGOROV_FIT_SIZES.entries()) {
      expect(n * distances[i]).toBeGreaterThan(0.01);
      expect(n * distances[i]).toBeLessThan(1);
    }
    const slope = leastSquaresSlope(KOLMOGOROV_FIT_SIZES.map(Math.log), distances.map(Math.log));
    const range = kolmogorovSlopeRange('expected');
    expect(slope, `fitted slope ${slope}, distances ${distances.join(', ')}`).toBeGreaterThanOrEqual(range.lower);
    expect(slope, `fitted slope ${slope}, distances ${distances.join(', ')}`).toBeLessThanOrEqual(range.upper);
  });
});

describe('semicircleQuantile', () => {
  it('inverts the CDF to a few ulps, including deep in the tails', () => {
    for (let p = 0.001; p < 1; p += 0.0127) {
      const x = semicircleQuantile(p);
      // |F(Q(p)) − p| ≤ ρ(x)·(a few ulps of x) + F's own error (≤ 4ε)
      expect(Math.abs(semicircleCdf(x) - p)).toBeLessThanOrEqual(semicircleDensity(x) * 8 * EPS * Math.max(1, Math.abs(x)) + 8 * EPS);
    }
    for (const p of [1e-15, 1e-9, 1e-5]) {
      const x = semicircleQuantile(p);
      expect(Math.abs(semicircleCdf(x) / p - 1)).toBeLessThan(1e-4); // x carries ~ulp(2)/t relative error in t = x + 2
    }
  });

  it('is the inverse of F on a grid of x, symmetric, with the right end values', () => {
    for (let x = -1.95; x < 2; x += 0.05) expect(Math.abs(semicircleQuantile(semicircleCdf(x)) - x)).toBeLessThanOrEqual(16 * EPS);
    expect(semicircleQuantile(0)).toBe(-2);
    expect(semicircleQuantile(1)).toBe(2);
    expect(semicircleQuantile(0.5)).toBe(0);
    for (const p of [1 / 64, 0.25, 0.375]) expect(semicircleQuantile(1 - p)).toBe(-semicircleQuantile(p)); // 1 − p exact
    let previous = -Infinity;
    for (let p = 0; p <= 1; p += 1 / 512) {
      const x = semicircleQuantile(p);
      expect(x).toBeGreaterThanOrEqual(previous);
      previous = x;
    }
    expect(() => semicircleQuantile(1.5)).toThrow(RangeError);
    expect(semicircleQuantile(NaN)).toBeNaN();
  });
});
