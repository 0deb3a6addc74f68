// Release 2.0 of the demo lab's kernel: correct.
import { makeKernel } from './kernel-core.mjs';

const kernel = makeKernel({ name: 'demo lab spectral kernel', version: '2.0', traceDenominator: (n) => n });
export const { name, version, eigenvalues, resolventTrace, sample } = kernel;
