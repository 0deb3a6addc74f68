import { upperNormalQuantile } from '../../harness/estimators/normal-tail.js';
import type { Quantity } from '../../harness/evidence.js';

/** What the power statement of a check needs to know about the run. */
export interface PowerContext {
  /** The run's family-wise level α. */
  readonly alpha: number;
  /** m: the statistical checks of the fluctuation suite in this run (Holm's family for them). */
  readonly familySize: number;
}

/** z_{0.2}: a deviation this many standard errors beyond the threshold is detected with probability 0.8. */
const POWER_QUANTILE = upperNormalQuantile(0.2);

/**
 * The smallest deviation detected with probability 0.8, relative to `scale`:
 * (allowance + (z_{α/(2cm)} + z_{0.2})·max SE)/scale. The threshold z_{α/(2cm)} is the one the
 * first step of Holm's procedure applies (α/m, two-sided, Bonferroni over the c components), so
 * the statement is conservative; it ignores the rest of the family, where other suites add checks.
 * Power of a one-sided normal test, common practice (e.g. J. Cohen, 1988, Statistical Power
 * Analysis for the Behavioral Sciences, 2nd ed., ch. 1).
 */
export function detectableRelativeError(allowance: number, standardError: Quantity, scale: number, power: PowerContext): number {
  const components = typeof standardError === 'number' ? [standardError] : [standardError.re, standardError.im];
  const threshold = upperNormalQuantile(power.alpha / (2 * components.length * Math.max(1, power.familySize)));
  return (allowance + (threshold + POWER_QUANTILE) * Math.max(...components)) / scale;
}
