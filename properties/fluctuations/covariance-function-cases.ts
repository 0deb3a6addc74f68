import type { ChainSpec } from '../../adapters/adapter.js';
import { conj, formatComplex, type Complex } from '../../harness/numeric/complex.js';
import { identityMatrix, type SquareMatrix } from '../../harness/numeric/square-matrix.js';
import { designWeights, Z_A, Z_B, Z_C } from './fluctuation-design.js';

/** A pair of chains whose covariance an implementation is asked for, and what kind of case it is. */
export interface ChainPair {
  readonly kind: 'tracial' | 'weighted' | 'identity-chain' | 'chain-vs-weighted' | 'general';
  readonly left: ChainSpec;
  readonly right: ChainSpec;
  readonly text: string;
}

/** The cases of issue item 6 at size N: every closed-form kind of items 1–2, and two without one. */
export function chainPairs(size: number): { closedForm: ChainPair[]; general: ChainPair[] } {
  const w = designWeights(size);
  const I = identityMatrix('real', size);
  const names = new Map<SquareMatrix, string>([
    [w.D, 'D'],
    [w.S, 'S'],
    [w.P, 'P'],
    [w.A, 'A'],
    [I, ''],
  ]);
  const chain = (...links: Array<[Complex, SquareMatrix]>): ChainSpec => ({ points: links.map((l) => l[0]), weights: links.map((l) => l[1]) });
  const text = (c: ChainSpec) => c.points.map((z, j) => `G(${formatComplex(z)})${names.get(c.weights[j]) ?? '?'}`).join('');
  const pair = (kind: ChainPair['kind'], left: ChainSpec, right: ChainSpec): ChainPair => ({ kind, left, right, text: `(${text(left)}, ${text(right)})` });
  const closedForm = [
    pair('tracial', chain([Z_A, I]), chain([Z_B, I])),
    pair('tracial', chain([Z_A, I]), chain([conj(Z_A), I])),
    pair('tracial', chain([Z_C, I]), chain([Z_C, I])),
    pair('weighted', chain([Z_A, w.D]), chain([Z_B, w.D])),
    pair('weighted', chain([Z_A, w.S]), chain([conj(Z_B), w.S])),
    pair('weighted', chain([Z_A, w.P]), chain([Z_A, w.P])),
    pair('weighted', chain([Z_A, w.A]), chain([Z_B, w.A])),
    pair('weighted', chain([Z_A, I]), chain([Z_B, w.D])),
    pair('identity-chain', chain([Z_A, I], [Z_B, I]), chain([conj(Z_A), I], [Z_C, I])),
    pair('identity-chain', chain([Z_A, I], [Z_A, I]), chain([Z_B, I])),
    pair('identity-chain', chain([Z_A, I], [Z_B, I], [Z_C, I]), chain([conj(Z_A), I], [Z_C, I])),
    pair('chain-vs-weighted', chain([Z_A, I], [Z_B, I]), chain([Z_C, w.A])),
  ];
  const general = [
    // One weight among identities: a divided difference of weighted one-resolvent statistics.
    pair('general', chain([Z_A, I], [Z_B, w.D]), chain([conj(Z_A), w.D])),
    // Two general weights: no closed form in rmt-assay.
    pair('general', chain([Z_A, w.D], [Z_B, w.S]), chain([conj(Z_B), w.S], [conj(Z_A), w.D])),
  ];
  return { closedForm, general };
}

/** The empty chain (its statistic is Tr I − E Tr I = 0). */
export const EMPTY_CHAIN: ChainSpec = { points: [], weights: [] };
