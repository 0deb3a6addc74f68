import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { ProcessAdapter } from '../../adapters/process/process-adapter.js';
import { RecordedAdapter } from '../../adapters/recorded/recorded-adapter.js';
import { RecordingAdapter } from '../../adapters/recorded/recording-adapter.js';
import { runChecks } from '../../harness/run-checks.js';
import { fluctuationsSuite } from '../../properties/fluctuations.js';
import { reference } from '../support/mutant-adapter.js';
import { testSettings } from '../support/run-settings-for-tests.js';

/** The fluctuation suite through the adapters that cross a boundary: a separate process, and a recording. */
const settings = testSettings({ suites: ['fluctuations'], sizes: [40], ensembles: [{ kind: 'goe' }], budget: 0.2 });
const NODE_KERNEL = fileURLToPath(new URL('../../examples/node-process/kernel-process.mjs', import.meta.url));

function notPassed(result: Awaited<ReturnType<typeof runChecks>>) {
  return result.suites.flatMap((s) => s.checks).filter((c) => c.state === 'fail' || c.state === 'fault').map((c) => `${c.id}: ${c.state} ${c.reason ?? ''}`);
}

describe('fluctuation suite across adapters', () => {
  it("runs on a program's own sampler through the process adapter (statistics by the reference engine)", async () => {
    const adapter = await ProcessAdapter.start(`node ${JSON.stringify(NODE_KERNEL)}`);
    try {
      const result = await runChecks(adapter, settings, [fluctuationsSuite]);
      expect(notPassed(result)).toEqual([]);
      const measured = result.suites[0].checks.filter((c) => c.state === 'pass');
      expect(measured.length).toBeGreaterThan(20);
      expect(measured[0].path).toMatch(/implementation's sampler/);
    } finally {
      await adapter.close();
    }
  });

  it('replays a recorded run into the same verdicts', async () => {
    const recorder = new RecordingAdapter(reference);
    const live = await runChecks(recorder, settings, [fluctuationsSuite]);
    const file = join(mkdtempSync(join(tmpdir(), 'rmt-assay-fluct-')), 'recording.json');
    await recorder.save(file, 'test settings');
    const replay = await runChecks(RecordedAdapter.load(file), settings, [fluctuationsSuite]);
    const strip = (r: typeof live) => r.suites[0].checks.map((c) => ({ id: c.id, state: c.state, evidence: c.evidence }));
    expect(strip(replay)).toEqual(strip(live));
    expect(notPassed(replay)).toEqual([]);
  });
});
