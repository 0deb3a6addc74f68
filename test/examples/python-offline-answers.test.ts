import { spawnSync } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { offeringOnly } from '../../adapters/capability-filter.js';
import { ProcessAdapter } from '../../adapters/process/process-adapter.js';
import { RecordedAdapter } from '../../adapters/recorded/recorded-adapter.js';
import { RecordingAdapter } from '../../adapters/recorded/recording-adapter.js';
import { runChecks } from '../../harness/run-checks.js';
import { stieltjesSemicircle } from '../../reference-values/semicircle-law.js';
import { identitiesSuite } from '../../properties/identities.js';
import { semicircleSuite } from '../../properties/semicircle.js';
import { reference } from '../support/mutant-adapter.js';
import { hasNumpy, numpyMissingReason } from '../support/python-availability.js';
import { testSettings } from '../support/run-settings-for-tests.js';

const KERNEL = fileURLToPath(new URL('../../examples/python/lab_kernel.py', import.meta.url));
if (!hasNumpy) console.warn(`skipping the offline-answer tests: ${numpyMissingReason}`);

describe.skipIf(!hasNumpy)('results computed away from rmt-assay (RECORDING.md workflow)', () => {
  it('a template answered by the numpy kernel offline passes the same checks when replayed', async () => {
    const settings = testSettings({ sizes: [30], ladder: [20, 30, 40], samples: 30, ensembles: [{ kind: 'goe' }] });
    const suites = [semicircleSuite, identitiesSuite];
    const folder = mkdtempSync(join(tmpdir(), 'rmt-assay-offline-'));
    const template = join(folder, 'template.json');
    const answered = join(folder, 'answered.json');
    // 1. The calls, the harness drawing every matrix (no sampler offered).
    const recorder = new RecordingAdapter(offeringOnly(reference, ['eigenvalues', 'resolvent_trace', 'chain_trace']));
    await runChecks(recorder, settings, suites);
    await recorder.save(template, 'test settings');
    // 2. Answered "on the cluster" by the lab's numpy functions.
    const run = spawnSync('python3', [KERNEL, '--answer-recording', template, answered], { encoding: 'utf8' });
    expect(run.status, run.stderr).toBe(0);
    // 3. Checked here with the same settings.
    const replay = await runChecks(RecordedAdapter.load(answered), settings, suites);
    expect(replay.adapter.name).toBe('lab-kernel (numpy)');
    const notPassed = replay.suites.flatMap((s) => s.checks).filter((c) => c.state !== 'pass');
    expect(notPassed.map((c) => `${c.id}: ${c.state} ${c.reason ?? ''}`)).toEqual([]);
  });

  it('answers sample_statistics over the process protocol: shapes, the empty chain, and E⟨G(z)⟩ near m(z)', async () => {
    const adapter = await ProcessAdapter.start(`python3 ${JSON.stringify(KERNEL)}`, { timeoutMs: 60_000 });
    try {
      const z = { re: 0.3, im: 0.5 };
      const rows = await adapter.sampleStatistics({ kind: 'gue' }, 80, 5, 40, [{ points: [], weights: [] }, { points: [z], weights: [identity(80)] }]);
      expect(rows).toHaveLength(40);
      for (const row of rows) expect(row[0]).toEqual({ re: 1, im: 0 });
      const mean = rows.reduce((s, row) => ({ re: s.re + row[1].re / 40, im: s.im + row[1].im / 40 }), { re: 0, im: 0 });
      const m = stieltjesSemicircle(z);
      // GUE: E⟨G(z)⟩ = m(z) + O(N⁻²) (the 1/N correction vanishes, THEORY.md resolvent form); the
      // standard error of a 40-sample mean at N = 80 is about 1e-3, so 1e-2 is far outside chance.
      expect(Math.hypot(mean.re - m.re, mean.im - m.im)).toBeLessThan(1e-2);
    } finally {
      await adapter.close();
    }
  });
});

function identity(n: number) {
  const data = new Float64Array(n * n);
  for (let i = 0; i < n; i++) data[i * n + i] = 1;
  return { field: 'real' as const, size: n, data };
}
