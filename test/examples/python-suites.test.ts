import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { ProcessAdapter } from '../../adapters/process/process-adapter.js';
import { runChecks } from '../../harness/run-checks.js';
import { identitiesSuite } from '../../properties/identities.js';
import { semicircleSuite } from '../../properties/semicircle.js';
import { hasNumpy, numpyMissingReason } from '../support/python-availability.js';
import { testSettings } from '../support/run-settings-for-tests.js';

const KERNEL = fileURLToPath(new URL('../../examples/python/lab_kernel.py', import.meta.url));
if (!hasNumpy) console.warn(`skipping the Python suite run: ${numpyMissingReason}`);

describe.skipIf(!hasNumpy)('the semicircle and identity suites on the numpy kernel, through --exec', () => {
  it('passes every check: numpy itself, wrapped in the example protocol loop', async () => {
    const adapter = await ProcessAdapter.start(`python3 ${JSON.stringify(KERNEL)}`);
    try {
      const settings = testSettings({ sizes: [60], ladder: [40, 60, 90], samples: 80, ensembles: [{ kind: 'goe' }, { kind: 'gue' }] });
      const result = await runChecks(adapter, settings, [semicircleSuite, identitiesSuite], {}, () => adapter.log());
      const notPassed = result.suites.flatMap((s) => s.checks).filter((c) => c.state !== 'pass');
      expect(notPassed.map((c) => `${c.id}: ${c.state} ${c.reason ?? ''}`)).toEqual([]);
      expect(result.adapter).toMatchObject({ kind: 'process', name: 'lab-kernel (numpy)' });
    } finally {
      await adapter.close();
    }
  });
});
