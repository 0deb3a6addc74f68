import { describe, expect, it } from 'vitest';
import { AdapterFault } from '../../../adapters/adapter.js';
import { runComparison } from '../../../harness/compare/run-comparison.js';
import { resultToJson } from '../../../harness/reporters/json-reporter.js';
import { validateRunResultJson } from '../../../harness/reporters/validate-run-result-json.js';
import { randomStream } from '../../../harness/numeric/random-stream.js';
import { sampleMatrix } from '../../../harness/numeric/sample-wigner.js';
import { independentAdapter } from '../../support/independent-adapter.js';
import { mutantAdapter, reference } from '../../support/mutant-adapter.js';
import { testSettings } from '../../support/run-settings-for-tests.js';

/** Small runs: N = 40, 120 samples per side, GOE and GUE. */
const settings = testSettings({ sizes: [40], samples: 120, seed: 5, ensembles: [{ kind: 'goe' }, { kind: 'gue' }] });

const failedIds = (r: Awaited<ReturnType<typeof runComparison>>) => r.comparison.distinguishing;

describe('runComparison', () => {
  it('finds nothing that distinguishes the reference engine from itself', async () => {
    const result = await runComparison(reference, reference, settings, { specifications: { left: 'reference', right: 'reference' } });
    expect(result.counts.fault).toBe(0);
    expect(result.counts.skipped).toBe(0);
    expect(failedIds(result)).toEqual([]);
    // Three routines per ensemble, each agreeing to the last bit on the same matrices.
    expect(result.comparison.agreement).toHaveLength(6);
    for (const row of result.comparison.agreement) {
      expect(row.maxRelativeDifference).toBe(0);
      expect(row.digits).toBeCloseTo(15.95, 2);
    }
    // 2 means + 3 covariances + 2 distributions per ensemble, all two-sample tests under Holm.
    expect(result.falseAlarmControl.statisticalChecks).toBe(14);
    expect(result.suites[0].checks.every((v) => v.replay.startsWith('npx rmt-assay compare --left reference --right reference'))).toBe(true);
    // The JSON report of a comparison follows the published report schema.
    expect(validateRunResultJson(JSON.parse(resultToJson(result)))).toEqual([]);
  });

  it('finds nothing that distinguishes an engine sharing no numerical code with the reference', async () => {
    const result = await runComparison(independentAdapter, reference, settings);
    expect(failedIds(result)).toEqual([]);
    for (const row of result.comparison.agreement) {
      expect(row.ratio).toBeLessThan(row.threshold);
      expect(row.digits).toBeGreaterThan(11);
    }
    // It has no sampler: the two-sample tests are skipped, saying why.
    const skipped = result.suites[0].checks.filter((v) => v.state === 'skipped');
    expect(skipped).toHaveLength(14);
    expect(skipped[0].reason).toMatch(/left \(independent engine.*\) offers neither sample nor sample_statistics/);
  });

  it('finds a trace normalised by N − 1 in the routines that have it, and only there', async () => {
    const minusOne = mutantAdapter('N − 1 traces', {
      resolventTrace: async (m, points, w) => (await reference.resolventTrace(m, points, w)).map((t) => ({ re: (t.re * m.size) / (m.size - 1), im: (t.im * m.size) / (m.size - 1) })),
    }, ['eigenvalues', 'resolvent_trace', 'chain_trace', 'sample']);
    const result = await runComparison(minusOne, reference, settings);
    const distinguishing = failedIds(result);
    expect(distinguishing).toEqual(expect.arrayContaining(['compare/agreement/resolvent-trace/goe/N=40', 'compare/agreement/resolvent-trace/gue/N=40']));
    expect(distinguishing.filter((id) => id.includes('agreement/eigenvalues') || id.includes('agreement/chain-trace'))).toEqual([]);
    const row = result.comparison.agreement.find((r) => r.checkId === 'compare/agreement/resolvent-trace/goe/N=40')!;
    // (N/(N − 1) − 1) = 1/39: agreement to about 1.6 digits.
    expect(row.maxRelativeDifference).toBeCloseTo(1 / 39, 10);
    expect(row.digits).toBeCloseTo(-Math.log10(1 / 39), 6);
    expect(row.worstInput).toMatch(/matrix \d of stream 'probe\/matrix' under seed 5; ⟨G\(z\)A⟩ at z = /);
    // Its matrices are the reference's, reduced by its own resolvent_trace: the means of Tr G(z) move too.
    expect(distinguishing.some((id) => id.startsWith('compare/mean/'))).toBe(true);
  });

  it('finds a GOE sampler whose diagonal has half the variance, through the fluctuations only', async () => {
    const halfDiagonal = mutantAdapter('GOE with diagonal variance 1/N', {
      sample: async (e, n, seed, count) =>
        e.kind === 'goe'
          ? Array.from({ length: count }, (_, i) =>
              sampleMatrix({ kind: 'wigner', field: 'real', offDiagonal: 'gaussian', diagonal: 'gaussian', diagonalVariance: 1 }, n, randomStream(seed, 'half-diagonal', i)),
            )
          : reference.sample(e, n, seed, count),
    }, ['eigenvalues', 'resolvent_trace', 'chain_trace', 'sample']);
    const result = await runComparison(halfDiagonal, reference, testSettings({ sizes: [40], samples: 400, seed: 5, ensembles: [{ kind: 'goe' }, { kind: 'gue' }] }));
    const distinguishing = failedIds(result);
    expect(distinguishing.length).toBeGreaterThan(0);
    expect(distinguishing.every((id) => /^compare\/(mean|covariance|distribution)\/goe\//.test(id))).toBe(true);
  });

  it('turns a side that faults into faults that name the side, and goes on', async () => {
    const faulting = mutantAdapter('broken eigenvalues', {
      eigenvalues: () => Promise.reject(new AdapterFault('eigenvalues', 'implementation-error', 'threw: LAPACK info = 3')),
    });
    const result = await runComparison(reference, faulting, testSettings({ sizes: [24], samples: 40, ensembles: [{ kind: 'goe' }] }));
    const fault = result.suites[0].checks.find((v) => v.id === 'compare/agreement/eigenvalues/goe/N=24')!;
    expect(fault.state).toBe('fault');
    expect(fault.reason).toMatch(/^right \(broken eigenvalues\) eigenvalues: threw: LAPACK info = 3/);
    expect(result.counts.pass).toBeGreaterThan(0);
  });
});
