import type { CheckFinding } from '../../harness/check-group.js';
import { complexMean, summedBilinearCovariance } from '../../harness/estimators/bilinear-covariance.js';
import { jointCumulant } from '../../harness/estimators/joint-cumulant.js';
import { lagOneAutocorrelation } from '../../harness/estimators/lag-one-autocorrelation.js';
import { abs, type Complex } from '../../harness/numeric/complex.js';
import type { Quantity, StatisticalEvidence } from '../../harness/evidence.js';
import { toleranceTest } from '../../harness/tolerance-test.js';
import { detectableRelativeError, type PowerContext } from './detection-power.js';
import type { FluctuationSamples } from './fluctuation-samples.js';
import type { Statistic } from './statistic-book.js';

/** The reference a check is held against, and its finite-N allowance in units of the statistic's size. */
export interface Reference {
  readonly expected: Complex;
  readonly expectedSource: string;
  /** Allowance = allowanceFactor × the natural scale (√(E|X − EX|²·E|Y − EY|²) for a covariance). */
  readonly allowanceFactor: number;
  readonly allowanceReason: string;
}

/** E|X − EX|², estimated: the natural size of a statistic's covariances. */
export function meanSquare(x: Float64Array): number {
  const n = x.length / 2;
  const [re, im] = complexMean(x);
  let s = 0;
  for (let k = 0; k < n; k++) s += (x[2 * k] - re) ** 2 + (x[2 * k + 1] - im) ** 2;
  return s / (n - 1);
}

/** A measured finding with its power statement. */
function measured(samples: FluctuationSamples, evidence: StatisticalEvidence, standardError: Quantity, scale: number, power: PowerContext): CheckFinding {
  return {
    state: 'measured',
    path: samples.path,
    evidence: { ...evidence, detectableRelativeError: detectableRelativeError(evidence.allowance, standardError, scale, power) },
  };
}

/** Scale for the power statement: |expected| unless that is small against the natural size. */
function powerScale(expected: Complex, natural: number): number {
  const e = abs(expected);
  return e >= 0.1 * natural ? e : natural;
}

/**
 * Cov(X, Y) (bilinear) estimated over the samples both are observed on, against the reference.
 * The allowance is relative to √(E|X − EX|² E|Y − EY|²) as estimated from the same samples (a
 * deviation of the variance itself changes it by a factor 1 + O(allowanceFactor) only).
 */
export function covarianceFinding(samples: FluctuationSamples, x: Statistic, y: Statistic, reference: Reference, power: PowerContext): CheckFinding {
  return summedCovarianceFinding(samples, [[x, y]], reference, power);
}

/** Σ_j Cov(X_j, Y_j) against the reference; the natural scale is Σ_j √(E|X_j − EX_j|² E|Y_j − EY_j|²). */
export function summedCovarianceFinding(
  samples: FluctuationSamples,
  pairs: ReadonlyArray<readonly [Statistic, Statistic]>,
  reference: Reference,
  power: PowerContext,
): CheckFinding {
  const columns = pairs.map(([x, y]) => samples.columnsOnCommonSamples([x, y]) as [Float64Array, Float64Array]);
  const c = summedBilinearCovariance(columns);
  const natural = columns.reduce((sum, [cx, cy]) => sum + Math.sqrt(meanSquare(cx) * meanSquare(cy)), 0);
  const allowance = reference.allowanceFactor * natural;
  const evidence = toleranceTest({
    observed: c.estimate,
    expected: reference.expected,
    expectedSource: reference.expectedSource,
    standardError: c.standardError,
    standardErrorMethod: `delta method: standard deviation of the centred products (X − X̄)(Y − Ȳ)${pairs.length > 1 ? ', summed over the pairs,' : ''} over √K, K = ${c.count} independent samples, per component`,
    allowance,
    allowanceReason: `${reference.allowanceReason} (${reference.allowanceFactor.toPrecision(3)} × ${pairs.length > 1 ? 'Σ ' : ''}√(E|X − EX|² E|Y − EY|²) = ${allowance.toPrecision(3)})`,
    sampleCount: c.count,
  });
  return measured(samples, evidence, c.standardError, powerScale(reference.expected, natural), power);
}

/**
 * E[X] against the reference (a mean correction, E Tr f(H) − N∫fρ); X is the statistic minus the
 * given centring (N∫fρ). The allowance factor is relative to the statistic's standard deviation.
 */
export function meanFinding(samples: FluctuationSamples, x: Statistic, centring: Complex, reference: Reference, power: PowerContext): CheckFinding {
  const cx = samples.column(x);
  const n = cx.length / 2;
  let re = 0;
  let im = 0;
  for (let k = 0; k < n; k++) {
    re += cx[2 * k] - centring.re;
    im += cx[2 * k + 1] - centring.im;
  }
  re /= n;
  im /= n;
  let sr = 0;
  let si = 0;
  for (let k = 0; k < n; k++) {
    sr += (cx[2 * k] - centring.re - re) ** 2;
    si += (cx[2 * k + 1] - centring.im - im) ** 2;
  }
  const standardError = { re: Math.sqrt(sr / (n - 1) / n), im: Math.sqrt(si / (n - 1) / n) };
  const natural = Math.sqrt((sr + si) / (n - 1));
  const allowance = reference.allowanceFactor * natural;
  const evidence = toleranceTest({
    observed: { re, im },
    expected: reference.expected,
    expectedSource: reference.expectedSource,
    standardError,
    standardErrorMethod: `sample standard deviation / √K over K = ${n} independent samples, per component`,
    allowance,
    allowanceReason: `${reference.allowanceReason} (${reference.allowanceFactor.toPrecision(3)} × the statistic's standard deviation = ${allowance.toPrecision(3)})`,
    sampleCount: n,
  });
  return measured(samples, evidence, standardError, powerScale(reference.expected, natural), power);
}

/**
 * The joint cumulant of a tuple of statistics against 0 (Wick's rule: jointly Gaussian variables
 * have no cumulant of order ≥ 3, so their moments are the pairing sums). `reference.expected` is 0;
 * the allowance factor is relative to the scale of the tuple's moment, Π_i √E|X_i − EX_i|².
 */
export function cumulantFinding(samples: FluctuationSamples, tuple: readonly Statistic[], reference: Reference, power: PowerContext): CheckFinding {
  const columns = samples.columnsOnCommonSamples(tuple);
  const k = jointCumulant(columns);
  const natural = columns.reduce((p, c) => p * Math.sqrt(meanSquare(c)), 1);
  const allowance = reference.allowanceFactor * natural;
  const evidence = toleranceTest({
    observed: k.estimate,
    expected: reference.expected,
    expectedSource: reference.expectedSource,
    standardError: k.standardError,
    standardErrorMethod: `delete-one jackknife over K = ${k.count} independent samples (Efron and Stein 1981), per component`,
    allowance,
    allowanceReason: `${reference.allowanceReason} (${reference.allowanceFactor.toPrecision(3)} × Π √E|X_i − EX_i|² = ${allowance.toPrecision(3)})`,
    sampleCount: k.count,
  });
  return measured(samples, evidence, k.standardError, natural, power);
}

/** Lag-1 autocorrelation of Re X in sample order against −1/K (independent samples). */
export function independenceFinding(samples: FluctuationSamples, x: Statistic, power: PowerContext): CheckFinding {
  const cx = samples.column(x);
  const re = new Float64Array(cx.length / 2).map((_, k) => cx[2 * k]);
  const r = lagOneAutocorrelation(re);
  const evidence = toleranceTest({
    observed: r.estimate,
    expected: r.expectedUnderIndependence,
    expectedSource:
      'independent samples: the lag-1 autocorrelation r1 of a white-noise series has mean −1/K and standard deviation 1/√K (Bartlett 1946, J. Roy. Statist. Soc. Suppl. 8; Anderson 1942, Ann. Math. Statist. 13)',
    standardError: r.standardError,
    standardErrorMethod: `1/√K under independence, K = ${r.count} samples in the order they were produced`,
    allowance: 0,
    allowanceReason: 'none: the white-noise band is exact to O(1/K) for any law with a finite variance',
    sampleCount: r.count,
  });
  return measured(samples, evidence, r.standardError, 1, power);
}
