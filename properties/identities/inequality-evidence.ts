import type { DeterministicEvidence, Quantity } from '../../harness/evidence.js';
import { RATIO_THRESHOLD } from './error-scales.js';

export interface InequalityInput {
  /** The computed quantity the inequality is about. */
  readonly observed: Quantity;
  /** The bound it must respect. */
  readonly bound: number;
  readonly boundSource: string;
  /** By how much the computed quantity is on the wrong side of the bound (0 when it is not); NaN if it is NaN. */
  readonly violation: number;
  /** The rounding-error scale of the computed quantity. */
  readonly scale: number;
  readonly toleranceReason: string;
}

/**
 * Evidence for an exact inequality of computed quantities: the violation in units of the
 * quantity's rounding-error scale, so a correct routine (which can miss a bound only by rounding)
 * has a ratio of order one at most, and NaN anywhere is an infinite ratio.
 */
export function inequalityEvidence(input: InequalityInput): DeterministicEvidence {
  const raw = input.violation / input.scale;
  return {
    kind: 'deterministic',
    observed: input.observed,
    expected: input.bound,
    expectedSource: input.boundSource,
    ratio: Number.isNaN(raw) ? Infinity : raw,
    threshold: RATIO_THRESHOLD,
    toleranceReason: input.toleranceReason,
  };
}
