import { addObservation, combineShiftedCoMoments, complexVariance, countOfAtLeast, emptyCoMoments, type ShiftedCoMoments } from './co-moment-accumulator.js';
import type { CovarianceEstimate } from './bilinear-covariance.js';
import { holomorphicDeltaMethodStandardError } from './delta-method.js';

/**
 * Σ_j Cov(X_j, Y_j) (bilinear, no conjugation) over J pairs of complex statistics observed together
 * on each sample, in constant memory and mergeable across blocks of samples. Plain data.
 *
 * Per sample, pair j contributes the shifted values u_j = x_j − s_j, v_j = y_j − t_j and their
 * product u_j v_j; the features (Re, Im of u_j, v_j, u_j v_j for each j: 6J reals, pair j's at 6j
 * in that order) go into one co-moment accumulator. The shifts (Re s_j, Im s_j, Re t_j, Im t_j at
 * 4j … 4j + 3) are fixed for the life of the state: a pilot value, or the centring a reference
 * supplies. A covariance does not depend on them, but the statistics are traces of order N·m with
 * O(1) fluctuations, whose raw products would cancel badly.
 */
export type StreamingCovariance = ShiftedCoMoments;

const FEATURES_PER_PAIR = 6;

/** An empty state for `pairCount` pairs with the given shifts (layout as `StreamingCovariance.shifts`). */
export function streamingCovariance(pairCount: number, shifts: Float64Array): StreamingCovariance {
  if (!Number.isInteger(pairCount) || pairCount < 1) throw new RangeError(`streamingCovariance: pairCount must be a positive integer, got ${pairCount}`);
  if (shifts.length !== 4 * pairCount) throw new RangeError(`streamingCovariance: ${pairCount} pairs need ${4 * pairCount} shift components, got ${shifts.length}`);
  return { shifts: Float64Array.from(shifts), moments: emptyCoMoments(FEATURES_PER_PAIR * pairCount) };
}

/**
 * Adds one sample, in place: `values` holds x_j and y_j of every pair complex interleaved, in the
 * layout of the shifts (Re x_j, Im x_j, Re y_j, Im y_j at 4j … 4j + 3).
 */
export function observeCovariance(state: StreamingCovariance, values: ArrayLike<number>): void {
  const { shifts } = state;
  if (values.length !== shifts.length) throw new RangeError(`observeCovariance: ${values.length} values for ${shifts.length / 4} pairs`);
  const row = new Float64Array(state.moments.mean.length);
  for (let j = 0; j < shifts.length / 4; j++) {
    const ur = values[4 * j] - shifts[4 * j];
    const ui = values[4 * j + 1] - shifts[4 * j + 1];
    const vr = values[4 * j + 2] - shifts[4 * j + 2];
    const vi = values[4 * j + 3] - shifts[4 * j + 3];
    const f = FEATURES_PER_PAIR * j;
    row[f] = ur;
    row[f + 1] = ui;
    row[f + 2] = vr;
    row[f + 3] = vi;
    row[f + 4] = ur * vr - ui * vi;
    row[f + 5] = ur * vi + ui * vr;
  }
  addObservation(state.moments, row);
}

/** The state of `left`'s samples followed by `right`'s (a pure function; see combineShiftedCoMoments). */
export const combineCovariance: (left: StreamingCovariance, right: StreamingCovariance) => StreamingCovariance = combineShiftedCoMoments;

/**
 * Σ_j Cov(X_j, Y_j) with the delta-method standard error of each component.
 *
 * Method: with plug-in means m of the features, ĉ = (K/(K − 1)) Σ_j (m_{uv,j} − m_{u,j} m_{v,j}),
 * which is the unbiased (1/(K − 1)) sample covariance Σ_j (1/(K − 1)) Σ_k (x_jk − x̄_j)(y_jk − ȳ_j)
 * of bilinearCovariance, written in moments about the shifts. ĉ is holomorphic in the complex means,
 * with ∂ĉ/∂m_uv = K/(K − 1), ∂ĉ/∂m_u = −(K/(K − 1)) m_v, ∂ĉ/∂m_v = −(K/(K − 1)) m_u, and the delta
 * method (van der Vaart 1998, ch. 3; see delta-method.ts) gives Var ĉ ≈ gᵀ Σ g / K. Here gᵀ x_k is,
 * up to a constant, the centred product (x_k − x̄)(y_k − ȳ) summed over the pairs, so the standard
 * error is the column-based one (sd of the summed centred products over √K) times K/(K − 1), the
 * factor the estimate itself carries.
 */
export function estimateCovariance(state: StreamingCovariance): CovarianceEstimate {
  const { moments } = state;
  const n = countOfAtLeast(moments, 2, 'estimateCovariance');
  const unbiased = n / (n - 1);
  const m = moments.mean;
  const partials = new Float64Array(m.length);
  let re = 0;
  let im = 0;
  for (let f = 0; f < m.length; f += FEATURES_PER_PAIR) {
    const [ur, ui, vr, vi, pr, pi] = [m[f], m[f + 1], m[f + 2], m[f + 3], m[f + 4], m[f + 5]];
    re += pr - (ur * vr - ui * vi);
    im += pi - (ur * vi + ui * vr);
    partials[f] = -unbiased * vr;
    partials[f + 1] = -unbiased * vi;
    partials[f + 2] = -unbiased * ur;
    partials[f + 3] = -unbiased * ui;
    partials[f + 4] = unbiased;
  }
  return {
    estimate: { re: re * unbiased, im: im * unbiased },
    standardError: holomorphicDeltaMethodStandardError(moments, partials),
    count: n,
  };
}

/**
 * The natural scale Σ_j √(E|X_j − EX_j|² E|Y_j − EY_j|²), with unbiased variances (what
 * summedCovarianceFinding builds from meanSquare, here from the same state).
 */
export function covarianceNaturalScale(state: StreamingCovariance): number {
  let scale = 0;
  for (let f = 0; f < state.moments.mean.length; f += FEATURES_PER_PAIR) {
    scale += Math.sqrt(complexVariance(state.moments, f) * complexVariance(state.moments, f + 2));
  }
  return scale;
}

