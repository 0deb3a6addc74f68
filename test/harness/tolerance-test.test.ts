import { describe, expect, it } from 'vitest';
import { ratioTest, toleranceTest } from '../../harness/tolerance-test.js';

const base = { expectedSource: 'test', standardErrorMethod: 'given', allowanceReason: 'given', sampleCount: 100 };

describe('toleranceTest', () => {
  it('spends the allowance before counting standard errors', () => {
    const e = toleranceTest({ ...base, observed: 1.05, expected: 1, standardError: 0.01, allowance: 0.03 });
    expect(e.zScore).toBeCloseTo(2, 8);
    // P(|Z| ≥ 2) = 0.0455002638963584 (standard normal table; e.g. Abramowitz and Stegun 1964, Table 26.1).
    expect(e.pValue).toBeCloseTo(0.0455002638963584, 9);
  });

  it('gives z = 0 and p = 1 inside the allowance', () => {
    const e = toleranceTest({ ...base, observed: 1.01, expected: 1, standardError: 0.001, allowance: 0.02 });
    expect(e.zScore).toBe(0);
    expect(e.pValue).toBe(1);
  });

  it('tests both parts of a complex quantity and doubles the smaller p (Bonferroni)', () => {
    const e = toleranceTest({
      ...base,
      observed: { re: 0, im: 1.03 },
      expected: { re: 0, im: 1 },
      standardError: { re: 0.01, im: 0.01 },
      allowance: 0,
    });
    expect(e.zScore).toBeCloseTo(3, 8);
    // 2 · P(|Z| ≥ 3) = 2 · 0.0026997960632601866.
    expect(e.pValue).toBeCloseTo(2 * 0.0026997960632601866, 10);
  });

  it('turns NaN observations into a NaN p-value, never a pass', () => {
    const e = toleranceTest({ ...base, observed: NaN, expected: 1, standardError: 0.1, allowance: 0 });
    expect(e.pValue).toBeNaN();
  });
});

describe('ratioTest', () => {
  it('divides the error modulus by the scale and maps NaN to an infinite ratio', () => {
    const ok = ratioTest({ observed: { re: 3, im: 4 }, expected: { re: 0, im: 0 }, expectedSource: 't', scale: 5, threshold: 2, toleranceReason: 'r' });
    expect(ok.ratio).toBe(1);
    const bad = ratioTest({ observed: NaN, expected: 1, expectedSource: 't', scale: 1, threshold: 2, toleranceReason: 'r' });
    expect(bad.ratio).toBe(Infinity);
  });
});
