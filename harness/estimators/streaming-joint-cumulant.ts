import type { Complex } from '../numeric/complex.js';
import { addObservation, combineShiftedCoMoments, complexVariance, countOfAtLeast, emptyCoMoments, type ShiftedCoMoments } from './co-moment-accumulator.js';
import { holomorphicDeltaMethodStandardError } from './delta-method.js';
import { MAX_CUMULANT_ORDER, setPartitions, type CumulantEstimate } from './joint-cumulant.js';

/**
 * The joint cumulant κ(X1, …, Xn) (bilinear, no conjugation; n ≤ 8, columns may repeat) of complex
 * statistics observed together on each sample, in constant memory and mergeable across blocks of
 * samples. Plain data.
 *
 * Per sample the values are taken about fixed shifts, u_i = x_i − s_i, and the features are Re and
 * Im of the product P_B = Π_{i∈B} u_i for every non-empty subset B of the columns (2ⁿ − 1 complex,
 * subset B as a bitmask at features 2(B − 1), 2(B − 1) + 1), in one co-moment accumulator. Their
 * means are the plug-in moments M_B; the co-moments feed the standard error. The shifts are s_i per
 * column, complex interleaved (length 2n).
 */
export type StreamingCumulant = ShiftedCoMoments;

/** An empty state for the cumulant of `order` columns taken about `shifts` (complex interleaved). */
export function streamingCumulant(order: number, shifts: Float64Array): StreamingCumulant {
  if (!Number.isInteger(order) || order < 1 || order > MAX_CUMULANT_ORDER) {
    throw new RangeError(`streamingCumulant: order must be 1 to ${MAX_CUMULANT_ORDER}, got ${order}`);
  }
  if (shifts.length !== 2 * order) throw new RangeError(`streamingCumulant: order ${order} needs ${2 * order} shift components, got ${shifts.length}`);
  return { shifts: Float64Array.from(shifts), moments: emptyCoMoments(2 * ((1 << order) - 1)) };
}

/** Adds one sample, in place: `values` holds x_1 … x_n complex interleaved (length 2n). */
export function observeCumulant(state: StreamingCumulant, values: ArrayLike<number>): void {
  const { shifts } = state;
  const order = shifts.length / 2;
  if (values.length !== shifts.length) throw new RangeError(`observeCumulant: ${values.length} values for order ${order}`);
  const subsets = 1 << order;
  // products[2B], products[2B + 1]: Π_{i∈B} u_i, built from B without its lowest element (B = 0 gives 1).
  const products = new Float64Array(2 * subsets);
  products[0] = 1;
  for (let b = 1; b < subsets; b++) {
    const low = 31 - Math.clz32(b & -b);
    const rest = 2 * (b & (b - 1));
    const ur = values[2 * low] - shifts[2 * low];
    const ui = values[2 * low + 1] - shifts[2 * low + 1];
    products[2 * b] = products[rest] * ur - products[rest + 1] * ui;
    products[2 * b + 1] = products[rest] * ui + products[rest + 1] * ur;
  }
  addObservation(state.moments, products.subarray(2));
}

/** The state of `left`'s samples followed by `right`'s (a pure function; see combineShiftedCoMoments). */
export const combineCumulant: (left: StreamingCumulant, right: StreamingCumulant) => StreamingCumulant = combineShiftedCoMoments;

/**
 * The plug-in joint cumulant with its delta-method standard error per component.
 *
 * Method: κ̂ = Σ_π (−1)^{|π|−1}(|π| − 1)! Π_{B∈π} M_B over the set partitions π of the columns (the
 * Möbius inversion of moments to cumulants; P. McCullagh, 1987, Tensor Methods in Statistics,
 * Chapman and Hall, ch. 2), the same plug-in estimate as jointCumulant: the cumulant of the
 * empirical distribution is unchanged by a shift of any column when n ≥ 2, so moments about the
 * shifts give the value that moments about the sample means give (up to rounding). For n = 1 the
 * estimate is the mean itself, M_{1} + s_1.
 *
 * κ̂ is a polynomial in the complex M_B, hence holomorphic, with ∂κ̂/∂M_B = Σ_{π∋B} coeff(π)
 * Π_{B'∈π, B'≠B} M_{B'}; the delta method over the real features (delta-method.ts; van der Vaart
 * 1998, ch. 3) gives the standard errors of Re κ̂ and Im κ̂. To first order this is the variance the
 * delete-one jackknife of jointCumulant estimates (B. Efron, 1982, The Jackknife, the Bootstrap and
 * Other Resampling Plans, SIAM, ch. 6, from memory: for a smooth function of means the jackknife,
 * the infinitesimal jackknife and the delta method agree to first order). It needs finite moments
 * of order 2n of the statistics.
 */
export function estimateCumulant(state: StreamingCumulant): CumulantEstimate {
  const { moments, shifts } = state;
  const n = countOfAtLeast(moments, 2, 'estimateCumulant');
  const order = shifts.length / 2;
  const m = moments.mean;
  // Feature 2(B − 1) holds Re M_B.
  const at = (b: number) => 2 * (b - 1);
  const partials = new Float64Array(m.length);
  let re = 0;
  let im = 0;
  // coefficient × Π_{B∈π, B≠skip} M_B (skip = 0 keeps every block).
  const blockProduct = (blocks: readonly number[], coefficient: number, skip: number): Complex => {
    let pr = coefficient;
    let pi = 0;
    for (const b of blocks) {
      if (b === skip) continue;
      const mr = m[at(b)];
      const mi = m[at(b) + 1];
      const t = pr * mr - pi * mi;
      pi = pr * mi + pi * mr;
      pr = t;
    }
    return { re: pr, im: pi };
  };
  for (const { blocks, coefficient } of setPartitions(order)) {
    const term = blockProduct(blocks, coefficient, 0);
    re += term.re;
    im += term.im;
    for (const b of blocks) {
      const partial = blockProduct(blocks, coefficient, b);
      partials[at(b)] += partial.re;
      partials[at(b) + 1] += partial.im;
    }
  }
  if (order === 1) {
    re += shifts[0];
    im += shifts[1];
  }
  return { estimate: { re, im }, standardError: holomorphicDeltaMethodStandardError(moments, partials), count: n };
}

/**
 * The natural scale of the tuple's moment, Π_i √(E|X_i − EX_i|²) with unbiased variances (what
 * cumulantFinding builds from meanSquare), from the singleton features of the same state.
 */
export function cumulantNaturalScale(state: StreamingCumulant): number {
  let scale = 1;
  for (let i = 0; i < state.shifts.length / 2; i++) scale *= Math.sqrt(complexVariance(state.moments, 2 * ((1 << i) - 1)));
  return scale;
}

