import { describe, expect, it } from 'vitest';
import { runChecks } from '../../harness/run-checks.js';
import type { RunResult } from '../../harness/run-result.js';
import { fluctuationsSuite } from '../../properties/fluctuations.js';
import { mutantAdapter, reference } from '../support/mutant-adapter.js';
import { testSettings } from '../support/run-settings-for-tests.js';
import { FLUCTUATION_MUTANTS } from './mutants/fluctuation-mutants.js';

/** Small and quick: N = 80, half the default samples; the N = 200 is the CLI default. */
const SETTINGS = testSettings({ suites: ['fluctuations'], sizes: [80], budget: 0.5, ensembles: [{ kind: 'goe' }, { kind: 'gue' }] });

function failures(result: RunResult): string[] {
  return result.suites[0].checks
    .filter((c) => c.state === 'fail' || c.state === 'fault')
    .map((c) => `${c.id}: ${c.state} ${c.reason ?? ''} z=${c.evidence?.kind === 'statistical' ? c.evidence.zScore : c.evidence?.ratio}`);
}

describe('fluctuations suite', () => {
  it('passes the reference engine on GOE and GUE at the default level, by its sample_statistics, with a power statement on every statistical check', async () => {
    const result = await runChecks(reference, SETTINGS, [fluctuationsSuite]);
    expect(failures(result)).toEqual([]);
    const checks = result.suites[0].checks;
    const statistical = checks.filter((c) => c.evidence?.kind === 'statistical');
    expect(statistical.length).toBeGreaterThan(60);
    for (const c of statistical) {
      expect(c.evidence?.kind === 'statistical' && c.evidence.detectableRelativeError).toBeGreaterThan(0);
    }
    const main = checks.find((c) => c.id === 'fluctuations/goe/N=80/tracial/-1+0.5i,-1+0.5i')!;
    expect(main.path).toMatch(/implementation's sample_statistics/);
    // The reference engine offers no closed form for two general weights: those checks are skipped.
    expect(checks.filter((c) => c.state === 'skipped').map((c) => c.id)).toEqual(
      expect.arrayContaining(['fluctuations/covariance-function/goe/N=80/monte-carlo/two-weights']),
    );
  });

  it('tests a sampler through the harness engine, and says so in the path', async () => {
    const result = await runChecks(mutantAdapter('reference sampler only', {}, ['sample']), { ...SETTINGS, ensembles: [{ kind: 'goe' }] }, [fluctuationsSuite]);
    expect(failures(result)).toEqual([]);
    const checks = result.suites[0].checks;
    expect(checks.find((c) => c.id.endsWith('/tracial/-1+0.5i,-1+0.5i'))!.path).toMatch(/implementation's sampler.*reference engine/);
    expect(checks.find((c) => c.id.endsWith('initial-condition/empty-chain'))!.state).toBe('skipped');
    expect(checks.filter((c) => c.id.includes('covariance-function')).every((c) => c.state === 'skipped')).toBe(true);
  });

  it('skips everything, saying why, for an implementation with neither sampler nor sample_statistics', async () => {
    const result = await runChecks(mutantAdapter('routines only', {}, ['eigenvalues', 'resolvent_trace']), { ...SETTINGS, ensembles: [{ kind: 'goe' }] }, [fluctuationsSuite]);
    const checks = result.suites[0].checks;
    expect(checks.every((c) => c.state === 'skipped')).toBe(true);
    expect(checks[0].reason).toMatch(/neither sample_statistics nor a sampler/);
  });

  for (const mutant of FLUCTUATION_MUTANTS) {
    it(`catches the mutant: ${mutant.name}`, async () => {
      const result = await runChecks(mutant.adapter, { ...SETTINGS, ensembles: [mutant.ensemble], budget: mutant.budget ?? SETTINGS.budget }, [fluctuationsSuite]);
      const failed = result.suites[0].checks.filter((c) => c.state === 'fail');
      expect(failed.some((c) => mutant.broken.test(c.id)), failures(result).join('\n')).toBe(true);
    });
  }
});
