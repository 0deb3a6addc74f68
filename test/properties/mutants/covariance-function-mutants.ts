import { NotAvailable, type Adapter, type ChainSpec } from '../../../adapters/adapter.js';
import { closedFormCovariance } from '../../../adapters/closed-form-covariance.js';
import { add, complex, div, mul, scale, sub, type Complex } from '../../../harness/numeric/complex.js';
import { normalisedTraceOf } from '../../../harness/numeric/square-matrix.js';
import { ensembleConstants, type EnsembleSpec } from '../../../harness/numeric/ensemble.js';
import { weightKind } from '../../../harness/numeric/weight-kind.js';
import { resolventCovariance, tracialResolventCovariance } from '../../../reference-values/resolvent-covariance.js';
import { mutantAdapter } from '../../support/mutant-adapter.js';

/**
 * G(z1)G(z2)A = (G(z1) − G(z2))A/(z1 − z2) (resolvent identity), so a chain [I, A] against one
 * weighted resolvent G(w)B has the divided difference of the weighted one-resolvent covariance.
 */
function oneWeightChain(ensemble: EnsembleSpec, chain: ChainSpec, other: ChainSpec): Complex | null {
  if (chain.points.length !== 2 || other.points.length !== 1) return null;
  if (weightKind(chain.weights[0]) !== 'identity' || weightKind(chain.weights[1]) === 'identity') return null;
  const c = ensembleConstants(ensemble, chain.weights[0].size);
  const [z1, z2] = chain.points;
  const a = chain.weights[1];
  const b = weightKind(other.weights[0]) === 'identity' ? null : other.weights[0];
  const w = other.points[0];
  return div(sub(resolventCovariance(z1, a, w, b, c), resolventCovariance(z2, a, w, b, c)), sub(z1, z2));
}

/** A correct covariance function: the closed forms, and the one-weight chains by the resolvent identity. */
function correctCovariance(ensemble: EnsembleSpec, left: ChainSpec, right: ChainSpec): Complex {
  const value = closedFormCovariance(ensemble, left, right) ?? oneWeightChain(ensemble, left, right) ?? oneWeightChain(ensemble, right, left);
  if (value === null) throw new NotAvailable('no formula for two general weights');
  return value;
}

function covarianceOnly(name: string, covariance: (e: EnsembleSpec, l: ChainSpec, r: ChainSpec) => Complex): Adapter {
  return mutantAdapter(name, { covariance: async (e, l, r) => covariance(e, l, r) }, ['covariance']);
}

export const CORRECT_COVARIANCE = covarianceOnly('covariance function with the resolvent identity', correctCovariance);

export interface CovarianceMutant {
  readonly name: string;
  readonly adapter: Adapter;
  readonly ensemble: EnsembleSpec;
  /** The check (last part of its id) that must fail. */
  readonly broken: string;
}

const RADEMACHER: EnsembleSpec = { kind: 'wigner', field: 'real', offDiagonal: 'rademacher', diagonal: 'zero', diagonalVariance: 0 };

export const COVARIANCE_MUTANTS: readonly CovarianceMutant[] = [
  {
    name: 'not symmetric: a term that depends on which chain is longer',
    adapter: covarianceOnly('asymmetric covariance', (e, l, r) =>
      add(correctCovariance(e, l, r), complex(0, 1e-3 * (l.points.length - r.points.length))),
    ),
    ensemble: { kind: 'goe' },
    broken: 'symmetry',
  },
  {
    name: 'the empty chain does not give 0',
    adapter: covarianceOnly('covariance with a constant for the empty chain', (e, l, r) =>
      l.points.length === 0 || r.points.length === 0 ? complex(1e-3) : correctCovariance(e, l, r),
    ),
    ensemble: { kind: 'goe' },
    broken: 'empty-chain',
  },
  {
    name: 'the tracial covariance with 1/β instead of 2/β',
    adapter: covarianceOnly('tracial covariance off by a factor', (e, l, r) => {
      const value = correctCovariance(e, l, r);
      const single = l.points.length === 1 && r.points.length === 1 && weightKind(l.weights[0]) === 'identity' && weightKind(r.weights[0]) === 'identity';
      if (!single) return value;
      const c = ensembleConstants(e, l.weights[0].size);
      // Subtract half of the (2/β)m1′m2′/(1 − m1m2)² term: the value at σ_d² = 2/β, κ4 = 0, halved.
      const gaussianPart = tracialResolventCovariance(l.points[0], r.points[0], { ...c, diagonalVariance: 2 / c.beta, kappa4: 0 });
      return sub(value, scale(gaussianPart, 0.5));
    }),
    ensemble: { kind: 'goe' },
    broken: 'closed-form/tracial',
  },
  {
    name: 'the traceless covariance without its diagonal bracket (Gaussian-only), on a Rademacher matrix',
    adapter: covarianceOnly('Gaussian-only traceless covariance', (e, l, r) => {
      const weighted = l.points.length === 1 && r.points.length === 1 && (weightKind(l.weights[0]) !== 'identity' || weightKind(r.weights[0]) !== 'identity');
      if (!weighted) return correctCovariance(e, l, r);
      const c = ensembleConstants(e, l.weights[0].size);
      const gaussian = { ...c, diagonalVariance: 2 / c.beta, kappa4: 0 };
      // ⟨A1⟩⟨A2⟩ × tracial at the ensemble's constants, plus the traceless part at the Gaussian ones.
      const traces = mul(normalisedTraceOf(l.weights[0]), normalisedTraceOf(r.weights[0]));
      const gaussianWhole = resolventCovariance(l.points[0], l.weights[0], r.points[0], r.weights[0], gaussian);
      const tracialShift = sub(tracialResolventCovariance(l.points[0], r.points[0], c), tracialResolventCovariance(l.points[0], r.points[0], gaussian));
      return add(gaussianWhole, mul(traces, tracialShift));
    }),
    ensemble: RADEMACHER,
    broken: 'closed-form/weighted',
  },
  {
    name: 'a chain with one general weight answered without its traceless part (0 for a traceless weight)',
    adapter: covarianceOnly('one-weight chains without the traceless part', (e, l, r) =>
      oneWeightChain(e, l, r) !== null || oneWeightChain(e, r, l) !== null ? complex(0) : correctCovariance(e, l, r),
    ),
    ensemble: { kind: 'goe' },
    broken: 'monte-carlo/one-weight',
  },
];
