import type { Complex } from './numeric/complex.js';

/** A compared quantity: a real number or a complex one. */
export type Quantity = number | Complex;

/**
 * What a statistical check found: an estimate, the reference it is held against, and how far
 * apart they are in units of the estimate's standard error once the finite-N allowance is spent.
 *
 * The test is of H0: |E[estimate] − expected| ≤ allowance (per component), so a correct
 * implementation whose finite-N bias stays inside the allowance is rejected at most at the
 * nominal rate; the allowance is stated with its reason so a reader can judge it.
 */
export interface StatisticalEvidence {
  readonly kind: 'statistical';
  readonly observed: Quantity;
  readonly expected: Quantity;
  /** Formula and citation of the expected value. */
  readonly expectedSource: string;
  /** Standard error of `observed` (per component for a complex quantity). */
  readonly standardError: Quantity;
  readonly standardErrorMethod: string;
  /** Finite-N allowance on |observed − expected| (per component). */
  readonly allowance: number;
  readonly allowanceReason: string;
  /** (|observed − expected| − allowance)₊ / standardError, the largest over components. */
  readonly zScore: number;
  /** Two-sided p-value of that excess (Bonferroni over the two components of a complex quantity). */
  readonly pValue: number;
  /** Number of independent samples behind the estimate. */
  readonly sampleCount: number;
  /**
   * Power, where the check states it: the smallest deviation from `expected`, relative to its
   * scale (|expected|, or the statistic's natural size where the expected value is near 0), that
   * the check would detect with probability 0.8 at its share of the run's level:
   * (allowance + (z_{α/(2cm)} + z_{0.2})·SE)/scale, with m the statistical checks of its suite and
   * c the components (2 for a complex quantity).
   */
  readonly detectableRelativeError?: number;
}

/**
 * What a deterministic check found: a normalised error ratio that is O(1) for a correct routine
 * whatever the size or precision, held against one fixed threshold (LAPACK's test-program style).
 */
export interface DeterministicEvidence {
  readonly kind: 'deterministic';
  readonly observed: Quantity;
  readonly expected: Quantity;
  readonly expectedSource: string;
  /** |observed − expected| / scale, with the scale of `toleranceReason`. */
  readonly ratio: number;
  readonly threshold: number;
  readonly toleranceReason: string;
  /** The input that gave the worst ratio, in replayable form. */
  readonly worstInput?: string;
}

export type Evidence = StatisticalEvidence | DeterministicEvidence;
