import type { RunSettings } from '../../harness/run-settings.js';

/** Small, fixed-seed settings for suite tests; override what a test needs. */
export function testSettings(overrides: Partial<RunSettings> = {}): RunSettings {
  return {
    suites: ['semicircle'],
    sizes: [100],
    ladder: [50, 100, 200],
    samples: 150,
    seed: 11,
    alpha: 1e-3,
    ensembles: [{ kind: 'goe' }],
    only: [],
    replayCase: '',
    adapterArguments: '',
    budget: 1,
    ...overrides,
  };
}
