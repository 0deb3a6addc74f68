import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { NotAvailable } from '../../adapters/adapter.js';
import { ProcessAdapter } from '../../adapters/process/process-adapter.js';
import { diagonalMatrix } from '../../harness/numeric/square-matrix.js';
import { eventually, expectFault } from '../adapters/process/process-test-support.js';

// examples/python/rmt_assay_protocol.py handling what users' code does: exceptions, NaN and
// infinities, print(), "not available", and running without numpy (struct and lists of rows).

const PROGRAM = fileURLToPath(new URL('./fixtures/python_edge_kernel.py', import.meta.url));
const hasPython = spawnSync('python3', ['-c', 'pass']).status === 0;
const hasNumpy = hasPython && spawnSync('python3', ['-c', 'import numpy']).status === 0;
if (!hasPython) console.warn('skipping the Python protocol loop tests: python3 is not available');

const variants = [
  { label: 'without numpy', flag: ' --without-numpy', runs: hasPython },
  { label: 'with numpy', flag: '', runs: hasNumpy },
];

for (const variant of variants) {
  describe.skipIf(!variant.runs)(`rmt_assay_protocol.py ${variant.label}`, () => {
    let adapter: ProcessAdapter;
    beforeAll(async () => {
      adapter = await ProcessAdapter.start(`python3 ${JSON.stringify(PROGRAM)}${variant.flag}`, { startTimeoutMs: 60_000 });
    });
    afterAll(async () => adapter?.close());

    it('announces exactly the functions it was given', async () => {
      expect(await adapter.describe()).toMatchObject({ version: variant.label, capabilities: ['eigenvalues', 'sample'] });
    });

    it('decodes matrices and sends results back exactly; print() goes to the log, not the protocol', async () => {
      const values = await adapter.eigenvalues(diagonalMatrix('real', [0.1, -2.5]));
      expect([...values]).toEqual([-2.5, 0.1]);
      // −0 survives the round trip (toEqual tells −0 from 0).
      const complexValues = await adapter.eigenvalues(diagonalMatrix('complex', [Math.PI, -0]));
      expect([...complexValues]).toEqual([-0, Math.PI]);
      await eventually(() => adapter.log().includes('computing eigenvalues of a 2×2 matrix'));
      expect(adapter.warnings().filter((w) => w.includes('stdout'))).toEqual([]);
    });

    it('sends NaN and infinities as strings, which the adapter reports as invalid values', async () => {
      await expectFault(adapter.eigenvalues(diagonalMatrix('real', [1, 2, 3])), 'eigenvalues', 'invalid-value', /\/result\/values\/1 is NaN, \/result\/values\/2 is Infinity/);
    });

    it('turns NotAvailable into error 1002 and an exception into error -32000 with its type', async () => {
      await expect(adapter.eigenvalues(diagonalMatrix('real', [1, 2, 3, 4]))).rejects.toBeInstanceOf(NotAvailable);
      await expectFault(adapter.eigenvalues(diagonalMatrix('real', [1, 2, 3, 4, 5])), 'eigenvalues', 'implementation-error', /error -32000: ZeroDivisionError: (float )?division by zero/);
      // stderr is another pipe: the traceback may arrive just after the response.
      await eventually(() => /Traceback \(most recent call last\)/.test(adapter.log()));
    });

    it('encodes real and complex matrices given as lists of rows or arrays', async () => {
      const [real] = await adapter.sample({ kind: 'goe' }, 3, 5, 1);
      expect([...real.data]).toEqual([5, 0, 0, 0, 6, 0, 0, 0, 7]);
      const [complex] = await adapter.sample({ kind: 'gue' }, 2, 5, 1);
      expect([...complex.data]).toEqual([5, 0, 0, 1, 0, -1, 6, 0]);
    });
  });
}
