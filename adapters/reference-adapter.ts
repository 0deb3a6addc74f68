import type { Complex } from '../harness/numeric/complex.js';
import { eigenpairs, eigenvalues } from '../harness/numeric/eigen.js';
import type { EnsembleSpec } from '../harness/numeric/ensemble.js';
import { randomStream } from '../harness/numeric/random-stream.js';
import {
  chainTrace,
  eigenbasisDiagonal,
  normalisedResolventTrace,
  weightedResolventTrace,
} from '../harness/numeric/resolvent-statistics.js';
import { chainStatistics } from '../harness/numeric/chain-statistics.js';
import { sampleMatrix } from '../harness/numeric/sample-wigner.js';
import type { SquareMatrix } from '../harness/numeric/square-matrix.js';
import { TOOL_VERSION } from '../harness/tool-identity.js';
import { ALL_CAPABILITIES, NotAvailable, type Adapter, type AdapterDescription, type ChainSpec } from './adapter.js';
import { closedFormCovariance } from './closed-form-covariance.js';

/**
 * The harness's own engine behind the adapter interface: every capability, computed from one
 * Hermitian eigendecomposition (harness/numeric). It is what other implementations are compared
 * with, and it must itself pass every suite at the default level.
 */
export class ReferenceAdapter implements Adapter {
  async describe(): Promise<AdapterDescription> {
    return { name: 'rmt-assay reference engine', version: TOOL_VERSION, kind: 'reference', capabilities: ALL_CAPABILITIES };
  }

  async eigenvalues(matrix: SquareMatrix): Promise<Float64Array> {
    return eigenvalues(matrix);
  }

  async resolventTrace(matrix: SquareMatrix, points: readonly Complex[], weight?: SquareMatrix): Promise<Complex[]> {
    if (weight === undefined) {
      const values = eigenvalues(matrix);
      return points.map((z) => normalisedResolventTrace(values, z));
    }
    const decomposition = eigenpairs(matrix);
    const diagonal = eigenbasisDiagonal(decomposition, weight);
    return points.map((z) => weightedResolventTrace(decomposition.values, diagonal, z));
  }

  async chainTrace(matrix: SquareMatrix, points: readonly Complex[], weights: readonly SquareMatrix[]): Promise<Complex> {
    return chainTrace(eigenpairs(matrix), points, weights);
  }

  async sample(ensemble: EnsembleSpec, size: number, seed: number, count: number): Promise<SquareMatrix[]> {
    const matrices: SquareMatrix[] = [];
    for (let i = 0; i < count; i++) matrices.push(sampleMatrix(ensemble, size, randomStream(seed, 'reference-sampler', i)));
    return matrices;
  }

  /** The closed forms of closed-form-covariance.ts; NotAvailable where there is none. */
  async covariance(ensemble: EnsembleSpec, left: ChainSpec, right: ChainSpec): Promise<Complex> {
    const value = closedFormCovariance(ensemble, left, right);
    if (value === null) {
      throw new NotAvailable('the reference engine has no closed-form covariance for chains of length ≥ 2 with weights other than the identity');
    }
    return value;
  }

  /** The same matrices as `sample` for the same seed, each reduced to its chain traces with one shared decomposition. */
  async sampleStatistics(ensemble: EnsembleSpec, size: number, seed: number, count: number, statistics: readonly ChainSpec[]): Promise<Complex[][]> {
    const values: Complex[][] = [];
    for (let i = 0; i < count; i++) {
      values.push(chainStatistics(sampleMatrix(ensemble, size, randomStream(seed, 'reference-sampler', i)), statistics));
    }
    return values;
  }

  async close(): Promise<void> {}
}
