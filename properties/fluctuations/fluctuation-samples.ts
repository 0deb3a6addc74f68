import { NotAvailable, type ChainSpec } from '../../adapters/adapter.js';
import type { CheckContext } from '../../harness/check-group.js';
import type { Complex } from '../../harness/numeric/complex.js';
import { chainStatistics } from '../../harness/numeric/chain-statistics.js';
import { ensembleLabel, type EnsembleSpec } from '../../harness/numeric/ensemble.js';
import { matrixSource } from '../support/matrix-source.js';
import { STATISTICS_BATCH } from './fluctuation-design.js';
import type { Statistic, StatisticBook, Tier } from './statistic-book.js';


/**
 * The observed Tr statistics N⟨chain⟩ of every chain of a book, sample by sample in the order the
 * samples were produced (the independence check needs that order). Weighted chains are observed on
 * the first `weightedCount` samples only.
 */
export class FluctuationSamples {
  constructor(
    private readonly columns: readonly Float64Array[],
    readonly spectralCount: number,
    readonly weightedCount: number,
    /** The sentence a verdict's `path` carries. */
    readonly path: string,
    readonly origin: 'sample_statistics' | 'sampler',
  ) {}

  countFor(tier: Tier): number {
    return tier === 'weighted' ? this.weightedCount : this.spectralCount;
  }

  /** The statistic on each of its samples (complex interleaved), uncentred; `count` truncates to a prefix. */
  column(statistic: Statistic, count = this.countFor(statistic.tier)): Float64Array {
    const out = new Float64Array(2 * count);
    for (const { chain, coefficient, conjugate } of statistic.terms) {
      const x = this.columns[chain];
      const cr = coefficient.re;
      const ci = coefficient.im;
      const sign = conjugate === true ? -1 : 1;
      for (let k = 0; k < count; k++) {
        const xr = x[2 * k];
        const xi = sign * x[2 * k + 1];
        out[2 * k] += cr * xr - ci * xi;
        out[2 * k + 1] += cr * xi + ci * xr;
      }
    }
    return out;
  }

  /** Several statistics on their common samples (the shortest tier among them). */
  columnsOnCommonSamples(statistics: readonly Statistic[]): Float64Array[] {
    const count = Math.min(...statistics.map((s) => this.countFor(s.tier)));
    return statistics.map((s) => this.column(s, count));
  }
}

/**
 * The Tr statistics of one block of samples [start, end), chain by chain (complex interleaved;
 * weighted chains only on the samples of the block below the weighted count), and the path they
 * came by. Plain data: it crosses to a worker thread or into a shard file unchanged.
 */
export interface FluctuationRows {
  readonly columns: readonly Float64Array[];
  readonly path: string;
  readonly origin: 'sample_statistics' | 'sampler';
}

/** The rows of two consecutive blocks, left then right. */
export function combineFluctuationRows(left: FluctuationRows, right: FluctuationRows): FluctuationRows {
  return {
    path: left.path,
    origin: left.origin,
    columns: left.columns.map((l, c) => {
      const r = right.columns[c];
      const out = new Float64Array(l.length + r.length);
      out.set(l);
      out.set(r, l.length);
      return out;
    }),
  };
}

/** The samples of a whole run from its combined rows. */
export function fluctuationSamplesOf(rows: FluctuationRows, spectralCount: number, weightedCount: number): FluctuationSamples {
  return new FluctuationSamples(rows.columns, spectralCount, weightedCount, rows.path, rows.origin);
}

/**
 * Observes the samples [start, end) behind the fluctuation checks of one ensemble and size, by the
 * path the issue prescribes:
 * - the implementation offers sample_statistics: its values are what is tested (batch b, samples
 *   [16b, 16b + 16), is asked for with the seed derived for b);
 * - else it offers a sampler: its matrices, with every statistic computed by the harness's engine
 *   from one decomposition per matrix (so the sampler is what is tested; the implementation's
 *   per-matrix routines are the identities suite's business);
 * - else nothing of it would be exercised, and the checks are skipped (the group's skipReason; NotAvailable here).
 */
export async function observeFluctuationBlock(
  context: CheckContext,
  key: string,
  ensemble: EnsembleSpec,
  book: StatisticBook,
  counts: { readonly spectral: number; readonly weighted: number },
  start: number,
  end: number,
): Promise<FluctuationRows> {
  const size = book.size;
  const { spectral: spectralCount, weighted: weightedCount } = counts;
  const weightedEnd = Math.max(start, Math.min(end, weightedCount));
  const columns = book.chains.map((c) => new Float64Array(2 * ((c.tier === 'weighted' ? weightedEnd : end) - start)));
  const positions = { spectral: book.positionsFor('spectral'), weighted: book.positionsFor('weighted') };
  const store = (k: number, tier: Tier, values: readonly Complex[]) => {
    const at = positions[tier];
    const row = k - start;
    for (let c = 0; c < columns.length; c++) {
      if (at[c] < 0) continue;
      columns[c][2 * row] = size * values[at[c]].re;
      columns[c][2 * row + 1] = size * values[at[c]].im;
    }
  };
  const tierOf = (k: number): Tier => (k < weightedCount ? 'weighted' : 'spectral');
  const sampleStatistics = context.adapter.sampleStatistics;
  if (context.capabilities.has('sample_statistics') && sampleStatistics !== undefined) {
    if (start % STATISTICS_BATCH !== 0) throw new RangeError(`observeFluctuationBlock: ${start} does not start a batch`);
    for (let k = start; k < end; ) {
      const tier = tierOf(k);
      const count = Math.min(STATISTICS_BATCH, (tier === 'weighted' ? weightedCount : spectralCount) - k, end - k);
      const chains: ChainSpec[] = book.chainsFor(tier);
      const rows = await sampleStatistics.call(context.adapter, ensemble, size, context.derivedSeed(key, k / STATISTICS_BATCH), count, chains);
      for (const row of rows) store(k++, tier, row);
    }
    return {
      columns,
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
    store(k++, tier, chainStatistics(matrix, chainsByTier[tier]));
  }
  return {
    columns,
    path: `matrices: ${source.description}; statistics: reference engine (one decomposition per matrix; eigenvectors for the first ${weightedCount}), so the sampler is what is tested; the implementation's per-matrix routines are the identities suite's business`,
    origin: 'sampler',
  };
}
