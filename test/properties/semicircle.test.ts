import { describe, expect, it } from 'vitest';
import { runChecks } from '../../harness/run-checks.js';
import { semicircleSuite } from '../../properties/semicircle.js';
import { reference } from '../support/mutant-adapter.js';
import { testSettings } from '../support/run-settings-for-tests.js';
import { SEMICIRCLE_MUTANTS } from './mutants/semicircle-mutants.js';

describe('semicircle suite', () => {
  it('passes the reference engine on GOE, GUE and a Rademacher Wigner matrix at the default level', async () => {
    const result = await runChecks(
      reference,
      testSettings({
        ensembles: [{ kind: 'goe' }, { kind: 'gue' }, { kind: 'wigner', field: 'real', offDiagonal: 'rademacher', diagonal: 'zero', diagonalVariance: 0 }],
      }),
      [semicircleSuite],
    );
    const failures = result.suites[0].checks.filter((c) => c.state !== 'pass');
    expect(failures.map((f) => `${f.id}: ${f.state} ${f.reason ?? ''} z=${f.evidence?.kind === 'statistical' ? f.evidence.zScore : ''}`)).toEqual([]);
    expect(result.counts.pass).toBe(3 * (6 + 4 + 1));
  });

  for (const mutant of SEMICIRCLE_MUTANTS) {
    it(`catches the mutant: ${mutant.name}`, async () => {
      const result = await runChecks(mutant.adapter, testSettings(), [semicircleSuite]);
      const failed = result.suites[0].checks.filter((c) => c.state === 'fail');
      expect(failed.length).toBeGreaterThan(0);
      expect(failed.some((c) => mutant.broken.test(c.id))).toBe(true);
      for (const f of failed) expect(f.replay).toMatch(new RegExp(`--only '?${f.id.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}`));
    });
  }

  it('says what it skipped and why when the implementation offers nothing it can exercise', async () => {
    const { mutantAdapter } = await import('../support/mutant-adapter.js');
    const result = await runChecks(mutantAdapter('chain-only', {}, ['chain_trace']), testSettings(), [semicircleSuite]);
    const checks = result.suites[0].checks;
    expect(checks.every((c) => c.state === 'skipped')).toBe(true);
    expect(checks[0].reason).toMatch(/neither a sampler nor/);
  });
});

describe('semicircle suite replay', () => {
  it('re-runs exactly one check of a shared-sample group with --only, with the same result', async () => {
    const settings = testSettings({ sizes: [60], samples: 60 });
    const full = await runChecks(reference, settings, [semicircleSuite]);
    const third = full.suites[0].checks.filter((c) => c.id.includes('stieltjes-mean'))[2];
    const replay = await runChecks(reference, { ...settings, only: [third.id] }, [semicircleSuite]);
    const [again] = replay.suites[0].checks;
    expect(replay.suites[0].checks).toHaveLength(1);
    expect(again.id).toBe(third.id);
    expect(again.evidence).toEqual(third.evidence);
  });
});
