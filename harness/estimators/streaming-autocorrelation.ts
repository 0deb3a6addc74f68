import type { AutocorrelationEstimate } from './lag-one-autocorrelation.js';

/**
 * The lag-1 autocorrelation of a real series in sample order, in constant memory and mergeable
 * across consecutive blocks of the series. Plain data: the values are taken about a fixed shift s,
 * u_t = x_t − s, and the state keeps their count, first and last values, Σu, Σu² and the lagged sum
 * Σ u_t u_{t+1} within the block. Joining block A to the block B that follows it adds the one
 * product that straddles them, last_A · first_B, so blocks must be combined in series order.
 */
export interface StreamingAutocorrelation {
  readonly shift: number;
  count: number;
  /** u of the block's first and last samples (0 while empty). */
  first: number;
  last: number;
  sum: number;
  sumOfSquares: number;
  laggedSum: number;
}

/** An empty state; `shift` should be near the series' mean (a pilot value) for precision. */
export function streamingAutocorrelation(shift: number): StreamingAutocorrelation {
  return { shift, count: 0, first: 0, last: 0, sum: 0, sumOfSquares: 0, laggedSum: 0 };
}

/** Appends the next value of the series, in place. */
export function observeAutocorrelation(state: StreamingAutocorrelation, x: number): void {
  const u = x - state.shift;
  if (state.count === 0) state.first = u;
  else state.laggedSum += state.last * u;
  state.last = u;
  state.count++;
  state.sum += u;
  state.sumOfSquares += u * u;
}

/** The state of the series `left` followed directly by the series `right` (a pure function). */
export function combineAutocorrelation(left: StreamingAutocorrelation, right: StreamingAutocorrelation): StreamingAutocorrelation {
  if (!Object.is(left.shift, right.shift)) throw new RangeError('combineAutocorrelation: the two states were built with different shifts');
  if (right.count === 0) return { ...left };
  if (left.count === 0) return { ...right };
  return {
    shift: left.shift,
    count: left.count + right.count,
    first: left.first,
    last: right.last,
    sum: left.sum + right.sum,
    sumOfSquares: left.sumOfSquares + right.sumOfSquares,
    laggedSum: left.laggedSum + right.laggedSum + left.last * right.first,
  };
}

/**
 * r1 = Σ_{t<K}(x_t − x̄)(x_{t+1} − x̄) / Σ_t (x_t − x̄)², as lagOneAutocorrelation computes it, with
 * what independence predicts (−1/K and 1/√K; Bartlett 1946 and Anderson 1942 as cited there).
 *
 * Method: with S = Σu, Q = Σu², L = Σ_{t<K} u_t u_{t+1} and ū = S/K, the numerator expands to
 * L − ū(S − u_K) − ū(S − u_1) + (K − 1)ū² and the denominator to Q − Sū (common practice: the
 * sums about a shift near the mean do not cancel badly; Chan, Golub and LeVeque 1983, Amer.
 * Statist. 37(3), 242–247, on shifted data).
 */
export function estimateAutocorrelation(state: StreamingAutocorrelation): AutocorrelationEstimate {
  const n = state.count;
  if (n < 3) throw new RangeError('estimateAutocorrelation: at least three samples are needed');
  const mean = state.sum / n;
  const lagged = state.laggedSum - mean * (2 * state.sum - state.first - state.last) + (n - 1) * mean * mean;
  const total = state.sumOfSquares - state.sum * mean;
  return { estimate: total > 0 ? lagged / total : NaN, expectedUnderIndependence: -1 / n, standardError: Math.sqrt(1 / n), count: n };
}
