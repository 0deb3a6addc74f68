import { describe, expect, it } from 'vitest';
import { logRelativeError } from '../../reference-values/log-relative-error.js';

// The convention of NIST's Statistical Reference Datasets (StRD): LRE = −log10(|q − c|/|c|), the log
// absolute error when c = 0, capped at the certified digits (McCullough 1998, Am. Stat. 52).
describe('logRelativeError (NIST StRD convention)', () => {
  it('counts the correct significant digits', () => {
    expect(logRelativeError(1.000001, 1, 15)).toBeCloseTo(6, 9);
    expect(logRelativeError(123.456, 123.457, 15)).toBeCloseTo(-Math.log10(0.001 / 123.457), 9);
    expect(logRelativeError(-2.5e-8, -2.4e-8, 15)).toBeCloseTo(-Math.log10(1 / 24), 9);
  });

  it('is capped at the certified digits, and an exact match scores the cap', () => {
    expect(logRelativeError(1 + 1e-14, 1, 10)).toBe(10);
    expect(logRelativeError(0.5, '0.5', 15)).toBe(15);
    expect(logRelativeError(42, 42n, 17)).toBe(17);
  });

  it('uses the log absolute error when the certified value is 0', () => {
    expect(logRelativeError(1e-9, 0, 15)).toBeCloseTo(9, 9);
    expect(logRelativeError(0, '0', 12)).toBe(12);
  });

  it('scores 0 for a value with no correct digit, NaN or an infinity', () => {
    expect(logRelativeError(3, 1, 15)).toBe(0);
    expect(logRelativeError(Number.NaN, 1, 15)).toBe(0);
    expect(logRelativeError(Number.POSITIVE_INFINITY, 1, 15)).toBe(0);
  });

  it('uses every digit of a certified decimal string, beyond a double', () => {
    // 0.1 as a double is 0.1000000000000000055511151231257827…: against the string "0.1" its
    // decimal form is exact, against 0.10000000000000000555 the shortest form misses by 5.6e-18.
    expect(logRelativeError(0.1, '0.1', 20)).toBe(20);
    expect(logRelativeError(0.1, '0.10000000000000000555', 20)).toBeCloseTo(-Math.log10(5.55e-18 / 0.1), 1);
  });

  it('rejects a non-positive cap and a certified value that is not finite', () => {
    expect(() => logRelativeError(1, 1, 0)).toThrow(RangeError);
    expect(() => logRelativeError(1, 'Infinity', 15)).toThrow(RangeError);
  });
});
