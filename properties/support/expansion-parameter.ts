import type { EnsembleSpec } from '../../harness/numeric/ensemble.js';

/**
 * The small parameter of the finite-N expansions: 1/N for dense Wigner matrices; for sparse
 * Bernoulli entries with mean degree d, the higher cumulants of √N·h grow like powers of N/d, so
 * corrections are in max(1/N, 1/d) (common practice for sparse Wigner matrices; e.g. Erdős, Knowles,
 * Yau and Yin 2013, Ann. Probab. 41, "Spectral statistics of Erdős–Rényi graphs I", where q = √d
 * plays this role: corrections of order 1/q² = 1/d; citation from memory).
 */
export function expansionParameter(ensemble: EnsembleSpec, size: number): number {
  if (ensemble.kind === 'wigner' && ensemble.offDiagonal === 'sparse-bernoulli' && ensemble.meanDegree !== undefined) {
    return Math.max(1 / size, 1 / Math.min(ensemble.meanDegree, size));
  }
  return 1 / size;
}
