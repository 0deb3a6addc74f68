import type { Complex } from '../../harness/numeric/complex.js';
import type { EnsembleSpec } from '../../harness/numeric/ensemble.js';
import type { SquareMatrix } from '../../harness/numeric/square-matrix.js';
import type { ChainSpec } from '../adapter.js';
import { encodeMatrix, type WireMatrix } from './matrix-codec.js';

/**
 * The params object of each protocol request (schemas/METHOD.params.json), built from harness
 * values. The harness only sends finite numbers: a non-finite point or seed is a bug upstream and
 * throws a RangeError here rather than travelling as JSON null.
 */
export const requestParams = {
  eigenvalues(matrix: SquareMatrix): { matrix: WireMatrix } {
    return { matrix: encodeMatrix(matrix) };
  },

  resolventTrace(
    matrix: SquareMatrix,
    points: readonly Complex[],
    weight?: SquareMatrix,
  ): { matrix: WireMatrix; points: [number, number][]; weight?: WireMatrix } {
    const params = { matrix: encodeMatrix(matrix), points: points.map(pointToWire) };
    return weight === undefined ? params : { ...params, weight: encodeMatrix(weight) };
  },

  chainTrace(
    matrix: SquareMatrix,
    points: readonly Complex[],
    weights: readonly SquareMatrix[],
  ): { matrix: WireMatrix; points: [number, number][]; weights: WireMatrix[] } {
    if (points.length !== weights.length || points.length === 0) {
      throw new RangeError(`a chain needs as many weights as points, at least one: got ${points.length} points and ${weights.length} weights`);
    }
    return { matrix: encodeMatrix(matrix), points: points.map(pointToWire), weights: weights.map(encodeMatrix) };
  },

  sample(ensemble: EnsembleSpec, size: number, seed: number, count: number): { ensemble: EnsembleSpec; size: number; seed: number; count: number } {
    for (const [name, value, min] of [['size', size, 1], ['seed', seed, 0], ['count', count, 1]] as const) {
      if (!Number.isSafeInteger(value) || value < min) throw new RangeError(`sample: ${name} must be an integer ≥ ${min}, not ${value}`);
    }
    // JSON.stringify drops an undefined meanDegree, which is the wire form of an absent one.
    return { ensemble, size, seed, count };
  },

  covariance(ensemble: EnsembleSpec, left: ChainSpec, right: ChainSpec): { ensemble: EnsembleSpec; left: WireChain; right: WireChain } {
    return { ensemble, left: chainToWire(left), right: chainToWire(right) };
  },

  sampleStatistics(
    ensemble: EnsembleSpec,
    size: number,
    seed: number,
    count: number,
    statistics: readonly ChainSpec[],
  ): { ensemble: EnsembleSpec; size: number; seed: number; count: number; statistics: WireChain[] } {
    if (statistics.length === 0) throw new RangeError('sample_statistics needs at least one chain');
    return { ...requestParams.sample(ensemble, size, seed, count), statistics: statistics.map(chainToWire) };
  },
};

/** A chain as it travels (schemas/chain.json). */
export interface WireChain {
  readonly points: [number, number][];
  readonly weights: WireMatrix[];
}

function chainToWire(chain: ChainSpec): WireChain {
  if (chain.points.length !== chain.weights.length) {
    throw new RangeError(`a chain needs as many weights as points: got ${chain.points.length} points and ${chain.weights.length} weights`);
  }
  return { points: chain.points.map(pointToWire), weights: chain.weights.map(encodeMatrix) };
}

function pointToWire(z: Complex): [number, number] {
  if (!Number.isFinite(z.re) || !Number.isFinite(z.im)) throw new RangeError(`a spectral parameter must be finite, not (${z.re}, ${z.im})`);
  return [z.re, z.im];
}
