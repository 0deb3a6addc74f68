import { describe, expect, it } from 'vitest';
import { AdapterFault } from '../../adapters/adapter.js';
import type { CheckVerdict } from '../../harness/verdict.js';
import { runChecks } from '../../harness/run-checks.js';
import type { RunSettings } from '../../harness/run-settings.js';
import { identitiesSuite } from '../../properties/identities.js';
import { independentAdapter } from '../support/independent-adapter.js';
import { mutantAdapter, reference } from '../support/mutant-adapter.js';
import { testSettings } from '../support/run-settings-for-tests.js';
import { IDENTITIES_MUTANTS } from './mutants/identities-mutants.js';

/** Small and fast: 20 cases per property (samples / 5), N from 2 to 40 and 24, GOE and GUE. */
function settings(overrides: Partial<RunSettings> = {}): RunSettings {
  return testSettings({ suites: ['identities'], sizes: [24], samples: 100, ensembles: [{ kind: 'goe' }, { kind: 'gue' }], ...overrides });
}

const CHECK_COUNT = 15;

function replayCaseOf(verdict: CheckVerdict): string {
  const match = / --case (\S+)$/.exec(verdict.replay);
  if (match === null) throw new Error(`no --case in the replay command: ${verdict.replay}`);
  return match[1];
}

/** The replayable description of a case, without the fast-check bookkeeping around it. */
function caseText(verdict: CheckVerdict): string {
  const text = verdict.evidence?.kind === 'deterministic' ? (verdict.evidence.worstInput ?? '') : '';
  return text.replace(/^.*?: (?=N = )/, '').replace(/; fast-check seed .*$/, '');
}

describe('identities suite', () => {
  it('passes the reference engine on every check (GOE, GUE and a sparse Wigner law that can draw the zero matrix)', async () => {
    const result = await runChecks(
      reference,
      settings({
        ensembles: [
          { kind: 'goe' },
          { kind: 'gue' },
          { kind: 'wigner', field: 'real', offDiagonal: 'sparse-bernoulli', meanDegree: 1, diagonal: 'zero', diagonalVariance: 0 },
        ],
      }),
      [identitiesSuite],
    );
    const checks = result.suites[0].checks;
    expect(checks.filter((c) => c.state !== 'pass').map((c) => `${c.id}: ${c.state} ${c.reason ?? ''}`)).toEqual([]);
    expect(checks).toHaveLength(CHECK_COUNT);
    for (const c of checks) {
      expect(c.evidence?.kind).toBe('deterministic');
      if (c.evidence?.kind !== 'deterministic') continue;
      // A pass reports the worst case it tried, readably.
      expect(c.evidence.worstInput).toMatch(/^worst of 20 case\(s\): N = \d+, ensemble /);
      expect(c.evidence.ratio).toBeLessThanOrEqual(c.evidence.threshold);
    }
  });

  it('passes a correct engine built differently (ml-matrix QL, Gaussian elimination): the tolerances are not bit-identity', async () => {
    const result = await runChecks(independentAdapter, settings(), [identitiesSuite]);
    const checks = result.suites[0].checks;
    expect(checks.filter((c) => c.state !== 'pass').map((c) => `${c.id}: ${c.state} ${c.reason ?? ''}`)).toEqual([]);
    // The agreement checks did compare two different computations.
    const agreement = checks.filter((c) => c.id.startsWith('identities/agreement/'));
    expect(agreement.some((c) => c.evidence?.kind === 'deterministic' && c.evidence.ratio > 0)).toBe(true);
  });

  for (const mutant of IDENTITIES_MUTANTS) {
    it(`catches the mutant: ${mutant.name}`, async () => {
      const result = await runChecks(mutant.adapter, settings(), [identitiesSuite]);
      const failed = result.suites[0].checks.filter((c) => c.state === 'fail');
      expect(failed.map((c) => c.id)).toContainEqual(expect.stringMatching(mutant.broken));
      for (const f of failed) {
        expect(f.evidence?.kind).toBe('deterministic');
        if (f.evidence?.kind !== 'deterministic') continue;
        expect(f.evidence.ratio).toBeGreaterThan(f.evidence.threshold);
        expect(f.evidence.worstInput).toMatch(/counterexample shrunk \d+ time\(s\) after \d+ case\(s\): N = \d+, ensemble (goe|gue), matrix stream \d+/);
        expect(f.evidence.worstInput).toMatch(/fast-check seed -?\d+, path [\d:]+/);
        expect(f.replay).toMatch(/--only identities\/\S+ --case [\d:]+$/);
      }
    });
  }

  it('shrinks a counterexample to a small case', async () => {
    const weightless = IDENTITIES_MUTANTS.find((m) => m.name === 'weight ignored')!;
    const result = await runChecks(weightless.adapter, settings({ only: ['identities/weight-linearity'] }), [identitiesSuite]);
    const [verdict] = result.suites[0].checks;
    expect(verdict.state).toBe('fail');
    // Any N fails this mutant, so shrinking reaches the smallest size, the first ensemble and stream 0.
    expect(caseText(verdict)).toMatch(/^N = 2, ensemble goe, matrix stream 0 /);
  });

  for (const name of ['chain in reversed order', 'float32 passed off as float64', 'weight transposed']) {
    it(`replays the shrunk case of the mutant '${name}' with --only and --case`, async () => {
      const mutant = IDENTITIES_MUTANTS.find((m) => m.name === name)!;
      const first = await runChecks(mutant.adapter, settings(), [identitiesSuite]);
      const failed = first.suites[0].checks.find((c) => c.state === 'fail' && mutant.broken.test(c.id))!;
      const replayed = await runChecks(mutant.adapter, settings({ only: [failed.id], replayCase: replayCaseOf(failed) }), [identitiesSuite]);
      const checks = replayed.suites[0].checks;
      expect(checks.map((c) => [c.id, c.state])).toEqual([[failed.id, 'fail']]);
      expect(caseText(checks[0])).toBe(caseText(failed));
      expect(checks[0].evidence?.kind === 'deterministic' && checks[0].evidence.ratio).toBe(
        failed.evidence?.kind === 'deterministic' && failed.evidence.ratio,
      );
      expect(checks[0].evidence?.kind === 'deterministic' && checks[0].evidence.worstInput).toMatch(/^replayed case: /);
      // The same case replayed against the reference engine passes: the failure was the mutant's.
      const fixed = await runChecks(reference, settings({ only: [failed.id], replayCase: replayCaseOf(failed) }), [identitiesSuite]);
      expect(fixed.suites[0].checks.map((c) => c.state)).toEqual(['pass']);
      expect(caseText(fixed.suites[0].checks[0])).toBe(caseText(failed));
    });
  }

  it('skips what the implementation cannot do, naming the missing capability', async () => {
    const result = await runChecks(mutantAdapter('eigenvalues only', {}, ['eigenvalues']), settings(), [identitiesSuite]);
    const checks = result.suites[0].checks;
    expect(checks.filter((c) => c.state === 'pass').map((c) => c.id)).toEqual([
      'identities/eigenvalues/count',
      'identities/eigenvalues/ascending',
      'identities/eigenvalues/trace',
      'identities/eigenvalues/sum-of-squares',
      'identities/agreement/eigenvalues',
    ]);
    const skipped = checks.filter((c) => c.state === 'skipped');
    expect(skipped).toHaveLength(CHECK_COUNT - 5);
    expect(skipped.find((c) => c.id === 'identities/resolvent-identity')?.reason).toBe(
      'the implementation does not offer resolvent_trace and chain_trace',
    );
    expect(skipped.find((c) => c.id === 'identities/ward-identity')?.reason).toBe('the implementation does not offer chain_trace');
  });

  it('turns an adapter fault into a fault of the checks that met it, and goes on with the rest', async () => {
    const faulty = mutantAdapter('faulty resolvent', {
      resolventTrace: async () => {
        throw new AdapterFault('resolventTrace', 'crashed', 'the routine crashed');
      },
    });
    const result = await runChecks(faulty, settings(), [identitiesSuite]);
    const checks = result.suites[0].checks;
    const faulted = checks.filter((c) => c.state === 'fault');
    expect(faulted.map((c) => c.id)).toContain('identities/herglotz-sign');
    for (const f of faulted) expect(f.reason).toBe('resolventTrace: the routine crashed');
    expect(checks.find((c) => c.id === 'identities/chain-cyclicity')?.state).toBe('pass');
    expect(checks.find((c) => c.id === 'identities/eigenvalues/trace')?.state).toBe('pass');
  });
});
