import { describe, expect, it } from 'vitest';
import { certifiedEvenMoment } from '../../reference-values/certified-even-moment.js';
import { gueTraceMoment, ratioToNumber } from '../../reference-values/finite-n-corrections.js';

describe('certifiedEvenMoment', () => {
  it('reads N ≤ 64 from the value tables: GOE E Tr X⁴ = 2N³ + 5N² + 5N, GUE = 2N³ + N (THEORY.md)', () => {
    const goe = certifiedEvenMoment('goe', 10, 2);
    expect(goe?.trace).toBe(2550n);
    expect(goe?.normalised).toBe(2550 / 1000);
    expect(goe?.source).toMatch(/table goe-even-moments/);
    expect(certifiedEvenMoment('gue', 10, 2)?.trace).toBe(2010n);
  });

  it('evaluates the polynomial tables beyond N = 64, exactly', () => {
    const N = 1000;
    const goe = certifiedEvenMoment('goe', N, 3);
    expect(goe?.trace).toBe(5n * 10n ** 12n + 22n * 10n ** 9n + 52n * 10n ** 6n + 41n * 1000n);
    expect(goe?.source).toMatch(/goe-even-moment-polynomials evaluated at N = 1000/);
    const gue = certifiedEvenMoment('gue', N, 12);
    expect(gue?.trace).toBe(gueTraceMoment(N, 12));
    expect(gue?.normalised).toBe(ratioToNumber(gueTraceMoment(N, 12), BigInt(N) ** 13n));
  });

  it('falls back to the Harer–Zagier recursion for GUE beyond k = 12 and says GOE is not tabulated there', () => {
    expect(certifiedEvenMoment('gue', 30, 13)?.trace).toBe(gueTraceMoment(30, 13));
    expect(certifiedEvenMoment('gue', 30, 13)?.source).toMatch(/recursion itself/);
    expect(certifiedEvenMoment('goe', 30, 13)).toBeUndefined();
    expect(() => certifiedEvenMoment('goe', 0, 1)).toThrow(RangeError);
  });
});
