import { NotAvailable } from '../../adapters/adapter.js';
import { matrixSource } from '../../properties/support/matrix-source.js';
import type { CheckContext } from '../check-group.js';
import type { Complex } from '../numeric/complex.js';
import { eigenvalues } from '../numeric/eigen.js';
import { ensembleLabel, type EnsembleSpec } from '../numeric/ensemble.js';
import { normalisedResolventTrace } from '../numeric/resolvent-statistics.js';
import { identityMatrix } from '../numeric/square-matrix.js';

/** Tr G(z_j) = N⟨G(z_j)⟩ on each of K samples drawn by an implementation. */
export interface TraceSample {
  /** One array per point, complex interleaved: values[j][2k], values[j][2k + 1] are Re, Im on sample k. */
  readonly values: readonly Float64Array[];
  readonly count: number;
  /** Where the matrices and the statistic came from. */
  readonly path: string;
}

/**
 * K samples of the Tr statistics at `points` from the implementation behind `context.adapter`,
 * drawn by the implementation itself: its whole statistic (sample_statistics, the one-resolvent
 * chains with the identity weight) where it offers that, else its matrices (sample) reduced by
 * its own resolvent_trace, or by the harness's engine when it has none. Seeds come from
 * `context.derivedSeed(key, ·)`. Throws NotAvailable when it draws no matrices at all.
 */
export async function sampleTraceStatistics(
  context: CheckContext,
  key: string,
  ensemble: EnsembleSpec,
  size: number,
  count: number,
  points: readonly Complex[],
): Promise<TraceSample> {
  const values = points.map(() => new Float64Array(2 * count));
  const store = (k: number, traces: readonly Complex[]) =>
    traces.forEach((t, j) => {
      values[j][2 * k] = size * t.re;
      values[j][2 * k + 1] = size * t.im;
    });
  const label = `${ensembleLabel(ensemble)}, N = ${size}, ${count} samples`;
  if (context.capabilities.has('sample_statistics') && context.adapter.sampleStatistics !== undefined) {
    const identity = identityMatrix('real', size);
    const chains = points.map((z) => ({ points: [z], weights: [identity] }));
    const rows = await context.adapter.sampleStatistics(ensemble, size, context.derivedSeed(key, 0), count, chains);
    rows.forEach((row, k) => store(k, row));
    return { values, count, path: `matrices and statistic: implementation's sample_statistics (${label})` };
  }
  if (!context.capabilities.has('sample')) throw new NotAvailable('the implementation offers neither sample nor sample_statistics');
  const source = await matrixSource(context, key, ensemble, size, count, true);
  const own = context.capabilities.has('resolvent_trace');
  let k = 0;
  for await (const matrix of source.matrices) {
    if (own) store(k, await context.adapter.resolventTrace(matrix, points));
    else {
      const spectrum = eigenvalues(matrix);
      store(k, points.map((z) => normalisedResolventTrace(spectrum, z)));
    }
    k++;
  }
  return { values, count, path: `matrices: ${source.description}; statistic: ${own ? "implementation's" : "reference engine's"} resolvent_trace` };
}
