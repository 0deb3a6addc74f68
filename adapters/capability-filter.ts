import type { Adapter, AdapterDescription, Capability } from './adapter.js';

/**
 * The same implementation, declaring only some of its capabilities (`--offer`): to check one
 * routine at a time, or to make a recording template whose matrices the harness draws (leave
 * `sample` out) for a program elsewhere to answer. The harness calls only declared methods, so the
 * others are never reached.
 */
export function offeringOnly(adapter: Adapter, offered: readonly Capability[]): Adapter {
  return {
    describe: async (): Promise<AdapterDescription> => {
      const d = await adapter.describe();
      return { ...d, capabilities: d.capabilities.filter((c) => offered.includes(c)) };
    },
    eigenvalues: (m) => adapter.eigenvalues(m),
    resolventTrace: (m, p, w) => adapter.resolventTrace(m, p, w),
    chainTrace: (m, p, w) => adapter.chainTrace(m, p, w),
    sample: (e, n, s, c) => adapter.sample(e, n, s, c),
    covariance: adapter.covariance?.bind(adapter),
    sampleStatistics: adapter.sampleStatistics?.bind(adapter),
    close: () => adapter.close(),
  };
}
