import { describe, expect, it } from 'vitest';
import { holmAdjust } from '../../../harness/estimators/holm-adjust.js';

describe('holmAdjust', () => {
  // Worked example checked by hand against the definition in Holm 1979, Scand. J. Statist. 6, 65–70:
  // sorted p = 0.01, 0.02, 0.03, 0.04 with m = 4 → 0.04, 0.06, 0.06 (monotone), 0.06.
  it('follows the step-down definition, kept monotone, in the input order', () => {
    const adjusted = holmAdjust([0.03, 0.01, 0.04, 0.02]);
    expect(adjusted[1]).toBeCloseTo(0.04, 15);
    expect(adjusted[3]).toBeCloseTo(0.06, 15);
    expect(adjusted[0]).toBeCloseTo(0.06, 15);
    expect(adjusted[2]).toBeCloseTo(0.06, 15);
  });

  it('caps at one and treats NaN as a failure (0)', () => {
    expect(holmAdjust([0.9, 0.8])).toEqual([1, 1]);
    expect(holmAdjust([NaN, 0.5])[0]).toBe(0);
  });

  it('controls the family-wise error: with all nulls true, rejections are rare (uniform p-values)', () => {
    // 2000 families of 20 uniform p-values (a deterministic low-discrepancy sequence, so the test is
    // exact and reproducible): the family-wise rejection rate at α = 0.05 must not exceed α.
    let rejectedFamilies = 0;
    let u = 0.5;
    const golden = (Math.sqrt(5) - 1) / 2;
    for (let f = 0; f < 2000; f++) {
      const p = Array.from({ length: 20 }, () => (u = (u + golden) % 1));
      if (holmAdjust(p).some((q) => q <= 0.05)) rejectedFamilies++;
    }
    expect(rejectedFamilies / 2000).toBeLessThanOrEqual(0.05);
  });
});
