import type { Complex } from '../../harness/numeric/complex.js';
import type { EnsembleConstants } from '../../harness/numeric/ensemble.js';
import { nonGaussianFactor } from './fluctuation-allowances.js';
import { summedCovarianceFinding } from './fluctuation-evidence.js';
import type { Estimand } from './estimand.js';
import type { FluctuationCheck } from './fluctuation-check.js';
import type { Statistic } from './statistic-book.js';

/** An allowance factor (relative to the natural scale) and why. */
export interface Allowance {
  readonly factor: number;
  readonly reason: string;
}

/** C·g/N for the O(1/N) corrections to a limit (fluctuation-allowances.ts). */
export function finiteSizeAllowance(constant: number, c: EnsembleConstants, size: number): Allowance {
  const g = nonGaussianFactor(c);
  return {
    factor: (constant * g) / size,
    reason: `O(1/N) corrections to the limit, C·g/N with C = ${constant}, g = 1 + |κ4| + |σ_d² − 2/β| = ${g}, calibrated by simulation`,
  };
}

/** Cov(X, Y) (bilinear) against a reference value with its source and allowance. */
export function covarianceCheck(
  name: string,
  title: string,
  x: Statistic,
  y: Statistic,
  expected: Complex,
  expectedSource: string,
  allowance: Allowance,
): FluctuationCheck {
  return summedCovarianceCheck(name, title, [[x, y]], expected, expectedSource, allowance);
}

/** Σ_j Cov(X_j, Y_j) against a reference value (pairs whose noises average while their signals add). */
export function summedCovarianceCheck(
  name: string,
  title: string,
  pairs: ReadonlyArray<readonly [Statistic, Statistic]>,
  expected: Complex,
  expectedSource: string,
  allowance: Allowance,
): FluctuationCheck {
  const estimand: Estimand = { kind: 'covariance', pairs };
  return {
    name,
    title,
    statistical: true,
    estimands: [estimand],
    evaluate: (tally, power) =>
      summedCovarianceFinding(tally, estimand, { expected, expectedSource, allowanceFactor: allowance.factor, allowanceReason: allowance.reason }, power),
  };
}
