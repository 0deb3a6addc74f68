import { sampleBetaHermiteTridiagonal } from './beta-hermite-tridiagonal.js';
import { eigenvalues } from './eigen.js';
import type { EnsembleSpec } from './ensemble.js';
import type { RandomStream } from './random-stream.js';
import { sampleMatrix } from './sample-wigner.js';
import { largestEigenvalue } from './sturm-bisection.js';
import { tridiagonalEigenvalues } from './tridiagonal-eigenvalues.js';

/**
 * Eigenvalue draws from an ensemble, by the fastest exact route the harness has, for the harness's
 * own sampler path where only eigenvalues are needed (never for an implementation's matrices).
 *
 * - GOE, GUE, and any `wigner` spec that is one of them in law (real Gaussian with σ_d² = 2, complex
 *   Gaussian with σ_d² = 1), and the general β-Hermite spec: Dumitriu and Edelman's tridiagonal
 *   model (beta-hermite-tridiagonal.ts), O(N) to draw; all eigenvalues by root-free QL, O(N²)
 *   (tridiagonal-eigenvalues.ts); the largest alone by Sturm bisection, O(N) per digit
 *   (sturm-bisection.ts). The eigenvalue law is exactly that of the dense ensemble: orthogonal
 *   (unitary) invariance of the Gaussian ensembles is what makes the tridiagonal model exact, so no
 *   other Wigner ensemble takes this route.
 * - Every other spec: the dense sampler (sample-wigner.ts) and the dense eigen-solver (eigen.ts).
 *
 * The tridiagonal route does not draw the dense sampler's matrix for the same stream: a statistic
 * computed here has the same distribution as, but not the same value as, one computed from
 * sampleMatrix(spec, N, stream). A check that must reproduce a recorded matrix, or that passes
 * matrices to an implementation, uses sampleMatrix.
 */
export type SpectrumSpec = EnsembleSpec | { readonly kind: 'beta-hermite'; readonly beta: number };

/** β of the tridiagonal model whose eigenvalues have this spec's law, or null if there is none. */
export function tridiagonalModelBeta(spec: SpectrumSpec): number | null {
  switch (spec.kind) {
    case 'goe':
      return 1;
    case 'gue':
      return 2;
    case 'beta-hermite':
      return spec.beta;
    case 'wigner':
      if (spec.offDiagonal !== 'gaussian' || spec.diagonal !== 'gaussian') return null;
      if (spec.field === 'real' && spec.diagonalVariance === 2) return 1;
      if (spec.field === 'complex' && spec.diagonalVariance === 1) return 2;
      return null;
  }
}

/** All eigenvalues, ascending, of one draw of the ensemble of order `size`. */
export function spectrumOfEnsemble(spec: SpectrumSpec, size: number, stream: RandomStream): Float64Array {
  const beta = tridiagonalModelBeta(spec);
  if (beta !== null) return tridiagonalEigenvalues(sampleBetaHermiteTridiagonal(beta, size, stream));
  return eigenvalues(sampleMatrix(denseSpec(spec), size, stream));
}

/**
 * The largest eigenvalue of one draw, to absolute `tolerance` (0: full precision). On the
 * tridiagonal route this is O(N) per bisection step; on the dense route it is the last entry of
 * the dense spectrum (exact to rounding, whatever the tolerance).
 */
export function largestEigenvalueOfEnsemble(spec: SpectrumSpec, size: number, stream: RandomStream, tolerance = 0): number {
  const beta = tridiagonalModelBeta(spec);
  if (beta !== null) return largestEigenvalue(sampleBetaHermiteTridiagonal(beta, size, stream), tolerance);
  const values = eigenvalues(sampleMatrix(denseSpec(spec), size, stream));
  return values[values.length - 1];
}

/** The spec as the dense sampler's (β-Hermite specs always have a tridiagonal model and never get here). */
function denseSpec(spec: SpectrumSpec): EnsembleSpec {
  if (spec.kind === 'beta-hermite') throw new Error('a β-Hermite spec has no dense sampler');
  return spec;
}
