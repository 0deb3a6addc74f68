import { type DoubleDouble, dd } from './double-double.js';
import { doubleDoubleConstants } from './double-double-constants.js';

/**
 * e^x in double-double for |x| ≤ 700.
 * Method: x = k ln 2 + r with |r| ≤ ln 2/2 (k = round(x/ln 2), ln 2 in double-double), then
 * e^r = (e^{r/32})^{32}: the Taylor series of e^{r/32} (|r/32| < 0.011) to 20 terms, truncation
 * error below 1e-60, squared five times, and scaled by 2^k (exact). Squaring multiplies the
 * relative error by 32, so the result is good to about 1e-30 relative.
 */
export function expDoubleDouble(x: DoubleDouble): DoubleDouble {
  if (Math.abs(x.hi) > 700) throw new RangeError(`expDoubleDouble: |x| must be at most 700, got ${x.hi}`);
  const { ln2 } = doubleDoubleConstants();
  const k = Math.round(x.hi / ln2.hi);
  const r = dd.mulNumber(dd.sub(x, dd.mulNumber(ln2, k)), 1 / 32);
  let term = dd.of(1);
  let sum = dd.of(1);
  for (let j = 1; j <= 20; j++) {
    term = dd.divNumber(dd.mul(term, r), j);
    sum = dd.add(sum, term);
  }
  for (let j = 0; j < 5; j++) sum = dd.mul(sum, sum);
  // 2^k in two steps, so that neither factor overflows or underflows on its own.
  const half = Math.trunc(k / 2);
  return dd.mulNumber(dd.mulNumber(sum, 2 ** half), 2 ** (k - half));
}
