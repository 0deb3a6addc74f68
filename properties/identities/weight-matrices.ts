import fc from 'fast-check';
import type { CheckContext } from '../../harness/check-group.js';
import type { RandomStream } from '../../harness/numeric/random-stream.js';
import { identityMatrix, zeroMatrix, type SquareMatrix } from '../../harness/numeric/square-matrix.js';

/**
 * The deterministic matrices A in ⟨G(z)A⟩ and in chains, each of operator norm of order one:
 * - identity: I;
 * - diagonal: real, entries uniform on (−1, 1);
 * - projection: the orthogonal projection onto a random subspace of the given rank (Hermitian,
 *   idempotent, norm 1);
 * - traceless: a real symmetric matrix with entries uniform on (−1, 1)/√N, minus its normalised
 *   trace times I (so ⟨A⟩ = 0);
 * - bounded: real and non-symmetric, entries uniform on (−1, 1)/√N;
 * - complex: complex and non-Hermitian, real and imaginary parts uniform on (−1, 1)/√N.
 * The non-symmetric kinds are what expose a transposed or conjugated weight; the traceless one
 * removes the part of ⟨G A⟩ that ⟨G⟩⟨A⟩ already explains.
 */
export type WeightKind = 'identity' | 'diagonal' | 'projection' | 'traceless' | 'bounded' | 'complex';

export interface WeightSpec {
  readonly kind: WeightKind;
  /** Index of the harness stream the weight's entries come from (key WEIGHT_STREAM_KEY). */
  readonly stream: number;
  /** Rank of a projection before capping at N; unused by the other kinds. */
  readonly rank: number;
}

export const WEIGHT_STREAM_KEY = 'identities/weight';

const KINDS: readonly WeightKind[] = ['identity', 'diagonal', 'projection', 'traceless', 'bounded', 'complex'];

/** Shrinks towards the identity, stream 0 and rank 1. */
export function weightSpecArbitrary(): fc.Arbitrary<WeightSpec> {
  return fc.record({
    kind: fc.constantFrom(...KINDS),
    stream: fc.integer({ min: 0, max: 999_999 }),
    rank: fc.integer({ min: 1, max: 40 }),
  });
}

function projectionRank(spec: WeightSpec, size: number): number {
  return Math.max(1, Math.min(spec.rank, size));
}

export function describeWeight(spec: WeightSpec, size: number): string {
  const from = `weight stream ${spec.stream}, key '${WEIGHT_STREAM_KEY}'`;
  switch (spec.kind) {
    case 'identity':
      return 'identity';
    case 'diagonal':
      return `diagonal, entries uniform on (−1, 1) (${from})`;
    case 'projection':
      return `projection onto a random subspace of rank ${projectionRank(spec, size)} (${from})`;
    case 'traceless':
      return `traceless symmetric, entries uniform on (−1, 1)/√N (${from})`;
    case 'bounded':
      return `real non-symmetric, entries uniform on (−1, 1)/√N (${from})`;
    case 'complex':
      return `complex non-Hermitian, parts uniform on (−1, 1)/√N (${from})`;
  }
}

export function weightMatrix(context: CheckContext, spec: WeightSpec, size: number): SquareMatrix {
  if (spec.kind === 'identity') return identityMatrix('real', size);
  const stream = context.stream(WEIGHT_STREAM_KEY, spec.stream);
  switch (spec.kind) {
    case 'diagonal': {
      const m = zeroMatrix('real', size);
      for (let i = 0; i < size; i++) m.data[i * size + i] = symmetricUniform(stream);
      return m;
    }
    case 'projection':
      return randomProjection(stream, size, projectionRank(spec, size));
    case 'traceless':
      return tracelessSymmetric(stream, size);
    case 'bounded':
    case 'complex': {
      const m = zeroMatrix(spec.kind === 'complex' ? 'complex' : 'real', size);
      const s = 1 / Math.sqrt(size);
      for (let k = 0; k < m.data.length; k++) m.data[k] = s * symmetricUniform(stream);
      return m;
    }
  }
}

function symmetricUniform(stream: RandomStream): number {
  return 2 * stream.nextUniform() - 1;
}

function tracelessSymmetric(stream: RandomStream, size: number): SquareMatrix {
  const m = zeroMatrix('real', size);
  const s = 1 / Math.sqrt(size);
  let trace = 0;
  for (let i = 0; i < size; i++) {
    for (let j = i; j < size; j++) {
      const x = s * symmetricUniform(stream);
      m.data[i * size + j] = x;
      m.data[j * size + i] = x;
      if (i === j) trace += x;
    }
  }
  const mean = trace / size;
  for (let i = 0; i < size; i++) m.data[i * size + i] -= mean;
  return m;
}

/**
 * P = QQᵀ with Q the N×r orthonormal basis that modified Gram–Schmidt makes of r Gaussian vectors
 * (Golub and Van Loan 2013, Matrix Computations, 4th ed., §5.2.8). Gaussian vectors are linearly
 * independent with probability one; MGS loses orthogonality only in proportion to their condition
 * number, which for r ≤ N Gaussian columns is modest at these sizes (common practice).
 */
function randomProjection(stream: RandomStream, size: number, rank: number): SquareMatrix {
  const q = new Float64Array(rank * size); // column c at q[c·N … c·N + N − 1]
  for (let c = 0; c < rank; c++) {
    const col = q.subarray(c * size, (c + 1) * size);
    for (let i = 0; i < size; i++) col[i] = stream.nextNormal();
    for (let p = 0; p < c; p++) {
      const prev = q.subarray(p * size, (p + 1) * size);
      let dot = 0;
      for (let i = 0; i < size; i++) dot += prev[i] * col[i];
      for (let i = 0; i < size; i++) col[i] -= dot * prev[i];
    }
    let norm = 0;
    for (let i = 0; i < size; i++) norm += col[i] * col[i];
    norm = Math.sqrt(norm);
    for (let i = 0; i < size; i++) col[i] /= norm;
  }
  const m = zeroMatrix('real', size);
  for (let c = 0; c < rank; c++) {
    const col = q.subarray(c * size, (c + 1) * size);
    for (let i = 0; i < size; i++) {
      const ci = col[i];
      for (let j = 0; j < size; j++) m.data[i * size + j] += ci * col[j];
    }
  }
  return m;
}
