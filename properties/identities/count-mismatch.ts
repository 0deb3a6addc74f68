import type { DeterministicEvidence } from '../../harness/evidence.js';
import { RATIO_THRESHOLD } from './error-scales.js';

/**
 * The evidence when an implementation returns the wrong number of values: nothing can be compared
 * value by value, and a count is exact, so the ratio is infinite.
 */
export function countMismatch(observed: number, expected: number, what: string): DeterministicEvidence {
  return {
    kind: 'deterministic',
    observed,
    expected,
    expectedSource: `the number of ${what} requested`,
    ratio: Infinity,
    threshold: RATIO_THRESHOLD,
    toleranceReason: 'a count is exact: any difference fails',
  };
}
