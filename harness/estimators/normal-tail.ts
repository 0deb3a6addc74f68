import erfc from '@stdlib/math-base-special-erfc';
import erfcinv from '@stdlib/math-base-special-erfcinv';

/**
 * Two-sided tail probability of a standard normal: P(|Z| ≥ z) = erfc(z/√2).
 * erfc from stdlib-js (@stdlib/math-base-special-erfc), accurate to double precision far into
 * the tail, so p-values as small as 1e-300 stay meaningful under Holm's adjustment.
 */
export function twoSidedNormalTail(z: number): number {
  if (Number.isNaN(z)) return NaN;
  return erfc(Math.abs(z) / Math.SQRT2);
}

/** Upper quantile: the z with P(Z ≥ z) = p, for 0 < p < 1 (z = √2·erfcinv(2p)). */
export function upperNormalQuantile(p: number): number {
  return Math.SQRT2 * erfcinv(2 * p);
}
