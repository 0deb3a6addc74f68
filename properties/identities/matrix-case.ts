import fc from 'fast-check';
import type { CheckContext } from '../../harness/check-group.js';
import { ensembleLabel, type EnsembleSpec } from '../../harness/numeric/ensemble.js';
import { sampleMatrix } from '../../harness/numeric/sample-wigner.js';
import type { SquareMatrix } from '../../harness/numeric/square-matrix.js';
import type { RunSettings } from '../../harness/run-settings.js';

/**
 * The matrix of one randomised case: its size, its ensemble and the index of the harness's random
 * stream it is drawn from. The three values name the matrix exactly (with the run's seed), so a
 * case printed in a verdict can be rebuilt by hand: `sampleMatrix(ensemble, size,
 * randomStream(seed, MATRIX_STREAM_KEY, stream))`.
 */
export interface MatrixCase {
  readonly size: number;
  readonly ensemble: EnsembleSpec;
  readonly stream: number;
}

/** One key for every check of the suite, so a case names the same matrix in each of them. */
export const MATRIX_STREAM_KEY = 'identities/matrix';

/** Small sizes always tried: the identities are exact at every N, and small cases shrink well. */
const SMALLEST_SIZE = 2;
const LARGEST_SMALL_SIZE = 40;

/**
 * The run's own sizes are tried too, capped here: the identities do not depend on N, and every
 * case costs an eigendecomposition in the harness besides the implementation's work.
 */
export const LARGEST_CASE_SIZE = 96;

const LARGEST_STREAM_INDEX = 999_999;

/** The run's sizes as the suite tries them: capped at LARGEST_CASE_SIZE, at least 2, distinct. */
export function runSizesForCases(settings: RunSettings): number[] {
  const capped = settings.sizes.map((n) => Math.max(SMALLEST_SIZE, Math.min(LARGEST_CASE_SIZE, Math.floor(n))));
  return [...new Set(capped)].sort((a, b) => a - b);
}

/**
 * N: three times in four a small size in [2, 40] (shrinks towards 2), else one of the run's sizes
 * (capped); the ensemble: one of the run's (shrinks towards the first listed); the stream index:
 * any of a million (shrinks towards 0).
 */
export function matrixCaseArbitrary(settings: RunSettings): fc.Arbitrary<MatrixCase> {
  const small = fc.integer({ min: SMALLEST_SIZE, max: LARGEST_SMALL_SIZE });
  const runSizes = runSizesForCases(settings);
  const size = runSizes.length === 0 ? small : fc.oneof({ arbitrary: small, weight: 3 }, { arbitrary: fc.constantFrom(...runSizes), weight: 1 });
  const ensembles: readonly EnsembleSpec[] = settings.ensembles.length > 0 ? settings.ensembles : [{ kind: 'goe' }];
  return fc.record({
    size,
    ensemble: fc.constantFrom(...ensembles),
    stream: fc.integer({ min: 0, max: LARGEST_STREAM_INDEX }),
  });
}

export function caseMatrix(context: CheckContext, c: MatrixCase): SquareMatrix {
  return sampleMatrix(c.ensemble, c.size, context.stream(MATRIX_STREAM_KEY, c.stream));
}

export function describeMatrixCase(c: MatrixCase): string {
  return `N = ${c.size}, ensemble ${ensembleLabel(c.ensemble)}, matrix stream ${c.stream} (key '${MATRIX_STREAM_KEY}')`;
}
