import { EnsembleNotOffered } from '../../adapters/adapter.js';
import type { CheckContext } from '../../harness/check-group.js';
import { ensembleLabel, type EnsembleSpec } from '../../harness/numeric/ensemble.js';
import { sampleMatrix } from '../../harness/numeric/sample-wigner.js';
import type { SquareMatrix } from '../../harness/numeric/square-matrix.js';

/** How many matrices to ask an implementation's sampler for at once: bounds memory and message size. */
const SAMPLER_BATCH = 8;

export interface MatrixSource {
  /** 'implementation' when the adapter's own sampler made the matrices, else 'harness'. */
  readonly origin: 'implementation' | 'harness';
  readonly description: string;
  /** The matrices one at a time, so memory does not grow with the number of samples. */
  readonly matrices: AsyncIterable<SquareMatrix>;
}

/**
 * The matrices behind a statistical estimate. When the implementation offers a sampler for the
 * ensemble, its matrices are used (so the sampler is what is tested); otherwise the harness's own
 * sampler draws them from the run's seed under `key`. With `requireImplementation` the harness's
 * sampler is never a substitute: an implementation that does not sample this ensemble raises
 * EnsembleNotOffered, and the checks are skipped.
 */
export async function matrixSource(
  context: CheckContext,
  key: string,
  ensemble: EnsembleSpec,
  size: number,
  count: number,
  requireImplementation: boolean,
): Promise<MatrixSource> {
  if (context.capabilities.has('sample')) {
    try {
      const first = await context.adapter.sample(ensemble, size, context.derivedSeed(key, 0), Math.min(SAMPLER_BATCH, count));
      return {
        origin: 'implementation',
        description: `implementation's sampler (${ensembleLabel(ensemble)}, N = ${size}, ${count} matrices)`,
        matrices: implementationMatrices(context, key, ensemble, size, count, first),
      };
    } catch (error) {
      if (!(error instanceof EnsembleNotOffered) || requireImplementation) throw error;
    }
  } else if (requireImplementation) {
    throw new EnsembleNotOffered(ensembleLabel(ensemble));
  }
  return {
    origin: 'harness',
    description: `harness sampler (${ensembleLabel(ensemble)}, N = ${size}, ${count} matrices, stream '${key}')`,
    matrices: harnessMatrices(context, key, ensemble, size, count),
  };
}

async function* implementationMatrices(
  context: CheckContext,
  key: string,
  ensemble: EnsembleSpec,
  size: number,
  count: number,
  first: SquareMatrix[],
): AsyncGenerator<SquareMatrix> {
  yield* first;
  let produced = first.length;
  for (let batch = 1; produced < count; batch++) {
    const n = Math.min(SAMPLER_BATCH, count - produced);
    const next = await context.adapter.sample(ensemble, size, context.derivedSeed(key, batch), n);
    yield* next;
    produced += n;
  }
}

async function* harnessMatrices(
  context: CheckContext,
  key: string,
  ensemble: EnsembleSpec,
  size: number,
  count: number,
): AsyncGenerator<SquareMatrix> {
  for (let i = 0; i < count; i++) yield sampleMatrix(ensemble, size, context.stream(key, i));
}
