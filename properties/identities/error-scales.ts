import { abs, type Complex } from '../../harness/numeric/complex.js';

/**
 * Rounding-error scales of the per-matrix quantities, for ratios in the style of LAPACK's test
 * programs: |computed − exact| / scale is O(1) for a backward-stable double-precision routine
 * whatever N, z or the weights, and every check holds its ratio against one threshold.
 *
 * Method. ε = 2⁻⁵² (Number.EPSILON). A backward-stable Hermitian eigen-solver returns the exact
 * spectrum (and eigenvectors within O(Nε)) of H + E with ‖E‖₂ ≤ p(N)ε‖H‖₂, p(N) a modest
 * polynomial, taken as N in LAPACK's test ratios such as ‖A − VΛV*‖/(N‖A‖ε) (Golub and Van Loan
 * 2013, Matrix Computations, §8.3.5; Anderson et al. 1999, LAPACK Users' Guide, 3rd ed., §4.7 and
 * its test programs; Higham 2002, Accuracy and Stability of Numerical Algorithms, 2nd ed.).
 * - Eigenvalues: by Weyl's inequality |λ_i(H + E) − λ_i(H)| ≤ ‖E‖₂ (Horn and Johnson 2013, Matrix
 *   Analysis, 2nd ed., Cor. 4.3.15; from memory), so the scale is Nε‖H‖₂.
 * - One resolvent, ⟨G(z)A⟩ with d = dist(z, spectrum H) and a ≥ ‖A‖₂: the backward error moves the
 *   trace by ⟨(G_E − G)A⟩ = −⟨G_E E G A⟩, at most a‖E‖₂/d² to first order; forming λ_i − z costs a
 *   relative error ε(|λ_i| + |z|)/d in each term 1/(λ_i − z); forming the weight in the eigenbasis
 *   and the sum of N terms cost O(Nε) relative to a/d. Together:
 *       s₁(z, A) = Nε · a · ((‖H‖₂ + |z|)/d² + 1/d).
 * - A chain ⟨G(z1)A1 ⋯ G(zk)Ak⟩: it is at most Π a_j/d_j in modulus, and each resolvent adds the
 *   relative error of the single one, (‖H‖₂ + |z_j|)/d_j + 1, times Nε (matrix products add O(Nε),
 *   Higham 2002, §3.5), so
 *       s_k = Nε · Π_j (a_j/d_j) · Σ_j ((‖H‖₂ + |z_j|)/d_j + 1),
 *   which is s₁ for k = 1.
 * An identity between computed quantities is held against the sum of their scales (each side
 * carries its own rounding error; combining a few numbers adds O(ε) relative, within the sum).
 * d and ‖H‖₂ come from the harness's own eigenvalues of the same matrix (d ≥ |Im z| always), never
 * from the implementation's, so a wrong implementation cannot widen its own tolerance.
 */
export const EPSILON = Number.EPSILON;

/**
 * One threshold for every ratio of the suite. A correct routine gives ratios of order one or
 * below; LAPACK's test programs use thresholds of the same order (their input files use 30;
 * from memory). 50 leaves room for p(N) exceeding N at the smallest sizes, while every
 * wrong-formula or lost-precision mutant gives ratios of 10⁵ and more (test/properties).
 */
export const RATIO_THRESHOLD = 50;

/** What the scales need to know of H: its size, ‖H‖₂ and its eigenvalues (harness's). */
export interface ReferenceSpectrum {
  readonly size: number;
  readonly values: Float64Array;
  /** ‖H‖₂ = max |λ_i|. */
  readonly norm: number;
}

export function referenceSpectrum(values: Float64Array): ReferenceSpectrum {
  let norm = 0;
  for (const v of values) norm = Math.max(norm, Math.abs(v));
  return { size: values.length, values, norm };
}

/** dist(z, spectrum) = min_i |λ_i − z|; at least |Im z|. */
export function distanceToSpectrum(spectrum: ReferenceSpectrum, z: Complex): number {
  let d = Infinity;
  for (const v of spectrum.values) d = Math.min(d, Math.hypot(v - z.re, z.im));
  return Math.max(d, Math.abs(z.im));
}

/**
 * Nε‖H‖₂, floored at the smallest positive number so that an exactly right answer for the zero
 * matrix (a sparse ensemble can draw one) has ratio 0 rather than 0/0.
 */
export function eigenvalueErrorScale(spectrum: ReferenceSpectrum): number {
  return Math.max(spectrum.size * EPSILON * spectrum.norm, Number.MIN_VALUE);
}

/** s₁(z, A) above; `weightNorm` an upper bound on ‖A‖₂ (1 for A = I). */
export function resolventErrorScale(spectrum: ReferenceSpectrum, z: Complex, weightNorm: number): number {
  return chainErrorScale(spectrum, [z], [weightNorm]);
}

/** s_k above; `weightNorms[j]` an upper bound on ‖A_j‖₂. */
export function chainErrorScale(spectrum: ReferenceSpectrum, points: readonly Complex[], weightNorms: readonly number[]): number {
  let size = 1;
  let relative = 0;
  points.forEach((z, j) => {
    const d = distanceToSpectrum(spectrum, z);
    size *= weightNorms[j] / d;
    relative += (spectrum.norm + abs(z)) / d + 1;
  });
  return Math.max(spectrum.size * EPSILON * size * relative, Number.MIN_VALUE);
}
