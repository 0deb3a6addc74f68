import { abs, sub, type Complex } from '../numeric/complex.js';
import type { Quantity } from '../evidence.js';
import { EPSILON } from '../../properties/identities/error-scales.js';

/** How one routine's two results on one input compare. */
export interface InputAgreement {
  /** The values that differ most relative to their error scale (one eigenvalue, one trace). */
  readonly left: Quantity;
  readonly right: Quantity;
  /** The ratio's denominator: the rounding-error scale both results may carry together. */
  readonly scale: number;
  /** |left − right| / scale: O(1) for two backward-stable results (LAPACK test-program style). */
  readonly ratio: number;
  /** Normwise relative difference over the whole output for this input. */
  readonly relativeDifference: number;
  /** The input and the place in the output, in replayable words. */
  readonly where: string;
}

/**
 * Two ascending spectra of one matrix. Scale 2Nε‖H‖₂: each backward-stable solver is exact for a
 * matrix within Nε‖H‖₂ of H, and Weyl's inequality moves every eigenvalue by at most that (Golub
 * and Van Loan 2013, Matrix Computations, §8.3.5; Horn and Johnson 2013, Matrix Analysis,
 * Cor. 4.3.15). The relative difference is max_i|Δλ_i| / ‖H‖₂, normwise, since a backward-stable
 * solver gets a small eigenvalue to absolute, not relative, accuracy.
 */
export function spectrumAgreement(left: Float64Array, right: Float64Array, norm: number, where: string): InputAgreement {
  const n = right.length;
  const scale = Math.max(2 * n * EPSILON * norm, Number.MIN_VALUE);
  if (left.length !== n) {
    return { left: left.length, right: n, scale: 1, ratio: Infinity, relativeDifference: Infinity, where: `${where}; ${left.length} eigenvalues against ${n}` };
  }
  let worst = 0;
  for (let i = 0; i < n; i++) {
    if (!(Math.abs(left[i] - right[i]) <= Math.abs(left[worst] - right[worst]))) worst = i;
  }
  const difference = Math.abs(left[worst] - right[worst]);
  return {
    left: left[worst],
    right: right[worst],
    scale,
    ratio: Number.isNaN(difference) ? Infinity : difference / scale,
    relativeDifference: difference / Math.max(norm, Number.MIN_VALUE),
    where: `${where}; λ_${worst} (ascending)`,
  };
}

/** Two values of one trace; `scale` from error-scales.ts (already summed over the two results). */
export function traceAgreement(left: Complex, right: Complex, scale: number, where: string): InputAgreement {
  const difference = abs(sub(left, right));
  const size = abs(right);
  return {
    left,
    right,
    scale,
    ratio: Number.isNaN(difference) ? Infinity : difference / scale,
    relativeDifference: size > 0 ? difference / size : difference,
    where,
  };
}
