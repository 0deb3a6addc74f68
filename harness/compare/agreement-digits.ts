import { logRelativeError } from '../../reference-values/log-relative-error.js';

/** Decimal digits a double carries: log10(2⁵³) ≈ 15.95, the cap of every agreement score. */
export const DOUBLE_PRECISION_DIGITS = 53 * Math.log10(2);

/**
 * The digits to which two results agree, given their relative difference r: the log relative
 * error −log10(r) in the convention of NIST's Statistical Reference Datasets (capped at the
 * digits of a double, 0 when not even the first digit agrees or r is NaN).
 *
 * Method: logRelativeError scores a value against a certified one; scoring r against 0 gives its
 * log absolute error, −log10 r, which is the LRE of the two results when r is their relative
 * difference (normwise for a list, as in `listAgreement`). Computing r first and scoring it keeps
 * the digits of a difference of nearly equal numbers that forming `right + difference` would lose.
 */
export function agreementDigits(relativeDifference: number): number {
  return logRelativeError(relativeDifference, 0, DOUBLE_PRECISION_DIGITS);
}
