import { combineAutocorrelation, observeAutocorrelation, streamingAutocorrelation, type StreamingAutocorrelation } from '../../harness/estimators/streaming-autocorrelation.js';
import { combineCovariance, observeCovariance, streamingCovariance, type StreamingCovariance } from '../../harness/estimators/streaming-bilinear-covariance.js';
import { combineCumulant, observeCumulant, streamingCumulant, type StreamingCumulant } from '../../harness/estimators/streaming-joint-cumulant.js';
import { combineMean, observeMean, streamingMean, type StreamingMean } from '../../harness/estimators/streaming-mean.js';
import { statisticsOf, statisticValueInto, tierOf, type Estimand } from './estimand.js';
import type { Statistic } from './statistic-book.js';

/** The first values of Re X, up to a fixed number (memory does not grow past it). */
export interface LeadingValues {
  readonly count: number;
  readonly values: Float64Array;
}

/** The sample where X/N is farthest from 1 so far (`at` = −1 before any). */
export interface WorstDeviation {
  readonly deviation: number;
  readonly value: readonly [number, number];
  readonly at: number;
}

export type EstimandState = StreamingCovariance | StreamingMean | StreamingCumulant | StreamingAutocorrelation | LeadingValues | WorstDeviation;

/**
 * The reduced samples of a fluctuation group: one streaming state per estimand, in the order of the
 * group's estimand list, and the path the statistics came by. Plain data and mergeable, so a block
 * of samples reduces to one of these anywhere, and blocks combine in block order; memory does not
 * grow with the number of samples.
 */
export interface FluctuationTally {
  readonly path: string;
  readonly origin: 'sample_statistics' | 'sampler';
  readonly states: readonly EstimandState[];
}

/**
 * Empty states. `pilot(i)` gives estimand i's statistics on one pilot sample (Re, Im per statistic,
 * in statisticsOf order): the fixed shifts that keep the moments of O(N) traces from cancelling;
 * any fixed shift leaves covariances and cumulants unchanged.
 */
export function emptyStates(estimands: readonly Estimand[], pilot: (index: number) => Float64Array): EstimandState[] {
  return estimands.map((e, i): EstimandState => {
    switch (e.kind) {
      case 'covariance':
        return streamingCovariance(e.pairs.length, pilot(i));
      case 'mean':
        return streamingMean(e.centring);
      case 'cumulant':
        return streamingCumulant(e.tuple.length, pilot(i));
      case 'autocorrelation':
        return streamingAutocorrelation(pilot(i)[0]);
      case 'values':
        return { count: 0, values: new Float64Array(e.limit) };
      case 'worst-unit-deviation':
        return { deviation: 0, value: [1, 0], at: -1 };
    }
  });
}

/**
 * What a sample gives each estimand: its statistics in the order of its state's layout, and whether
 * only the weighted samples carry them. Worked out once per block, not per sample.
 */
export interface EstimandLayout {
  readonly statistics: readonly Statistic[];
  readonly weightedOnly: boolean;
}

export function layoutsOf(estimands: readonly Estimand[]): EstimandLayout[] {
  return estimands.map((e) => ({ statistics: statisticsOf(e), weightedOnly: tierOf(e) === 'weighted' }));
}

/** The values of an estimand's statistics on one sample (Re, Im each), from the sample's chain values. */
export function estimandValues(statistics: readonly Statistic[], chains: Float64Array): Float64Array {
  const out = new Float64Array(2 * statistics.length);
  statistics.forEach((s, i) => statisticValueInto(s, chains, out, 2 * i));
  return out;
}

/**
 * Adds sample `index` to every state whose estimand it carries (weighted estimands only on the
 * weighted prefix); returns the states, updated in place where the state allows.
 */
export function observeSample(
  estimands: readonly Estimand[],
  layouts: readonly EstimandLayout[],
  states: EstimandState[],
  chains: Float64Array,
  weighted: boolean,
  index: number,
): void {
  estimands.forEach((e, i) => {
    if (!weighted && layouts[i].weightedOnly) return;
    const values = estimandValues(layouts[i].statistics, chains);
    const state = states[i];
    switch (e.kind) {
      case 'covariance':
        return observeCovariance(state as StreamingCovariance, values);
      case 'mean':
        return observeMean(state as StreamingMean, values[0], values[1]);
      case 'cumulant':
        return observeCumulant(state as StreamingCumulant, values);
      case 'autocorrelation':
        return observeAutocorrelation(state as StreamingAutocorrelation, values[0]);
      case 'values': {
        const s = state as LeadingValues;
        if (s.count < s.values.length) {
          s.values[s.count] = values[0];
          states[i] = { count: s.count + 1, values: s.values };
        }
        return;
      }
      case 'worst-unit-deviation': {
        const s = state as WorstDeviation;
        const re = values[0] / e.size;
        const im = values[1] / e.size;
        const deviation = Math.hypot(re - 1, im);
        if (!(deviation <= s.deviation)) states[i] = { deviation, value: [re, im], at: index };
      }
    }
  });
}

/** The states of `left`'s samples followed by `right`'s (pure: the same inputs give the same bits). */
export function combineStates(estimands: readonly Estimand[], left: readonly EstimandState[], right: readonly EstimandState[]): EstimandState[] {
  return estimands.map((e, i): EstimandState => {
    const l = left[i];
    const r = right[i];
    switch (e.kind) {
      case 'covariance':
        return combineCovariance(l as StreamingCovariance, r as StreamingCovariance);
      case 'mean':
        return combineMean(l as StreamingMean, r as StreamingMean);
      case 'cumulant':
        return combineCumulant(l as StreamingCumulant, r as StreamingCumulant);
      case 'autocorrelation':
        return combineAutocorrelation(l as StreamingAutocorrelation, r as StreamingAutocorrelation);
      case 'values': {
        const a = l as LeadingValues;
        const b = r as LeadingValues;
        const values = a.values.slice();
        const taken = Math.min(b.count, values.length - a.count);
        values.set(b.values.subarray(0, taken), a.count);
        return { count: a.count + taken, values };
      }
      case 'worst-unit-deviation': {
        const a = l as WorstDeviation;
        const b = r as WorstDeviation;
        return b.at >= 0 && !(b.deviation <= a.deviation) ? b : a;
      }
    }
  });
}

/** Looks an estimand's state up in a tally, by the estimand object the check declared. */
export class TallyView {
  private readonly index: Map<Estimand, number>;

  constructor(
    estimands: readonly Estimand[],
    private readonly tally: FluctuationTally,
  ) {
    this.index = new Map(estimands.map((e, i) => [e, i]));
  }

  get path(): string {
    return this.tally.path;
  }

  get origin(): FluctuationTally['origin'] {
    return this.tally.origin;
  }

  state<S extends EstimandState>(estimand: Estimand): S {
    const at = this.index.get(estimand);
    if (at === undefined) throw new Error('a fluctuation check asked for an estimand it did not declare');
    return this.tally.states[at] as S;
  }
}
