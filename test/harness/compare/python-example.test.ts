import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ProcessAdapter } from '../../../adapters/process/process-adapter.js';
import { baselineToJson } from '../../../harness/baseline/baseline-json.js';
import { baselineSuite } from '../../../harness/baseline/baseline-suite.js';
import { validateBaseline } from '../../../harness/baseline/load-baseline.js';
import { recordBaseline } from '../../../harness/baseline/record-baseline.js';
import { runComparison } from '../../../harness/compare/run-comparison.js';
import { runChecks } from '../../../harness/run-checks.js';
import { reference } from '../../support/mutant-adapter.js';
import { testSettings } from '../../support/run-settings-for-tests.js';

/** The numpy lab kernel over the process protocol, as `--exec "python3 examples/python/lab_kernel.py"` runs it. */
const kernel = join(import.meta.dirname, '..', '..', '..', 'examples', 'python', 'lab_kernel.py');
const hasNumpy = spawnSync('python3', ['-c', 'import numpy'], { stdio: 'ignore' }).status === 0;

describe.skipIf(!hasNumpy)('the numpy example against the reference engine', () => {
  let numpy: ProcessAdapter;
  beforeAll(async () => {
    numpy = await ProcessAdapter.start(`python3 ${kernel}`, { timeoutMs: 60_000 });
  });
  afterAll(() => numpy?.close());

  it('agrees routine by routine to 12 digits or more, and no two-sample test tells their samplers apart', async () => {
    const result = await runComparison(numpy, reference, testSettings({ sizes: [32], samples: 120, seed: 8, ensembles: [{ kind: 'goe' }, { kind: 'gue' }] }));
    expect(result.comparison.distinguishing).toEqual([]);
    expect(result.counts.fault + result.counts.skipped).toBe(0);
    expect(result.comparison.agreement.map((a) => a.routine).sort()).toEqual(['chain_trace', 'chain_trace', 'eigenvalues', 'eigenvalues', 'resolvent_trace', 'resolvent_trace']);
    for (const row of result.comparison.agreement) {
      expect(row.digits).toBeGreaterThanOrEqual(12);
      expect(row.ratio).toBeLessThan(row.threshold);
    }
    // numpy's generator and the harness's: other streams, one law; the tests ran and found no difference.
    expect(result.falseAlarmControl.statisticalChecks).toBe(14);
    expect(result.suites[0].checks.find((v) => v.id.startsWith('compare/mean/gue'))?.path).toMatch(/left: .*implementation's sample_statistics|left: matrices: implementation's sampler/);
  });

  it('passes against its own baseline (numpy reproduces its samples from the recorded seeds), and the reference engine passes against it too', async () => {
    const baseline = validateBaseline(
      JSON.parse(baselineToJson(await recordBaseline(numpy, { seed: 21, sizes: [24], ensembles: [{ kind: 'goe' }, { kind: 'gue' }], samples: 120 }))),
      'numpy-baseline.json',
    );
    expect(baseline.statistics).toHaveLength(2);
    const settings = testSettings({ suites: ['baseline'] });
    const again = await runChecks(numpy, settings, [baselineSuite(baseline, 'numpy-baseline.json')]);
    expect(again.counts).toEqual({ pass: 2 * 3 + 2 * 8, fail: 0, skipped: 0, fault: 0 });
    for (const v of again.suites[0].checks) if (v.evidence?.kind === 'statistical') expect(v.evidence.zScore).toBe(0);
    const other = await runChecks(reference, settings, [baselineSuite(baseline, 'numpy-baseline.json')]);
    expect(other.counts.fail + other.counts.fault).toBe(0);
  });
});
