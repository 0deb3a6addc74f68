import { Decimal } from 'decimal.js';

/**
 * The log relative error of a computed value against a certified one, in the convention of NIST's
 * Statistical Reference Datasets: the number of significant digits the computed value gets right,
 *
 *   LRE = −log10(|computed − certified| / |certified|)   when certified ≠ 0,
 *   LRE = −log10(|computed − certified|)                 when certified = 0 (the log absolute error),
 *
 * capped at the digits to which the certified value is known (an exact match gives the cap), and
 * set to 0 below 0 or when the computed value is NaN or infinite (not even the first digit right).
 *
 * Method: the difference is formed in decimal arithmetic (decimal.js, 40 significant digits), so
 * a certified value given as a decimal string with more digits than a double is used in full.
 * References: NIST Information Technology Laboratory, Statistical Reference Datasets (StRD), the
 * LRE definition used to score the datasets' certified values; B. D. McCullough, 1998, "Assessing
 * the reliability of statistical software: Part I", The American Statistician 52(4), 358–366
 * (details from memory).
 */
export function logRelativeError(computed: number, certified: number | string | bigint, certifiedDigits: number): number {
  if (!(certifiedDigits > 0)) throw new RangeError(`logRelativeError: certifiedDigits must be positive, got ${certifiedDigits}`);
  if (!Number.isFinite(computed)) return 0;
  const D = Decimal.clone({ precision: 40 });
  const c = new D(typeof certified === 'bigint' ? certified.toString() : certified);
  if (!c.isFinite()) throw new RangeError(`logRelativeError: the certified value must be finite, got ${String(certified)}`);
  const difference = new D(computed).minus(c).abs();
  if (difference.isZero()) return certifiedDigits;
  const error = c.isZero() ? difference : difference.div(c.abs());
  const lre = -error.log(10).toNumber();
  return Math.min(certifiedDigits, Math.max(0, lre));
}
