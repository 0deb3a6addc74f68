/**
 * The sufficient state for the means and covariances of a real vector of width d observed on n
 * samples, in constant memory, mergeable across disjoint blocks of samples.
 *
 * The state is plain data (a count and two Float64Arrays), so it survives a structured clone to a
 * worker thread and a codec that writes numbers and Float64Arrays.
 */
export interface CoMoments {
  /** Samples observed, n. */
  count: number;
  /** The sample mean x̄ (length d). */
  readonly mean: Float64Array;
  /**
   * The co-moment matrix C = Σ_k (x_k − x̄)(x_k − x̄)ᵀ, upper triangle with the diagonal in packed
   * column-major order: C_ij (i ≤ j) at i + j(j + 1)/2, length d(d + 1)/2 (LAPACK's packed
   * storage, uplo = 'U'; E. Anderson et al., 1999, LAPACK Users' Guide, 3rd ed., SIAM; section
   * from memory).
   */
  readonly comoment: Float64Array;
}

/** The state of no samples of a vector of width d. */
export function emptyCoMoments(width: number): CoMoments {
  if (!Number.isInteger(width) || width < 1) throw new RangeError(`emptyCoMoments: width must be a positive integer, got ${width}`);
  return { count: 0, mean: new Float64Array(width), comoment: new Float64Array((width * (width + 1)) / 2) };
}

/** Position of C_ij in the packed upper triangle (either order of i, j). */
export function packedIndex(i: number, j: number): number {
  return i <= j ? i + (j * (j + 1)) / 2 : j + (i * (i + 1)) / 2;
}

/** C_ij = Σ_k (x_ik − x̄_i)(x_jk − x̄_j). */
export function coMomentEntry(state: CoMoments, i: number, j: number): number {
  return state.comoment[packedIndex(i, j)];
}

/** Scratch for x − x̄ before the update; not part of any state. */
let deviation = new Float64Array(0);

/**
 * Adds one sample `row` (length d) to `state`, in place.
 *
 * Method: with δ = x − x̄ₙ₋₁, x̄ₙ = x̄ₙ₋₁ + δ/n and Cₙ = Cₙ₋₁ + δ (x − x̄ₙ)ᵀ, which never forms a
 * raw sum of squares (B. P. Welford, 1962, "Note on a method for calculating corrected sums of
 * squares and products", Technometrics 4(3), 419–420, doi:10.1080/00401706.1962.10490022).
 */
export function addObservation(state: CoMoments, row: ArrayLike<number>): void {
  const d = state.mean.length;
  if (row.length !== d) throw new RangeError(`addObservation: row of length ${row.length} for width ${d}`);
  if (deviation.length < d) deviation = new Float64Array(d);
  const n = ++state.count;
  const mean = state.mean;
  for (let i = 0; i < d; i++) {
    deviation[i] = row[i] - mean[i];
    mean[i] += deviation[i] / n;
  }
  const c = state.comoment;
  for (let j = 0, column = 0; j < d; column += ++j) {
    const after = row[j] - mean[j];
    for (let i = 0; i <= j; i++) c[column + i] += deviation[i] * after;
  }
}

/**
 * The state of the samples of `left` followed by those of `right`, as a new object (the inputs are
 * not changed). A pure function: the same inputs give the same bits, so a run split into fixed
 * blocks and folded left in block order is reproducible whatever ran each block.
 *
 * Method: with n = nₐ + n_b and δ = x̄_b − x̄ₐ, x̄ = x̄ₐ + δ·n_b/n and C = Cₐ + C_b + δδᵀ·nₐn_b/n —
 * the pairwise updating formula of T. F. Chan, G. H. Golub and R. J. LeVeque, 1979, "Updating
 * formulae and a pairwise algorithm for computing sample variances", Stanford University report
 * STAN-CS-79-773 (also in COMPSTAT 1982, H. Caussinus, P. Ettinger and R. Tomassone, eds.,
 * Physica-Verlag, 30–41, doi:10.1007/978-3-642-51461-6_3), in the multivariate form given for
 * covariances by P. Pébay, 2008, "Formulas for robust, one-pass parallel computation of covariances
 * and arbitrary-order statistical moments", Sandia report SAND2008-6212. An empty side returns a
 * copy of the other exactly.
 */
export function combineCoMoments(left: CoMoments, right: CoMoments): CoMoments {
  const d = left.mean.length;
  if (right.mean.length !== d) throw new RangeError(`combineCoMoments: widths ${d} and ${right.mean.length} differ`);
  if (right.count === 0) return copyCoMoments(left);
  if (left.count === 0) return copyCoMoments(right);
  const n = left.count + right.count;
  const weight = right.count / n;
  const cross = (left.count * right.count) / n;
  const out = emptyCoMoments(d);
  out.count = n;
  const delta = new Float64Array(d);
  for (let i = 0; i < d; i++) {
    delta[i] = right.mean[i] - left.mean[i];
    out.mean[i] = left.mean[i] + delta[i] * weight;
  }
  for (let j = 0, column = 0; j < d; column += ++j) {
    for (let i = 0; i <= j; i++) {
      out.comoment[column + i] = left.comoment[column + i] + right.comoment[column + i] + delta[i] * delta[j] * cross;
    }
  }
  return out;
}

function copyCoMoments(state: CoMoments): CoMoments {
  return { count: state.count, mean: Float64Array.from(state.mean), comoment: Float64Array.from(state.comoment) };
}

/** The unbiased sample covariance of components i and j, C_ij/(n − 1). */
export function covarianceMatrixEntry(state: CoMoments, i: number, j: number): number {
  return coMomentEntry(state, i, j) / (countOfAtLeast(state, 2, 'covarianceMatrixEntry') - 1);
}

/** The standard error of the mean of component i, s/√n with the unbiased sample variance (NaN below two samples). */
export function standardErrorOfMean(state: CoMoments, i: number): number {
  return state.count > 1 ? Math.sqrt(coMomentEntry(state, i, i) / (state.count - 1) / state.count) : NaN;
}

/**
 * E|Z − EZ|² = Var Re Z + Var Im Z (unbiased) of the complex quantity Z whose Re and Im are
 * components `re` and `re + 1`.
 */
export function complexVariance(state: CoMoments, re: number): number {
  return covarianceMatrixEntry(state, re, re) + covarianceMatrixEntry(state, re + 1, re + 1);
}

/**
 * The state of an estimator whose features are functions of values taken about fixed shifts (a
 * pilot value or a centring near the mean): moments about a nearby point do not cancel the way raw
 * moments of O(N·m) traces would (shifted data, common practice; T. F. Chan, G. H. Golub and
 * R. J. LeVeque, 1983, "Algorithms for computing the sample variance: analysis and
 * recommendations", Amer. Statist. 37(3), 242–247).
 */
export interface ShiftedCoMoments {
  readonly shifts: Float64Array;
  readonly moments: CoMoments;
}

/**
 * The state of `left`'s samples followed by `right`'s (a pure function; see combineCoMoments). Two
 * states merge only if they used the same shifts, bit for bit; otherwise their features are not
 * the same variables.
 */
export function combineShiftedCoMoments(left: ShiftedCoMoments, right: ShiftedCoMoments): ShiftedCoMoments {
  if (left.shifts.length !== right.shifts.length || left.shifts.some((s, i) => !Object.is(s, right.shifts[i]))) {
    throw new RangeError('combineShiftedCoMoments: the two states were built with different shifts');
  }
  return { shifts: Float64Array.from(left.shifts), moments: combineCoMoments(left.moments, right.moments) };
}

/** The sample count, after checking that there are at least `least` samples. */
export function countOfAtLeast(state: CoMoments, least: number, caller: string): number {
  if (state.count < least) throw new RangeError(`${caller}: at least ${least} samples are needed, got ${state.count}`);
  return state.count;
}
