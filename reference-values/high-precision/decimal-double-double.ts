import { Decimal } from 'decimal.js';
import { type DoubleDouble, dd } from './double-double.js';

/** Decimal arithmetic with enough digits to hold any double (and a sum of two) exactly. */
const Exact = Decimal.clone({ precision: 1200, toExpNeg: -2000, toExpPos: 2000 });

/** The exact value of a double, as a Decimal (every double is a finite binary, hence decimal, fraction). */
function exactDecimal(x: number): Decimal {
  if (!Number.isFinite(x)) throw new RangeError(`exactDecimal: ${x} is not finite`);
  if (x === 0) return new Exact(0);
  const view = new DataView(new ArrayBuffer(8));
  view.setFloat64(0, x);
  const bits = view.getBigUint64(0);
  const exponentBits = Number((bits >> 52n) & 0x7ffn);
  const fraction = bits & ((1n << 52n) - 1n);
  const mantissa = exponentBits === 0 ? fraction : fraction | (1n << 52n);
  const exponent = (exponentBits === 0 ? 1 : exponentBits) - 1075;
  const magnitude = new Exact(mantissa.toString()).times(new Exact(2).pow(exponent));
  return x < 0 ? magnitude.neg() : magnitude;
}

/**
 * Conversions between decimal.js and double-double: `fromDecimal` rounds a Decimal to the nearest
 * double-double (hi the nearest double, lo the nearest double to the exact remainder), `toDecimal`
 * gives the exact value hi + lo as a Decimal (for printing a result to a chosen number of digits).
 */
export const decimalDoubleDouble = {
  fromDecimal(value: Decimal): DoubleDouble {
    const exact = new Exact(value);
    const hi = Number(exact.toPrecision(25));
    const lo = Number(exact.minus(exactDecimal(hi)).toPrecision(25));
    return dd.of(hi, lo);
  },
  toDecimal(value: DoubleDouble): Decimal {
    return exactDecimal(value.hi).plus(exactDecimal(value.lo));
  },
};
