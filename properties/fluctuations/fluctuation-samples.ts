import { NotAvailable, type ChainSpec } from '../../adapters/adapter.js';
import type { CheckContext } from '../../harness/check-group.js';
import type { Complex } from '../../harness/numeric/complex.js';
import { chainStatistics } from '../../harness/numeric/chain-statistics.js';
import { ensembleLabel, type EnsembleSpec } from '../../harness/numeric/ensemble.js';
import { sampleMatrix } from '../../harness/numeric/sample-wigner.js';
import { matrixSource } from '../support/matrix-source.js';
import type { Estimand } from './estimand.js';
import { STATISTICS_BATCH } from './fluctuation-design.js';
import { emptyStates, estimandValues, layoutsOf, observeSample, type FluctuationTally } from './fluctuation-tally.js';
import type { StatisticBook, Tier } from './statistic-book.js';

/**
 * Every chain of the book (weighted ones included) on one pilot matrix drawn by the harness's own
 * sampler from the stream '<key>/pilot': values near the statistics' means, fixed by the seed, that
 * serve as the shifts of the streaming moments (fluctuation-tally.ts). Any fixed shift gives the
 * same covariances and cumulants; one near the mean keeps O(N) traces from cancelling.
 */
export function pilotChainValues(context: Pick<CheckContext, 'stream'>, key: string, ensemble: EnsembleSpec, book: StatisticBook): Float64Array {
  const matrix = sampleMatrix(ensemble, book.size, context.stream(`${key}/pilot`, 0));
  return chainRow(book.size, chainStatistics(matrix, book.chainsFor('weighted')), book.positionsFor('weighted'));
}

/** Tr-scale chain values (complex interleaved, every chain of the book; NaN where the tier lacks one). */
function chainRow(size: number, values: readonly Complex[], positions: readonly number[]): Float64Array {
  const row = new Float64Array(2 * positions.length).fill(NaN);
  positions.forEach((at, c) => {
    if (at < 0) return;
    row[2 * c] = size * values[at].re;
    row[2 * c + 1] = size * values[at].im;
  });
  return row;
}

/**
 * Observes the samples [start, end) behind the fluctuation checks of one ensemble and size and
 * reduces them to the estimands' streaming states, by the path the issue prescribes:
 * - the implementation offers sample_statistics: its values are what is tested (batch b, samples
 *   [16b, 16b + 16), is asked for with the seed derived for b);
 * - else it offers a sampler: its matrices, with every statistic computed by the harness's engine
 *   from one decomposition per matrix (so the sampler is what is tested; the implementation's
 *   per-matrix routines are the identities suite's business);
 * - else nothing of it would be exercised, and the checks are skipped (the group's skipReason; NotAvailable here).
 * Weighted chains (eigenvectors) are observed on the samples below the weighted count only.
 */
export async function observeFluctuationBlock(
  context: CheckContext,
  key: string,
  ensemble: EnsembleSpec,
  book: StatisticBook,
  counts: { readonly spectral: number; readonly weighted: number },
  estimands: readonly Estimand[],
  pilot: Float64Array,
  start: number,
  end: number,
): Promise<FluctuationTally> {
  const size = book.size;
  const { spectral: spectralCount, weighted: weightedCount } = counts;
  const layouts = layoutsOf(estimands);
  const states = emptyStates(estimands, (i) => estimandValues(layouts[i].statistics, pilot));
  const positions = { spectral: book.positionsFor('spectral'), weighted: book.positionsFor('weighted') };
  const tierOf = (k: number): Tier => (k < weightedCount ? 'weighted' : 'spectral');
  const observe = (k: number, tier: Tier, values: readonly Complex[]) =>
    observeSample(estimands, layouts, states, chainRow(size, values, positions[tier]), tier === 'weighted', k);
  const sampleStatistics = context.adapter.sampleStatistics;
  if (context.capabilities.has('sample_statistics') && sampleStatistics !== undefined) {
    if (start % STATISTICS_BATCH !== 0) throw new RangeError(`observeFluctuationBlock: ${start} does not start a batch`);
    for (let k = start; k < end; ) {
      const tier = tierOf(k);
      const count = Math.min(STATISTICS_BATCH, (tier === 'weighted' ? weightedCount : spectralCount) - k, end - k);
      const chains: ChainSpec[] = book.chainsFor(tier);
      const rows = await sampleStatistics.call(context.adapter, ensemble, size, context.derivedSeed(key, k / STATISTICS_BATCH), count, chains);
      for (const row of rows) observe(k++, tier, row);
    }
    return {
      states,
      path: `statistics: implementation's sample_statistics (${ensembleLabel(ensemble)}, N = ${size}, ${spectralCount} samples, the first ${weightedCount} with weighted chains)`,
      origin: 'sample_statistics',
    };
  }
  if (!context.capabilities.has('sample')) {
    // An adapter that declares sample_statistics without the method (one written before it existed).
    throw new NotAvailable('the adapter declares sample_statistics but has no sampleStatistics method, and offers no sampler');
  }
  const source = await matrixSource(context, key, ensemble, size, spectralCount, true, { start, end });
  const chainsByTier = { spectral: book.chainsFor('spectral'), weighted: book.chainsFor('weighted') };
  let k = start;
  for await (const matrix of source.matrices) {
    const tier = tierOf(k);
    observe(k++, tier, chainStatistics(matrix, chainsByTier[tier]));
  }
  return {
    states,
    path: `matrices: ${source.description}; statistics: reference engine (one decomposition per matrix; eigenvectors for the first ${weightedCount}), so the sampler is what is tested; the implementation's per-matrix routines are the identities suite's business`,
    origin: 'sampler',
  };
}
