import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe } from 'vitest';
import type { EnsembleSpec } from '../../harness/numeric/ensemble.js';
import { defineKernelAgreementTests } from './kernel-agreement.js';

const KERNEL = fileURLToPath(new URL('../../examples/python/lab_kernel.py', import.meta.url));

const probe = spawnSync('python3', ['-c', 'import numpy; print(numpy.__version__)'], { encoding: 'utf8' });
const hasNumpy = probe.status === 0;
if (!hasNumpy) {
  console.warn(`skipping the Python example tests: python3 with numpy is not available (${probe.error?.message ?? probe.stderr.trim()})`);
}

describe.skipIf(!hasNumpy)('examples/python/lab_kernel.py through the ProcessAdapter', () => {
  defineKernelAgreementTests({
    command: `python3 ${JSON.stringify(KERNEL)}`,
    capabilities: ['eigenvalues', 'resolvent_trace', 'chain_trace', 'sample', 'sample_statistics'],
    sampled: [
      { kind: 'goe' },
      { kind: 'gue' },
      { kind: 'wigner', field: 'real', offDiagonal: 'rademacher', diagonal: 'zero', diagonalVariance: 0 },
      { kind: 'wigner', field: 'complex', offDiagonal: 'uniform', diagonal: 'uniform', diagonalVariance: 0.5 },
      { kind: 'wigner', field: 'real', offDiagonal: 'sparse-bernoulli', meanDegree: 6, diagonal: 'rademacher', diagonalVariance: 1.5 },
      { kind: 'wigner', field: 'complex', offDiagonal: 'sparse-bernoulli', meanDegree: 6, diagonal: 'gaussian', diagonalVariance: 2 },
      { kind: 'wigner', field: 'complex', offDiagonal: 'rademacher', diagonal: 'zero', diagonalVariance: 0 },
    ],
    // A law outside EnsembleSpec, as a newer harness might send: the kernel must refuse it.
    notOffered: { kind: 'wigner', field: 'real', offDiagonal: 'cauchy', diagonal: 'zero', diagonalVariance: 0 } as unknown as EnsembleSpec,
  });
});
