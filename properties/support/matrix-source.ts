import { EnsembleNotOffered } from '../../adapters/adapter.js';
import type { CheckContext } from '../../harness/check-group.js';
import { ensembleLabel, type EnsembleSpec } from '../../harness/numeric/ensemble.js';
import { sampleMatrix } from '../../harness/numeric/sample-wigner.js';
import type { SquareMatrix } from '../../harness/numeric/square-matrix.js';

/**
 * How many matrices to ask an implementation's sampler for at once: bounds memory and message size.
 * Batch b holds samples [8b, 8b + 8) and is asked for with the seed derived for b, so any range
 * starting at a multiple of 8 (every block of sampled-work.ts) is regenerable on its own.
 */
export const SAMPLER_BATCH = 8;

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
 * EnsembleNotOffered, and the checks are skipped. `range` picks the samples [start, end) of the
 * `count` (all by default); start must be a multiple of SAMPLER_BATCH.
 */
export async function matrixSource(
  context: CheckContext,
  key: string,
  ensemble: EnsembleSpec,
  size: number,
  count: number,
  requireImplementation: boolean,
  range: { readonly start: number; readonly end: number } = { start: 0, end: count },
): Promise<MatrixSource> {
  if (range.start % SAMPLER_BATCH !== 0 || range.end > count || range.start >= range.end) {
    throw new RangeError(`matrixSource: the range [${range.start}, ${range.end}) of ${count} samples does not start a sampler batch`);
  }
  if (context.capabilities.has('sample')) {
    try {
      const batch = range.start / SAMPLER_BATCH;
      const first = await context.adapter.sample(ensemble, size, context.derivedSeed(key, batch), Math.min(SAMPLER_BATCH, range.end - range.start));
      return {
        origin: 'implementation',
        description: `implementation's sampler (${ensembleLabel(ensemble)}, N = ${size}, ${count} matrices)`,
        matrices: implementationMatrices(context, key, ensemble, size, range, first),
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
    matrices: harnessMatrices(context, key, ensemble, size, range),
  };
}

async function* implementationMatrices(
  context: CheckContext,
  key: string,
  ensemble: EnsembleSpec,
  size: number,
  range: { readonly start: number; readonly end: number },
  first: SquareMatrix[],
): AsyncGenerator<SquareMatrix> {
  yield* first;
  for (let at = range.start + SAMPLER_BATCH; at < range.end; at += SAMPLER_BATCH) {
    yield* await context.adapter.sample(ensemble, size, context.derivedSeed(key, at / SAMPLER_BATCH), Math.min(SAMPLER_BATCH, range.end - at));
  }
}

async function* harnessMatrices(
  context: CheckContext,
  key: string,
  ensemble: EnsembleSpec,
  size: number,
  range: { readonly start: number; readonly end: number },
): AsyncGenerator<SquareMatrix> {
  for (let i = range.start; i < range.end; i++) yield sampleMatrix(ensemble, size, context.stream(key, i));
}
