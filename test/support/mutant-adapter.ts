import type { Adapter, AdapterDescription, Capability } from '../../adapters/adapter.js';
import { ReferenceAdapter } from '../../adapters/reference-adapter.js';

/**
 * A deliberately broken implementation: the reference engine with some methods replaced.
 * `capabilities` restricts what it declares (default: everything the reference offers), so a
 * mutant can also stand for an implementation that offers only a sampler, say.
 */
export function mutantAdapter(
  name: string,
  overrides: Partial<Pick<Adapter, 'eigenvalues' | 'resolventTrace' | 'chainTrace' | 'sample' | 'covariance' | 'sampleStatistics'>>,
  capabilities?: readonly Capability[],
): Adapter {
  const reference = new ReferenceAdapter();
  return {
    async describe(): Promise<AdapterDescription> {
      const d = await reference.describe();
      return { ...d, name, kind: 'module', capabilities: capabilities ?? d.capabilities };
    },
    eigenvalues: overrides.eigenvalues ?? ((m) => reference.eigenvalues(m)),
    resolventTrace: overrides.resolventTrace ?? ((m, p, w) => reference.resolventTrace(m, p, w)),
    chainTrace: overrides.chainTrace ?? ((m, p, w) => reference.chainTrace(m, p, w)),
    sample: overrides.sample ?? ((e, n, s, c) => reference.sample(e, n, s, c)),
    covariance: overrides.covariance ?? ((e, l, r) => reference.covariance(e, l, r)),
    sampleStatistics: overrides.sampleStatistics ?? ((e, n, s, c, st) => reference.sampleStatistics(e, n, s, c, st)),
    close: () => reference.close(),
  };
}

/** The reference engine, as an Adapter, for the other half of the comparison. */
export const reference = new ReferenceAdapter();
