import fc from 'fast-check';
import { formatComplex, type Complex } from '../../harness/numeric/complex.js';
import { spectralPointArbitrary } from './spectral-points.js';
import { describeWeight, weightSpecArbitrary, type WeightSpec } from './weight-matrices.js';

/** One factor G(z_j)A_j of a chain ⟨G(z1)A1 ⋯ G(zk)Ak⟩. */
export interface ChainLink {
  readonly z: Complex;
  readonly weight: WeightSpec;
}

/** Chains of `minLength` to `maxLength` links; shrinking shortens them and simplifies each link. */
export function chainLinksArbitrary(minLength: number, maxLength: number): fc.Arbitrary<readonly ChainLink[]> {
  return fc.array(fc.record({ z: spectralPointArbitrary(), weight: weightSpecArbitrary() }), { minLength, maxLength });
}

export function describeLinks(links: readonly ChainLink[], size: number): string {
  return links.map((l, j) => `[z${j + 1} = ${formatComplex(l.z)}, A${j + 1} = ${describeWeight(l.weight, size)}]`).join(' ');
}
