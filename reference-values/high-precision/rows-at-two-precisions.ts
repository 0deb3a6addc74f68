import { Decimal } from 'decimal.js';
import type { Cell } from '../reference-table.js';

/**
 * Builds a table's rows twice, with decimal.js at `precision` and at `precision + 20` significant
 * digits, and returns them only if every cell agrees: the evidence that the printed digits do not
 * depend on the working precision. Throws, naming the first differing cell, otherwise.
 */
export function rowsAtTwoPrecisions(precision: number, build: (D: typeof Decimal) => Cell[][]): Cell[][] {
  const rows = build(Decimal.clone({ precision, rounding: Decimal.ROUND_HALF_EVEN }));
  const check = build(Decimal.clone({ precision: precision + 20, rounding: Decimal.ROUND_HALF_EVEN }));
  rows.forEach((row, i) =>
    row.forEach((cell, j) => {
      if (check[i]?.[j] !== cell) {
        throw new Error(`rowsAtTwoPrecisions: row ${i}, cell ${j} is ${String(cell)} at ${precision} digits but ${String(check[i]?.[j])} at ${precision + 20}`);
      }
    }),
  );
  return rows;
}
