import { formatComplex, type Complex } from '../numeric/complex.js';
import { ensembleLabel, type EnsembleSpec } from '../numeric/ensemble.js';
import { randomStream } from '../numeric/random-stream.js';
import { sampleMatrix } from '../numeric/sample-wigner.js';
import { identityMatrix, zeroMatrix, type SquareMatrix } from '../numeric/square-matrix.js';

/**
 * The fixed, seeded inputs on which two implementations (or one implementation and its recorded
 * baseline) are held side by side: matrices named by (seed, stream key, index, ensemble, N), a few
 * spectral parameters, weights given by a formula, and chains built from them. Everything is
 * rebuilt from these few numbers, so a report or a baseline file never carries a matrix.
 */

/** A weight named by its formula, so it is rebuilt rather than stored. */
export type ProbeWeight = 'identity' | 'cosine-diagonal';

/** One chain G(z1)A1 ⋯ G(zk)Ak of the probe set. */
export interface ProbeChain {
  readonly points: readonly Complex[];
  readonly weights: readonly ProbeWeight[];
}

export interface ProbeInputs {
  /** Matrices per ensemble and size for the per-matrix (deterministic) comparisons. */
  readonly matricesPerCase: number;
  /** Where ⟨G(z)A⟩ is compared: in the bulk, near the lower edge, just outside, far from the axis. */
  readonly points: readonly Complex[];
  /** Weights A of ⟨G(z)A⟩: no weight passed, and one non-trivial diagonal weight. */
  readonly weights: readonly ProbeWeight[];
  readonly chains: readonly ProbeChain[];
  /** Where Tr G(z) is sampled for the two-sample (statistical) comparisons. */
  readonly statisticPoints: readonly Complex[];
}

export const DEFAULT_PROBE_INPUTS: ProbeInputs = {
  matricesPerCase: 3,
  points: [
    { re: 0.3, im: 0.2 },
    { re: -1.4, im: 0.05 },
    { re: 2.5, im: 0.02 },
    { re: 0, im: 1 },
  ],
  weights: ['identity', 'cosine-diagonal'],
  chains: [
    { points: [{ re: 0.3, im: 0.2 }, { re: -0.7, im: -0.4 }], weights: ['cosine-diagonal', 'identity'] },
    { points: [{ re: 0.3, im: 0.2 }, { re: 0, im: 1 }, { re: 1.2, im: 0.3 }], weights: ['cosine-diagonal', 'identity', 'cosine-diagonal'] },
  ],
  // A bulk point and one nearer the edge, both at order-one distance from the real axis, where the
  // Tr G(z) fluctuations are Gaussian with an order-one covariance (THEORY.md, "Fluctuations").
  statisticPoints: [
    { re: 0.5, im: 0.5 },
    { re: -1.5, im: 0.3 },
  ],
};

/** The matrix stream key of the per-matrix comparisons. */
export const PROBE_MATRIX_KEY = 'probe/matrix';

/** Matrix `index` of the probe set: the harness's sampler under (seed, PROBE_MATRIX_KEY, index). */
export function probeMatrix(seed: number, ensemble: EnsembleSpec, size: number, index: number): SquareMatrix {
  return sampleMatrix(ensemble, size, randomStream(seed, PROBE_MATRIX_KEY, index));
}

export function describeProbeMatrix(seed: number, ensemble: EnsembleSpec, size: number, index: number): string {
  return `${ensembleLabel(ensemble)}, N = ${size}, matrix ${index} of stream '${PROBE_MATRIX_KEY}' under seed ${seed}`;
}

/**
 * The weight by its formula, real (every implementation accepts a real weight for a complex H):
 * identity, or diag(1 + cos(2πi/N)/2), i = 0 … N − 1, with trace N and a traceless part of
 * order one, so both parts of ⟨G(z)A⟩ enter; ‖A‖₂ = 3/2.
 */
export function probeWeight(kind: ProbeWeight, size: number): SquareMatrix {
  if (kind === 'identity') return identityMatrix('real', size);
  const m = zeroMatrix('real', size);
  for (let i = 0; i < size; i++) m.data[i * size + i] = 1 + 0.5 * Math.cos((2 * Math.PI * i) / size);
  return m;
}

/** ‖A‖₂ of a probe weight, exact. */
export function probeWeightNorm(kind: ProbeWeight): number {
  return kind === 'identity' ? 1 : 1.5;
}

export function describeProbeChain(chain: ProbeChain): string {
  return chain.points.map((z, j) => `G(${formatComplex(z)})·${chain.weights[j] === 'identity' ? 'I' : 'D'}`).join(' ');
}
