import { describe, expect, it } from 'vitest';
import { AdapterFault, EnsembleNotOffered } from '../../adapters/adapter.js';
import { ModuleAdapter, ModuleLoadError } from '../../adapters/module-adapter.js';
import { eigenvalues } from '../../harness/numeric/eigen.js';
import { randomStream } from '../../harness/numeric/random-stream.js';
import { sampleMatrix } from '../../harness/numeric/sample-wigner.js';

const matrix = sampleMatrix({ kind: 'goe' }, 12, randomStream(3, 'module-adapter-test', 0));

describe('ModuleAdapter', () => {
  it('takes a kernel object directly (a TypeScript lab passing its kernel in its own tests)', async () => {
    const adapter = ModuleAdapter.fromKernel({ name: 'lab kernel', version: '1', eigenvalues: (m) => eigenvalues(m) });
    expect(await adapter.describe()).toMatchObject({ name: 'lab kernel', kind: 'module', capabilities: ['eigenvalues'] });
    expect(Array.from(await adapter.eigenvalues(matrix))).toEqual(Array.from(eigenvalues(matrix)));
  });

  it('refuses a kernel that offers nothing', () => {
    expect(() => ModuleAdapter.fromKernel({ name: 'empty' })).toThrow(ModuleLoadError);
  });

  it('turns what a routine throws or returns wrongly into faults naming the method', async () => {
    const adapter = ModuleAdapter.fromKernel({
      eigenvalues: () => {
        throw new Error('LAPACK info = 3');
      },
      resolventTrace: () => [[NaN, 0]],
      chainTrace: () => 'not a number',
      sample: () => null,
    });
    await expect(adapter.eigenvalues(matrix)).rejects.toThrow(new AdapterFault('eigenvalues', 'implementation-error', 'threw: LAPACK info = 3'));
    await expect(adapter.resolventTrace(matrix, [{ re: 0, im: 1 }])).rejects.toMatchObject({ kind: 'invalid-value', method: 'resolvent_trace' });
    await expect(adapter.chainTrace(matrix, [{ re: 0, im: 1 }], [matrix])).rejects.toMatchObject({ kind: 'malformed-response', method: 'chain_trace' });
    await expect(adapter.sample({ kind: 'gue' }, 4, 1, 2)).rejects.toBeInstanceOf(EnsembleNotOffered);
  });

  it('hands the implementation a copy, so a routine that writes into its input cannot change the harness\'s matrix', async () => {
    const before = Float64Array.from(matrix.data);
    const adapter = ModuleAdapter.fromKernel({
      eigenvalues: (m) => {
        m.data.fill(7);
        return eigenvalues(matrix);
      },
    });
    await adapter.eigenvalues(matrix);
    expect(Array.from(matrix.data)).toEqual(Array.from(before));
  });
});
