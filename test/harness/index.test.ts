import { describe, expect, it } from 'vitest';
import * as api from '../../harness/index.js';
import { CHECK_OPTIONS } from '../../harness/cli/option-table.js';

describe('the package’s main export', () => {
  it('offers the engine, the adapters, the suites, settings, the result model’s helpers, the reporters, compare, baselines and the test helper', () => {
    const names = [
      'runChecks', 'resolveRunSettings', 'SUITES', 'suiteNames',
      'ReferenceAdapter', 'ModuleAdapter', 'ProcessAdapter', 'RecordedAdapter', 'AdapterFault', 'NotAvailable', 'EnsembleNotOffered',
      'terminalReporter', 'formatTerminalSummary', 'jsonReporter', 'resultToJson', 'junitReporter', 'htmlReporter', 'fileReporter',
      'runComparison', 'recordBaseline', 'loadBaseline', 'baselineSuite', 'baselineToJson', 'assertConforms', 'expectConformance',
    ] as const;
    for (const name of names) expect(api[name], name).toBeDefined();
  });

  it('resolves settings with the CLI’s defaults, so a program runs what `rmt-assay check` runs', () => {
    const s = api.resolveRunSettings();
    expect(s.suites.join(',')).toBe(CHECK_OPTIONS.suite.default);
    expect(s.sizes.join(',')).toBe(CHECK_OPTIONS.size.default);
    expect(s.ladder.join(',')).toBe(CHECK_OPTIONS.ladder.default);
    expect(s.ensembles.map(api.ensembleLabel).join(',')).toBe(CHECK_OPTIONS.ensemble.default);
    expect([s.samples, s.seed, s.alpha, s.budget]).toEqual([CHECK_OPTIONS.samples.default, CHECK_OPTIONS.seed.default, CHECK_OPTIONS.alpha.default, CHECK_OPTIONS.budget.default]);
    expect(s.only).toEqual([]);
  });

  it('takes ensembles as specs or in the CLI syntax, and refuses bad values by name', () => {
    expect(api.resolveRunSettings({ ensembles: [{ kind: 'gue' }, 'wigner:real:rademacher:diag=zero'] }).ensembles.map(api.ensembleLabel)).toEqual(['gue', 'wigner:real:rademacher:diag=zero']);
    expect(() => api.resolveRunSettings({ suites: ['wishart'] })).toThrow(/^resolveRunSettings: suite \(--suite\): unknown name 'wishart'/);
    expect(() => api.resolveRunSettings({ alpha: 2 })).toThrow(RangeError);
    expect(() => api.resolveRunSettings({ replayCase: '1:2' })).toThrow(/exactly one --only/);
  });

  it('runs checks on an adapter and returns the result model, which the reporters take', async () => {
    const settings = api.resolveRunSettings({ suites: ['identities'], sizes: [12], ensembles: ['goe'], seed: 2 });
    const result = await api.runChecks(new api.ReferenceAdapter(), settings, settings.suites.map((n) => api.SUITES.get(n)!));
    expect(result.counts.fail + result.counts.fault).toBe(0);
    expect(JSON.parse(api.resultToJson(result)).formatVersion).toBe(api.RESULT_FORMAT_VERSION);
    expect(api.formatTerminalSummary(result, { interactive: false, verbose: false })).toMatch(/\d+ passed, 0 failed/);
  });
});
