import { ZERO, mul, type Complex } from '../harness/numeric/complex.js';
import { ensembleConstants, type EnsembleSpec } from '../harness/numeric/ensemble.js';
import { normalisedTraceOf, type SquareMatrix } from '../harness/numeric/square-matrix.js';
import { weightKind } from '../harness/numeric/weight-kind.js';
import { identityChainCovariance } from '../reference-values/chain-covariance.js';
import { resolventCovariance } from '../reference-values/resolvent-covariance.js';
import type { ChainSpec } from './adapter.js';

/**
 * The limiting covariance of the Tr statistics of two chains wherever rmt-assay has a closed form
 * for it (issue items 1 and 2), or null where it has none (chains of length ≥ 2 with a weight other
 * than the identity):
 * - an empty chain: its statistic is Tr I − E Tr I = 0, so the covariance is 0;
 * - one resolvent each, any weights: `resolventCovariance` (tracial part times ⟨A1⟩⟨A2⟩ plus the
 *   traceless part; Khorunzhy, Khoruzhenko and Pastur 1996; THEORY.md);
 * - identity weights throughout, any lengths: `identityChainCovariance` (the chain is a divided
 *   difference of one-resolvent statistics, G(z1)G(z2) = (G(z1) − G(z2))/(z1 − z2));
 * - an identity chain against one weighted resolvent G(w)A: ⟨A⟩ times the identity-chain covariance
 *   with the chain (w), because the identity chain is tracial and the traceless part Å is
 *   asymptotically uncorrelated with tracial statistics (THEORY.md, "General A").
 * The constants (β, σ_d², κ4) are the ensemble's at the weights' size N (κ4 of a sparse law
 * depends on N).
 */
export function closedFormCovariance(ensemble: EnsembleSpec, left: ChainSpec, right: ChainSpec): Complex | null {
  if (left.points.length === 0 || right.points.length === 0) return ZERO;
  const size = left.weights[0].size;
  const c = ensembleConstants(ensemble, size);
  const identity = (chain: ChainSpec) => chain.weights.every((w) => weightKind(w) === 'identity');
  const onlyWeight = (chain: ChainSpec): SquareMatrix | null => (identity(chain) ? null : chain.weights[0]);
  if (left.points.length === 1 && right.points.length === 1) {
    return resolventCovariance(left.points[0], onlyWeight(left), right.points[0], onlyWeight(right), c);
  }
  const leftIdentity = identity(left);
  const rightIdentity = identity(right);
  if (leftIdentity && rightIdentity) return identityChainCovariance([...left.points], [...right.points], c);
  if (leftIdentity && right.points.length === 1) {
    return mul(normalisedTraceOf(right.weights[0]), identityChainCovariance([...left.points], [...right.points], c));
  }
  if (rightIdentity && left.points.length === 1) {
    return mul(normalisedTraceOf(left.weights[0]), identityChainCovariance([...left.points], [...right.points], c));
  }
  return null;
}
