import { describe, expect, it } from 'vitest';
import { bilinearCovariance } from '../../../harness/estimators/bilinear-covariance.js';
import { jointCumulant, setPartitions } from '../../../harness/estimators/joint-cumulant.js';
import { randomStream } from '../../../harness/numeric/random-stream.js';

function realColumn(values: ArrayLike<number>): Float64Array {
  const out = new Float64Array(2 * values.length);
  for (let k = 0; k < values.length; k++) out[2 * k] = values[k];
  return out;
}

describe('setPartitions', () => {
  it('enumerates Bell(n) partitions (OEIS A000110) with the Möbius coefficients', () => {
    expect([1, 2, 3, 4, 5, 6].map((n) => setPartitions(n).length)).toEqual([1, 2, 5, 15, 52, 203]);
    // Σ_π (−1)^{|π|−1}(|π|−1)! over partitions of n ≥ 2 elements is 0 (the cumulant of a constant).
    for (const n of [2, 3, 4, 5, 6]) expect(setPartitions(n).reduce((a, p) => a + p.coefficient, 0)).toBe(0);
  });
});

describe('jointCumulant', () => {
  it('gives κ4 = −2 exactly for a balanced ±1 sample (the Rademacher law)', () => {
    const x = realColumn(Array.from({ length: 10 }, (_, k) => (k % 2 === 0 ? 1 : -1)));
    const k4 = jointCumulant([x, x, x, x]);
    expect(k4.estimate.re).toBeCloseTo(-2, 14);
    expect(k4.estimate.im).toBe(0);
    // Every delete-one sample of 9 values is unbalanced; the spread is finite and positive.
    expect(k4.standardError.re).toBeGreaterThan(0);
  });

  it('gives κ(X, X, Y, Y) = 0 exactly for two independent balanced signs on their product grid', () => {
    const x = realColumn([1, 1, -1, -1]);
    const y = realColumn([1, -1, 1, -1]);
    expect(Math.abs(jointCumulant([x, x, y, y]).estimate.re)).toBeLessThan(1e-15);
  });

  it('of order 2 is the plug-in covariance (1/K) and of order 1 is 0', () => {
    const s = randomStream(1, 'cumulant-order-2', 0);
    const x = new Float64Array(200).map(() => s.nextNormal());
    const y = new Float64Array(200).map((_, k) => x[k] + s.nextNormal());
    const c2 = jointCumulant([x, y]).estimate;
    const c = bilinearCovariance(x, y).estimate;
    expect(c2.re).toBeCloseTo((c.re * 99) / 100, 12);
    expect(c2.im).toBeCloseTo((c.im * 99) / 100, 12);
    expect(Math.abs(jointCumulant([x]).estimate.re)).toBeLessThan(1e-14);
  });

  it('recovers the cumulants (n − 1)! of the exponential law and 0 for a Gaussian, within a few jackknife errors', () => {
    const s = randomStream(2, 'cumulant-exponential', 0);
    const e = realColumn(Array.from({ length: 40000 }, () => -Math.log(s.nextUniform())));
    const g = realColumn(Array.from({ length: 40000 }, () => s.nextNormal()));
    for (const [order, exact] of [[3, 2], [4, 6]] as const) {
      const k = jointCumulant(Array.from({ length: order }, () => e));
      expect(Math.abs(k.estimate.re - exact)).toBeLessThan(4 * k.standardError.re);
      const kg = jointCumulant(Array.from({ length: order }, () => g));
      expect(Math.abs(kg.estimate.re)).toBeLessThan(4 * kg.standardError.re);
    }
    // Mixed: κ(E, E, G) = 0 for independent E, G.
    const mixed = jointCumulant([e, e, g]);
    expect(Math.abs(mixed.estimate.re)).toBeLessThan(4 * mixed.standardError.re);
  });

  it('has jackknife standard errors that match the spread of the estimate over replications', () => {
    // κ3 of the exponential law from K = 400: the jackknife SE averaged over 150 replications must
    // agree with the replications' own standard deviation within 25 % (the SE of a standard
    // deviation over 150 values is about 6 %, heavier for a skewed statistic).
    const estimates: number[] = [];
    let meanSe = 0;
    for (let r = 0; r < 150; r++) {
      const s = randomStream(4, 'cumulant-jackknife', r);
      const e = realColumn(Array.from({ length: 400 }, () => -Math.log(s.nextUniform())));
      const k = jointCumulant([e, e, e]);
      estimates.push(k.estimate.re);
      meanSe += k.standardError.re / 150;
    }
    const mean = estimates.reduce((a, b) => a + b, 0) / estimates.length;
    const sd = Math.sqrt(estimates.reduce((a, b) => a + (b - mean) ** 2, 0) / (estimates.length - 1));
    expect(meanSe / sd).toBeGreaterThan(0.75);
    expect(meanSe / sd).toBeLessThan(1.25);
  });

  it('is multilinear over complex values: κ(aX, Y, Z) = a·κ(X, Y, Z)', () => {
    const s = randomStream(6, 'cumulant-complex', 0);
    const col = () => {
      const c = new Float64Array(600);
      for (let k = 0; k < 300; k++) {
        const u = -Math.log(s.nextUniform());
        c[2 * k] = u;
        c[2 * k + 1] = u * u - s.nextNormal();
      }
      return c;
    };
    const x = col();
    const y = col();
    const ax = new Float64Array(x.length);
    for (let k = 0; k < 300; k++) {
      ax[2 * k] = 2 * x[2 * k] - 3 * x[2 * k + 1];
      ax[2 * k + 1] = 3 * x[2 * k] + 2 * x[2 * k + 1];
    }
    const base = jointCumulant([x, y, y]).estimate;
    const scaled = jointCumulant([ax, y, y]).estimate;
    expect(scaled.re).toBeCloseTo(2 * base.re - 3 * base.im, 10);
    expect(scaled.im).toBeCloseTo(3 * base.re + 2 * base.im, 10);
  });
});
