import type { Complex } from '../numeric/complex.js';
import { addObservation, combineShiftedCoMoments, complexVariance, countOfAtLeast, covarianceMatrixEntry, emptyCoMoments, type ShiftedCoMoments } from './co-moment-accumulator.js';

/**
 * E[X − c] for a complex statistic X and a fixed centring c (a mean correction against N∫fρ, say),
 * in constant memory and mergeable across blocks of samples. Plain data: the co-moments of
 * (Re, Im) of u = x − c, with the centring (Re c, Im c) as the shifts, which also keeps the moments
 * of O(N·m) traces from cancelling.
 */
export type StreamingMean = ShiftedCoMoments;

/** The mean with its standard error per component and the statistic's size. */
export interface MeanEstimate {
  /** The sample mean of X − c. */
  readonly estimate: Complex;
  /** s/√K per component, s² the unbiased sample variance. */
  readonly standardError: Complex;
  /** √(s²_re + s²_im) = √(E|X − EX|²), the statistic's standard deviation. */
  readonly naturalSize: number;
  readonly count: number;
}

/** An empty state for X − c. */
export function streamingMean(centring: Complex): StreamingMean {
  return { shifts: Float64Array.of(centring.re, centring.im), moments: emptyCoMoments(2) };
}

/** Adds one sample x = re + i·im, in place. */
export function observeMean(state: StreamingMean, re: number, im: number): void {
  addObservation(state.moments, [re - state.shifts[0], im - state.shifts[1]]);
}

/** The state of `left`'s samples followed by `right`'s (a pure function; see combineShiftedCoMoments). */
export const combineMean: (left: StreamingMean, right: StreamingMean) => StreamingMean = combineShiftedCoMoments;

/**
 * What meanFinding computes from a column: the sample mean of X − c, s/√K per component and
 * √(s²_re + s²_im), here from Welford's running moments (B. P. Welford, 1962, Technometrics 4(3),
 * 419–420) instead of two passes.
 */
export function estimateMean(state: StreamingMean): MeanEstimate {
  const { moments } = state;
  const n = countOfAtLeast(moments, 2, 'estimateMean');
  return {
    estimate: { re: moments.mean[0], im: moments.mean[1] },
    standardError: { re: Math.sqrt(covarianceMatrixEntry(moments, 0, 0) / n), im: Math.sqrt(covarianceMatrixEntry(moments, 1, 1) / n) },
    naturalSize: Math.sqrt(complexVariance(moments, 0)),
    count: n,
  };
}
