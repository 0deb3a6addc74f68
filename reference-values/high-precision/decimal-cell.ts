import type { Decimal } from 'decimal.js';

/** A decimal table cell: `digits` significant digits, "0" for zero (never "-0"). */
export function decimalCell(value: Decimal, digits: number): string {
  if (value.isZero()) return '0';
  return value.toSignificantDigits(digits).toString();
}
