import { AssertionError } from 'node:assert';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
// A lab writes `from 'rmt-assay'`; inside this repository the same module is the source index.
import { assertConforms, expectConformance, ModuleAdapter, ReferenceAdapter, type RunResult } from '../../../harness/index.js';

const kernels = join(import.meta.dirname, '..', '..', '..', 'examples', 'demo', 'lab-kernel');
/** Small, fixed settings, as a lab would pin them in CI. */
const options = { suites: ['identities'], sizes: [24], ensembles: ['goe'], seed: 12, adapterArguments: '--module examples/demo/lab-kernel/spectral-kernel-2.1.mjs' };

describe('expectConformance in a lab’s own test suite', () => {
  let good: ModuleAdapter;
  let regressed: ModuleAdapter;
  beforeAll(async () => {
    good = await ModuleAdapter.load(join(kernels, 'spectral-kernel-2.0.mjs'));
    regressed = await ModuleAdapter.load(join(kernels, 'spectral-kernel-2.1.mjs'));
  });
  afterAll(async () => {
    await good.close();
    await regressed.close();
  });

  test('kernel 2.0 conforms', async () => {
    const result = await expectConformance(good, options);
    expect(result.counts.pass).toBeGreaterThan(0);
  });

  test('kernel 2.1 does not: the verdicts become an assertion failure with evidence and replay commands', async () => {
    const failure = expectConformance(regressed, options);
    await expect(failure).rejects.toBeInstanceOf(AssertionError);
    await expect(failure).rejects.toThrow(/demo lab spectral kernel 2\.1 does not conform: \d+ of \d+ checks failed, 0 faulted/);
    const message = await failure.catch((error: Error) => error.message);
    expect(message).toContain('FAILED identities/agreement/resolvent-trace');
    expect(message).toMatch(/\n {2}observed {3}\S+/);
    expect(message).toMatch(/\n {2}expected {3}\S+/);
    expect(message).toMatch(/\n {2}ratio {6}\S+ against threshold 50/);
    expect(message).toMatch(/\n {2}replay {5}npx rmt-assay check --module examples\/demo\/lab-kernel\/spectral-kernel-2\.1\.mjs --suite identities .* --only identities\/agreement\/resolvent-trace --case \d/);
  });

  test('a bad setting is a RangeError that names it', async () => {
    await expect(expectConformance(good, { sizes: [1] })).rejects.toThrow(/resolveRunSettings: size \(--size\) must be a whole number from 2/);
  });
});

describe('assertConforms', () => {
  test('passes a conforming result and says so by returning', async () => {
    const result = await expectConformance(new ReferenceAdapter(), { suites: ['semicircle'], sizes: [24], ladder: [16, 24, 32], samples: 40, ensembles: ['gue'] });
    expect(() => assertConforms(result)).not.toThrow();
  });

  test('refuses a run in which nothing was checked, with the reasons', () => {
    const nothing = {
      adapter: { name: 'sampler-less kernel', version: '1', kind: 'module', capabilities: [] },
      counts: { pass: 0, fail: 0, skipped: 2, fault: 0 },
      falseAlarmControl: { method: 'holm', level: 0.001, statisticalChecks: 0 },
      settings: { seed: 1 },
      suites: [{ name: 'semicircle', description: '', checks: [{ id: 'a', suite: 'semicircle', title: 'a', parameters: {}, state: 'skipped', reason: 'it offers neither a sampler nor resolvent_trace', replay: '' }] }],
    } as unknown as RunResult;
    expect(() => assertConforms(nothing)).toThrow(AssertionError);
    expect(() => assertConforms(nothing)).toThrow(/no check of sampler-less kernel 1 ran \(2 skipped\): it offers neither a sampler nor resolvent_trace/);
  });
});
