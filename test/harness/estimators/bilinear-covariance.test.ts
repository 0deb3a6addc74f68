import { describe, expect, it } from 'vitest';
import { bilinearCovariance, summedBilinearCovariance } from '../../../harness/estimators/bilinear-covariance.js';
import { randomStream } from '../../../harness/numeric/random-stream.js';

function interleaved(re: number[], im: number[] = re.map(() => 0)): Float64Array {
  const out = new Float64Array(2 * re.length);
  re.forEach((r, k) => {
    out[2 * k] = r;
    out[2 * k + 1] = im[k];
  });
  return out;
}

describe('bilinearCovariance', () => {
  it('is the unbiased sample covariance, exactly, on a worked example', () => {
    // x = 1, 2, 3, 6 (mean 3), y = 2, 4, 7, 3 (mean 4), by hand:
    // Σ(x − x̄)(y − ȳ) = (−2)(−2) + (−1)(0) + (0)(3) + (3)(−1) = 1, so ĉ = 1/3.
    const c = bilinearCovariance(interleaved([1, 2, 3, 6]), interleaved([2, 4, 7, 3]));
    expect(c.estimate.re).toBeCloseTo(1 / 3, 15);
    expect(c.estimate.im).toBe(0);
    // Products p = 4, 0, 0, −3 (mean 1/4): s² = ((15/4)² + (1/4)² + (1/4)² + (13/4)²)/3 = 33/4.
    expect(c.standardError.re).toBeCloseTo(Math.sqrt(33 / 4 / 4), 14);
  });

  it('does not conjugate: Cov(X, X) of X = e^{iθ}·(real noise) is e^{2iθ} Var', () => {
    const theta = 0.7;
    const noise = [0.3, -1.2, 2.0, 0.1, -0.8, 1.4];
    const x = interleaved(noise.map((v) => v * Math.cos(theta)), noise.map((v) => v * Math.sin(theta)));
    const real = bilinearCovariance(interleaved(noise), interleaved(noise)).estimate.re;
    const c = bilinearCovariance(x, x).estimate;
    expect(c.re).toBeCloseTo(real * Math.cos(2 * theta), 13);
    expect(c.im).toBeCloseTo(real * Math.sin(2 * theta), 13);
  });

  it('has calibrated standard errors on a complex Gaussian pair with known covariance', () => {
    // X = a + ib, Y = ρ·X + √(1 − ρ²)·(c + id)/… with a, b, c, d independent N(0, 1/2): Cov(X, Y)
    // bilinear is ρ·E[X²] = 0 for a circular X, and Cov(X, X̄) = E|X|² = 1. Test the latter (Y = X̄):
    // over 300 replications of K = 400 the z-scores (ĉ − 1)/SE must have mean ≈ 0 and spread ≈ 1.
    const z: number[] = [];
    for (let r = 0; r < 300; r++) {
      const s = randomStream(7, 'bilinear-covariance-test', r);
      const x = new Float64Array(800);
      const y = new Float64Array(800);
      for (let k = 0; k < 400; k++) {
        x[2 * k] = s.nextNormal() * Math.SQRT1_2;
        x[2 * k + 1] = s.nextNormal() * Math.SQRT1_2;
        y[2 * k] = x[2 * k];
        y[2 * k + 1] = -x[2 * k + 1];
      }
      const c = bilinearCovariance(x, y);
      z.push((c.estimate.re - 1) / c.standardError.re);
    }
    const mean = z.reduce((a, b) => a + b, 0) / z.length;
    const sd = Math.sqrt(z.reduce((a, b) => a + (b - mean) ** 2, 0) / (z.length - 1));
    // Mean within 4 standard errors (1/√300 ≈ 0.058) of 0; spread within 15 % of 1 (SE of a
    // standard deviation over 300 values ≈ 4 %, plus the delta method's O(1/K) bias).
    expect(Math.abs(mean)).toBeLessThan(0.25);
    expect(sd).toBeGreaterThan(0.85);
    expect(sd).toBeLessThan(1.15);
  });

  it('sums covariances exactly, with the error of the summed products (independent pairs: errors add in quadrature)', () => {
    const s = randomStream(8, 'summed-covariance', 0);
    const column = () => new Float64Array(2000).map(() => s.nextNormal());
    const [a, b, c, d] = [column(), column(), column(), column()];
    const sum = summedBilinearCovariance([
      [a, b],
      [c, d],
    ]);
    const one = bilinearCovariance(a, b);
    const two = bilinearCovariance(c, d);
    expect(sum.estimate.re).toBeCloseTo(one.estimate.re + two.estimate.re, 13);
    expect(sum.estimate.im).toBeCloseTo(one.estimate.im + two.estimate.im, 13);
    // Independent pairs: the variance of the summed products is the sum of the two, up to sampling.
    const quadrature = Math.hypot(one.standardError.re, two.standardError.re);
    expect(sum.standardError.re / quadrature).toBeGreaterThan(0.9);
    expect(sum.standardError.re / quadrature).toBeLessThan(1.1);
  });

  it('rejects mismatched or too short input', () => {
    expect(() => bilinearCovariance(new Float64Array(4), new Float64Array(6))).toThrow(RangeError);
    expect(() => bilinearCovariance(new Float64Array(2), new Float64Array(2))).toThrow(RangeError);
  });
});
