import type { ChainSpec } from '../../adapters/adapter.js';
import { complex, conj, formatComplex, scale, type Complex } from '../../harness/numeric/complex.js';
import { identityMatrix, type SquareMatrix } from '../../harness/numeric/square-matrix.js';
import { contourCoefficients, contourNodes } from './contour-quadrature.js';
import type { TestFunction } from './test-functions.js';

/**
 * Which samples a statistic is observed on: 'spectral' statistics (identity weights only, so the
 * spectrum suffices) on every sample; 'weighted' ones (weights that need eigenvectors) on the
 * first samples only, which are a prefix of the same sequence, so the two kinds pair up there.
 */
export type Tier = 'spectral' | 'weighted';

/**
 * A Tr statistic: Σ_j a_j · N⟨chain_j⟩ over the book's chains, a term taken complex-conjugated
 * where `conjugate` is set (so that E|X − EX|² = Cov(X, X̄) is a covariance of observed values of
 * one chain, not of two chains observed apart). Centred by the estimators.
 */
export interface StatisticTerm {
  readonly chain: number;
  readonly coefficient: Complex;
  readonly conjugate?: boolean;
}

export interface Statistic {
  readonly label: string;
  readonly tier: Tier;
  readonly terms: readonly StatisticTerm[];
}

/** X̄: the complex conjugate of a statistic, sample by sample. */
export function conjugated(x: Statistic): Statistic {
  return {
    label: `conj ${x.label}`,
    tier: x.tier,
    terms: x.terms.map((t) => ({ chain: t.chain, coefficient: conj(t.coefficient), conjugate: !t.conjugate })),
  };
}

interface BookChain {
  readonly key: string;
  readonly spec: ChainSpec;
  readonly tier: Tier;
}

/**
 * The chains whose normalised traces the fluctuation checks of one ensemble and size need, each
 * requested once per sample, and the statistics built from them: Tr G(z), identity chains,
 * weighted resolvents, linear statistics by contour quadrature, mesoscopic Lorentzian statistics.
 */
export class StatisticBook {
  private readonly entries: BookChain[] = [];
  private readonly byKey = new Map<string, number>();
  readonly identity: SquareMatrix;

  constructor(readonly size: number) {
    this.identity = identityMatrix('real', size);
  }

  get chains(): readonly BookChain[] {
    return this.entries;
  }

  /** The chains to request on a sample of the given tier ('weighted' samples carry every chain). */
  chainsFor(tier: Tier): ChainSpec[] {
    return this.entries.filter((c) => tier === 'weighted' || c.tier === 'spectral').map((c) => c.spec);
  }

  /** Indices into chainsFor(tier) of every chain, or −1 where the tier does not carry it. */
  positionsFor(tier: Tier): number[] {
    let next = 0;
    return this.entries.map((c) => (tier === 'weighted' || c.tier === 'spectral' ? next++ : -1));
  }

  private chain(key: string, spec: ChainSpec, tier: Tier): number {
    const known = this.byKey.get(key);
    if (known !== undefined) return known;
    this.entries.push({ key, spec, tier });
    this.byKey.set(key, this.entries.length - 1);
    return this.entries.length - 1;
  }

  /** Tr G(z1)G(z2)⋯G(zk) (identity weights); one point is Tr G(z). */
  identityChain(points: readonly Complex[]): Statistic {
    const label = `Tr ${points.map((z) => `G(${formatComplex(z)})`).join('')}`;
    const index = this.chain(label, { points, weights: points.map(() => this.identity) }, 'spectral');
    return { label, tier: 'spectral', terms: [{ chain: index, coefficient: complex(1) }] };
  }

  resolvent(z: Complex): Statistic {
    return this.identityChain([z]);
  }

  /** Tr G(z)A for a named weight A (needs eigenvectors). */
  weighted(z: Complex, weightName: string, weight: SquareMatrix): Statistic {
    const label = `Tr G(${formatComplex(z)})${weightName}`;
    const index = this.chain(label, { points: [z], weights: [weight] }, 'weighted');
    return { label, tier: 'weighted', terms: [{ chain: index, coefficient: complex(1) }] };
  }

  /** Tr f(H) = Σ_j a_j Tr G(z_j) on the quadrature contour (contour-quadrature.ts). */
  linear(f: TestFunction): Statistic {
    const nodes = contourNodes();
    const coefficients = contourCoefficients(f.complex, nodes);
    const terms = nodes.map((node, j) => ({ chain: this.resolvent(node.z).terms[0].chain, coefficient: coefficients[j] }));
    return { label: `Tr ${f.name.replace(/x/g, 'H')}`, tier: 'spectral', terms };
  }

  /**
   * The mesoscopic Lorentzian statistic Tr f(N^γ(H − E)) with f(x) = 1/(1 + x²), which equals
   * η Im Tr G(E + iη) = (η/2i)(X − X̄), X = Tr G(E + iη), η = N^{−γ}.
   */
  lorentzian(energy: number, eta: number): Statistic {
    const x = this.resolvent(complex(energy, eta));
    const c = complex(0, -eta / 2);
    return {
      label: `Tr f(N^γ(H − ${energy})), f = 1/(1 + x²), η = ${eta.toPrecision(4)}`,
      tier: 'spectral',
      terms: [
        { chain: x.terms[0].chain, coefficient: c },
        { chain: x.terms[0].chain, coefficient: scale(c, -1), conjugate: true },
      ],
    };
  }

  /** The empty chain: N⟨I⟩ = N on every sample, so its statistic is 0. */
  empty(): Statistic {
    const index = this.chain('Tr I', { points: [], weights: [] }, 'spectral');
    return { label: 'Tr I (empty chain)', tier: 'spectral', terms: [{ chain: index, coefficient: complex(1) }] };
  }
}
