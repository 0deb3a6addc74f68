import type { Field } from './square-matrix.js';

/**
 * The eigendecomposition H = V Λ V* of a real symmetric or complex Hermitian matrix, as
 * `eigenpairs` (eigen.ts) returns it.
 *
 * - `values` are the eigenvalues λ_0 ≤ λ_1 ≤ … ≤ λ_{N−1}, ascending.
 * - `vectors` is V, N×N row-major: entry (r, j) is component r of the unit eigenvector of
 *   `values[j]`, so column j is that eigenvector and V is orthogonal (real) or unitary (complex).
 *   Real: N² numbers. Complex: 2N², each entry interleaved (re, im) as in square-matrix.ts.
 *
 * Eigenvectors are unique only up to a sign (real) or a phase (complex), and within a cluster of
 * equal eigenvalues only up to a rotation of the cluster's eigenspace: compare invariants
 * (residuals, projectors, traces), never the vectors themselves.
 */
export interface SpectralDecomposition {
  readonly field: Field;
  readonly size: number;
  /** Eigenvalues, ascending. */
  readonly values: Float64Array;
  /** V, row-major; column j is the unit eigenvector of values[j]; complex interleaved. */
  readonly vectors: Float64Array;
}
