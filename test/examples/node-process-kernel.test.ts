import { fileURLToPath } from 'node:url';
import { describe } from 'vitest';
import { defineKernelAgreementTests } from './kernel-agreement.js';

const KERNEL = fileURLToPath(new URL('../../examples/node-process/kernel-process.mjs', import.meta.url));

describe('examples/node-process/kernel-process.mjs through the ProcessAdapter', () => {
  defineKernelAgreementTests({
    command: `node ${JSON.stringify(KERNEL)}`,
    capabilities: ['eigenvalues', 'resolvent_trace', 'chain_trace', 'sample'],
    sampled: [{ kind: 'goe' }, { kind: 'gue' }],
    notOffered: { kind: 'wigner', field: 'real', offDiagonal: 'rademacher', diagonal: 'zero', diagonalVariance: 0 },
  });
});
