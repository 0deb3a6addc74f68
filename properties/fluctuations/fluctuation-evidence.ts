import type { CheckFinding } from '../../harness/check-group.js';
import { complexMean } from '../../harness/estimators/bilinear-covariance.js';
import { estimateAutocorrelation, type StreamingAutocorrelation } from '../../harness/estimators/streaming-autocorrelation.js';
import { covarianceNaturalScale, estimateCovariance, type StreamingCovariance } from '../../harness/estimators/streaming-bilinear-covariance.js';
import { cumulantNaturalScale, estimateCumulant, type StreamingCumulant } from '../../harness/estimators/streaming-joint-cumulant.js';
import { estimateMean, type StreamingMean } from '../../harness/estimators/streaming-mean.js';
import { abs, type Complex } from '../../harness/numeric/complex.js';
import type { Quantity, StatisticalEvidence } from '../../harness/evidence.js';
import { toleranceTest } from '../../harness/tolerance-test.js';
import { detectableRelativeError, type PowerContext } from './detection-power.js';
import type { Estimand } from './estimand.js';
import type { TallyView } from './fluctuation-tally.js';

/** The reference a check is held against, and its finite-N allowance in units of the statistic's size. */
export interface Reference {
  readonly expected: Complex;
  readonly expectedSource: string;
  /** Allowance = allowanceFactor × the natural scale (√(E|X − EX|²·E|Y − EY|²) for a covariance). */
  readonly allowanceFactor: number;
  readonly allowanceReason: string;
}

/** E|X − EX|², estimated from a column of samples (complex interleaved): the natural size of a statistic's covariances. */
export function meanSquare(x: Float64Array): number {
  const n = x.length / 2;
  const [re, im] = complexMean(x);
  let s = 0;
  for (let k = 0; k < n; k++) s += (x[2 * k] - re) ** 2 + (x[2 * k + 1] - im) ** 2;
  return s / (n - 1);
}

/** A measured finding with its power statement. */
function measured(tally: TallyView, evidence: StatisticalEvidence, standardError: Quantity, scale: number, power: PowerContext): CheckFinding {
  return {
    state: 'measured',
    path: tally.path,
    evidence: { ...evidence, detectableRelativeError: detectableRelativeError(evidence.allowance, standardError, scale, power) },
  };
}

/** Scale for the power statement: |expected| unless that is small against the natural size. */
function powerScale(expected: Complex, natural: number): number {
  const e = abs(expected);
  return e >= 0.1 * natural ? e : natural;
}

/**
 * Σ_j Cov(X_j, Y_j) (bilinear) over the samples the pairs are observed on, against the reference.
 * The allowance is relative to Σ_j √(E|X_j − EX_j|² E|Y_j − EY_j|²) as estimated from the same
 * samples (a deviation of the variance itself changes it by a factor 1 + O(allowanceFactor) only).
 */
export function summedCovarianceFinding(tally: TallyView, estimand: Estimand & { kind: 'covariance' }, reference: Reference, power: PowerContext): CheckFinding {
  const state = tally.state<StreamingCovariance>(estimand);
  const c = estimateCovariance(state);
  const natural = covarianceNaturalScale(state);
  const allowance = reference.allowanceFactor * natural;
  const several = estimand.pairs.length > 1;
  const evidence = toleranceTest({
    observed: c.estimate,
    expected: reference.expected,
    expectedSource: reference.expectedSource,
    standardError: c.standardError,
    standardErrorMethod: `delta method over the streamed co-moments of (X, Y, XY)${several ? ' of every pair' : ''}: the standard deviation of the centred products${several ? ', summed over the pairs,' : ''} over √K, K = ${c.count} independent samples, per component`,
    allowance,
    allowanceReason: `${reference.allowanceReason} (${reference.allowanceFactor.toPrecision(3)} × ${several ? 'Σ ' : ''}√(E|X − EX|² E|Y − EY|²) = ${allowance.toPrecision(3)})`,
    sampleCount: c.count,
  });
  return measured(tally, evidence, c.standardError, powerScale(reference.expected, natural), power);
}

/**
 * E[X] − c against the reference (a mean correction, E Tr f(H) − N∫fρ, with c = N∫fρ). The
 * allowance factor is relative to the statistic's standard deviation.
 */
export function meanFinding(tally: TallyView, estimand: Estimand & { kind: 'mean' }, reference: Reference, power: PowerContext): CheckFinding {
  const m = estimateMean(tally.state<StreamingMean>(estimand));
  const allowance = reference.allowanceFactor * m.naturalSize;
  const evidence = toleranceTest({
    observed: m.estimate,
    expected: reference.expected,
    expectedSource: reference.expectedSource,
    standardError: m.standardError,
    standardErrorMethod: `sample standard deviation / √K over K = ${m.count} independent samples, per component`,
    allowance,
    allowanceReason: `${reference.allowanceReason} (${reference.allowanceFactor.toPrecision(3)} × the statistic's standard deviation = ${allowance.toPrecision(3)})`,
    sampleCount: m.count,
  });
  return measured(tally, evidence, m.standardError, powerScale(reference.expected, m.naturalSize), power);
}

/**
 * The joint cumulant of a tuple of statistics against 0 (Wick's rule: jointly Gaussian variables
 * have no cumulant of order ≥ 3, so their moments are the pairing sums). `reference.expected` is 0;
 * the allowance factor is relative to the scale of the tuple's moment, Π_i √E|X_i − EX_i|².
 */
export function cumulantFinding(tally: TallyView, estimand: Estimand & { kind: 'cumulant' }, reference: Reference, power: PowerContext): CheckFinding {
  const state = tally.state<StreamingCumulant>(estimand);
  const k = estimateCumulant(state);
  const natural = cumulantNaturalScale(state);
  const allowance = reference.allowanceFactor * natural;
  const evidence = toleranceTest({
    observed: k.estimate,
    expected: reference.expected,
    expectedSource: reference.expectedSource,
    standardError: k.standardError,
    standardErrorMethod: `delta method over the streamed co-moments of the subset products, K = ${k.count} independent samples (first-order equal to the delete-one jackknife, Efron 1982, The Jackknife, the Bootstrap and Other Resampling Plans, SIAM, ch. 6, from memory), per component`,
    allowance,
    allowanceReason: `${reference.allowanceReason} (${reference.allowanceFactor.toPrecision(3)} × Π √E|X_i − EX_i|² = ${allowance.toPrecision(3)})`,
    sampleCount: k.count,
  });
  return measured(tally, evidence, k.standardError, natural, power);
}

/** Lag-1 autocorrelation of Re X in sample order against −1/K (independent samples). */
export function independenceFinding(tally: TallyView, estimand: Estimand & { kind: 'autocorrelation' }, power: PowerContext): CheckFinding {
  const r = estimateAutocorrelation(tally.state<StreamingAutocorrelation>(estimand));
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
  return measured(tally, evidence, r.standardError, 1, power);
}
