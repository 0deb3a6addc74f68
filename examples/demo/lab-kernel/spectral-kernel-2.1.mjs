// Release 2.1 of the demo lab's kernel: a refactor of the trace routine borrowed the "unbiased"
// denominator N − 1 from the lab's variance code. Every trace is now N/(N − 1) too large, a
// 1 % error at N = 100 that no eyeball check of a plot would notice.
import { makeKernel } from './kernel-core.mjs';

const kernel = makeKernel({ name: 'demo lab spectral kernel', version: '2.1', traceDenominator: (n) => n - 1 });
export const { name, version, eigenvalues, resolventTrace, sample } = kernel;
