import type { Quantity, StatisticalEvidence } from '../evidence.js';
import { twoSampleKolmogorovSmirnov } from '../estimators/two-sample-kolmogorov-smirnov.js';
import { toleranceTest } from '../tolerance-test.js';

/** An estimate from one side's samples, with its standard error (per component). */
export interface SideEstimate {
  readonly estimate: Quantity;
  /** Of the estimate, per component for a complex one. */
  readonly standardError: Quantity;
  readonly count: number;
}

/** √(a² + b²), per component for complex standard errors. */
function combinedStandardError(a: Quantity, b: Quantity): Quantity {
  if (typeof a === 'number' && typeof b === 'number') return Math.hypot(a, b);
  if (typeof a !== 'number' && typeof b !== 'number') return { re: Math.hypot(a.re, b.re), im: Math.hypot(a.im, b.im) };
  throw new RangeError('combinedStandardError: one estimate is real, the other complex');
}

/**
 * Whether two independent estimates of one quantity differ: H0 is that both sides estimate the
 * same value (same ensemble, same N, so a correct pair has exactly equal expectations and no
 * finite-N allowance is due; a baseline and a later run of one implementation likewise). The difference is held against √(SE_L² + SE_R²) per component,
 * Welch's standard error of a difference of independent estimates (B. L. Welch, 1947, "The
 * generalization of 'Student's' problem when several different population variances are
 * involved", Biometrika 34, 28–35), with the normal approximation (hundreds of samples; common
 * practice); a complex quantity's two parts are tested with a Bonferroni factor 2 (tolerance-test.ts).
 */
export function differenceEvidence(
  left: SideEstimate,
  right: SideEstimate,
  rightSource: string,
  estimateMethod: string,
): StatisticalEvidence {
  return toleranceTest({
    observed: left.estimate,
    expected: right.estimate,
    expectedSource: rightSource,
    standardError: combinedStandardError(left.standardError, right.standardError),
    standardErrorMethod: `√(SE_L² + SE_R²) per component (Welch 1947, Biometrika 34), each side's SE: ${estimateMethod}`,
    allowance: 0,
    allowanceReason: 'none: both samples come from the same ensemble at the same N, so equal laws give equal expectations exactly',
    sampleCount: left.count + right.count,
  });
}

/**
 * Whether one real statistic has the same distribution on both sides: the two-sample
 * Kolmogorov–Smirnov test (Smirnov 1948; two-sample-kolmogorov-smirnov.ts). The evidence holds
 * D against 0 on the scale √((n + m)/(nm)) under which √(nm/(n+m))·D has Kolmogorov's law; the
 * z-score is that scaled distance and the p-value the asymptotic one with Stephens' adjustment.
 */
export function distributionEvidence(left: ArrayLike<number>, right: ArrayLike<number>, rightSource: string): StatisticalEvidence {
  const ks = twoSampleKolmogorovSmirnov(left, right);
  const scale = 1 / Math.sqrt(ks.effectiveSize);
  return {
    kind: 'statistical',
    observed: ks.distance,
    expected: 0,
    expectedSource: `equal laws: the empirical distribution functions of both sides converge to one (${rightSource})`,
    standardError: scale,
    standardErrorMethod:
      '√((n + m)/(nm)), the scale of D = sup|F_n − G_m| under equal continuous laws (Smirnov 1948, Ann. Math. Statist. 19); ' +
      "p-value from Kolmogorov's limiting law with Stephens' adjustment (Stephens 1970, J. R. Statist. Soc. B 32)",
    allowance: 0,
    allowanceReason: 'none: the same ensemble at the same N on both sides',
    zScore: ks.distance / scale,
    pValue: ks.pValue,
    sampleCount: left.length + right.length,
  };
}
