import type { ReferenceTableContent } from '../reference-table.js';
import { decimalTool } from './decimal-tool.js';

/** Working and printed digits of the decimal.js tables; rowsAtTwoPrecisions rechecks at WORKING + 20. */
export const DECIMAL_DIGITS = { working: 50, printed: 20, certified: 15 } as const;

/**
 * The production record, certified digits and certification of a table computed with decimal.js
 * (rows built by rowsAtTwoPrecisions), so that these tables state their provenance the same way.
 */
export function decimalProvenance(
  generator: string,
  method: string,
  externalChecks: string,
): Pick<ReferenceTableContent, 'production' | 'certifiedDigits' | 'certification'> {
  const { working, printed, certified } = DECIMAL_DIGITS;
  return {
    production: {
      generator,
      method,
      arithmetic: `decimal.js, ${working} significant digits, round half even`,
      precision: `printed to ${printed} significant digits; identical when recomputed at ${working + 20} digits`,
      tool: decimalTool(),
    },
    certifiedDigits: certified,
    certification: `every printed digit (${printed}) agrees between ${working}- and ${working + 20}-digit arithmetic; certified to ${certified} significant digits, the accuracy a double-precision implementation can be scored against. test/reference-values checks ${externalChecks}`,
  };
}
