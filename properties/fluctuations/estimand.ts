import type { Complex } from '../../harness/numeric/complex.js';
import type { Statistic, Tier } from './statistic-book.js';

/**
 * What a fluctuation check estimates from the samples, declared when the check is planned so that
 * the samples can be reduced as they come (fluctuation-tally.ts) instead of kept:
 * - covariance: Σ_j Cov(X_j, Y_j), bilinear;
 * - mean: E[X] − c for a fixed centring c;
 * - cumulant: κ(X_1, …, X_n);
 * - autocorrelation: the lag-1 autocorrelation of Re X in sample order;
 * - values: Re X on the first `limit` samples (for a picture);
 * - worst-unit-deviation: the sample where X/N is farthest from 1 (the empty chain's ⟨I⟩).
 */
export type Estimand =
  | { readonly kind: 'covariance'; readonly pairs: ReadonlyArray<readonly [Statistic, Statistic]> }
  | { readonly kind: 'mean'; readonly statistic: Statistic; readonly centring: Complex }
  | { readonly kind: 'cumulant'; readonly tuple: readonly Statistic[] }
  | { readonly kind: 'autocorrelation'; readonly statistic: Statistic }
  | { readonly kind: 'values'; readonly statistic: Statistic; readonly limit: number }
  | { readonly kind: 'worst-unit-deviation'; readonly statistic: Statistic; readonly size: number };

/** The statistics an estimand observes on each sample, in the order of its state's layout. */
export function statisticsOf(estimand: Estimand): readonly Statistic[] {
  switch (estimand.kind) {
    case 'covariance':
      return estimand.pairs.flat();
    case 'cumulant':
      return estimand.tuple;
    default:
      return [estimand.statistic];
  }
}

/** 'weighted' when any of its statistics needs eigenvectors: it is then observed on the weighted prefix only. */
export function tierOf(estimand: Estimand): Tier {
  return statisticsOf(estimand).some((s) => s.tier === 'weighted') ? 'weighted' : 'spectral';
}

/**
 * A statistic's value on one sample, into out[at], out[at + 1] (Re, Im), from the sample's chain
 * values (complex interleaved, Tr scale).
 */
export function statisticValueInto(statistic: Statistic, chains: Float64Array, out: Float64Array, at: number): void {
  let re = 0;
  let im = 0;
  for (const { chain, coefficient, conjugate } of statistic.terms) {
    const xr = chains[2 * chain];
    const xi = (conjugate === true ? -1 : 1) * chains[2 * chain + 1];
    re += coefficient.re * xr - coefficient.im * xi;
    im += coefficient.re * xi + coefficient.im * xr;
  }
  out[at] = re;
  out[at + 1] = im;
}
