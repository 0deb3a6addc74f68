import type { Decimal } from 'decimal.js';
import type { DecimalConstructor } from './decimal-complex.js';

/**
 * The modified Bessel function I_n(x), integer n ≥ 0, in decimal arithmetic, by its power series
 * I_n(x) = Σ_{j≥0} (x/2)^{2j+n}/(j!(j+n)!) (DLMF 10.25.2). For the moderate |x| used here (≤ 2)
 * every term is positive for x > 0 and the series converges like 1/j!², so it is summed until a
 * term falls below 10^−(precision+5) of the sum.
 */
export function besselIDecimal(D: DecimalConstructor, n: number, x: Decimal.Value): Decimal {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`besselIDecimal: n must be an integer ≥ 0, got ${n}`);
  const half = new D(x).div(2);
  const quarterSquare = half.times(half);
  let term = half.pow(n);
  for (let j = 2; j <= n; j++) term = term.div(j);
  let sum = term;
  const threshold = new D(10).pow(-(D.precision + 5));
  for (let j = 1; ; j++) {
    term = term.times(quarterSquare).div(j * (j + n));
    sum = sum.plus(term);
    if (term.abs().lte(sum.abs().times(threshold))) return sum;
  }
}
