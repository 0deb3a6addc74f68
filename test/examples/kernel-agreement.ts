import { afterAll, beforeAll, expect, it } from 'vitest';
import { EnsembleNotOffered } from '../../adapters/adapter.js';
import { ProcessAdapter } from '../../adapters/process/process-adapter.js';
import type { Complex } from '../../harness/numeric/complex.js';
import { ensembleConstants, ensembleLabel, type EnsembleSpec } from '../../harness/numeric/ensemble.js';
import { hermitianDefect, identityMatrix, type SquareMatrix } from '../../harness/numeric/square-matrix.js';
import { randomHermitian } from '../harness/numeric/spectral-fixtures.js';
import { allowances, chainTraceByMlMatrix, eigenvaluesByMlMatrix, resolventTraceByMlMatrix } from './ml-matrix-reference.js';
import { sampledEntryMoments, type MeanEstimate } from './sampled-entry-moments.js';

export interface KernelUnderTest {
  /** The shell command that starts the example. */
  readonly command: string;
  readonly capabilities: readonly string[];
  /** Ensembles it samples, checked by their entry moments. */
  readonly sampled: readonly EnsembleSpec[];
  /** An ensemble it must refuse with EnsembleNotOffered. */
  readonly notOffered: EnsembleSpec;
}

// Points on both sides of the real axis, in the bulk and outside the spectrum's usual range.
const POINTS: Complex[] = [
  { re: 0.3, im: 0.5 },
  { re: -1.2, im: 0.1 },
  { re: 2.5, im: -0.7 },
];

const INPUTS: SquareMatrix[] = [randomHermitian('real', 7, 11), randomHermitian('complex', 6, 12), randomHermitian('real', 1, 13)];

function weightFor(m: SquareMatrix, seed: number): SquareMatrix {
  // A Hermitian weight of the matrix's own field, and, for variety, a non-Hermitian one via scaling rows.
  const w = randomHermitian(m.field, m.size, seed);
  const stride = m.field === 'complex' ? 2 : 1;
  for (let k = 0; k < w.data.length; k++) w.data[k] *= 1 + Math.floor(k / (stride * m.size)) / m.size;
  return w;
}

function expectClose(actual: Complex, expected: Complex, allowance: number, what: string): void {
  const difference = Math.hypot(actual.re - expected.re, actual.im - expected.im);
  expect(difference, `${what}: observed ${actual.re}+${actual.im}i, expected ${expected.re}+${expected.im}i, allowance ${allowance}`).toBeLessThanOrEqual(allowance);
}

/** |estimate − expected| within 5 standard errors (plus rounding for a variance-free statistic). */
function expectWithinErrors(estimate: MeanEstimate, expected: number, what: string): void {
  const allowance = 5 * estimate.standardError + 1e-12 * Math.max(1, Math.abs(expected));
  expect(Math.abs(estimate.mean - expected), `${what}: ${estimate.mean} ± ${estimate.standardError} (n = ${estimate.count}), expected ${expected}`).toBeLessThanOrEqual(allowance);
}

/** The agreement tests for one example kernel run through the ProcessAdapter. */
export function defineKernelAgreementTests(kernel: KernelUnderTest): void {
  let adapter: ProcessAdapter;
  beforeAll(async () => {
    adapter = await ProcessAdapter.start(kernel.command, { startTimeoutMs: 60_000, timeoutMs: 60_000 });
  });
  afterAll(async () => {
    await adapter?.close();
  });

  it('describes itself with every method', async () => {
    const description = await adapter.describe();
    expect(description.kind).toBe('process');
    expect([...description.capabilities].sort()).toEqual([...kernel.capabilities].sort());
  });

  it('eigenvalues agree with ml-matrix', async () => {
    for (const m of INPUTS) {
      const observed = await adapter.eigenvalues(m);
      const expected = eigenvaluesByMlMatrix(m);
      const allowance = allowances.eigenvalue(m);
      expected.forEach((e, k) => expectClose({ re: observed[k], im: 0 }, { re: e, im: 0 }, allowance, `${m.field} N=${m.size} eigenvalue ${k}`));
    }
  });

  it('resolvent traces agree with ml-matrix, without and with a weight', async () => {
    for (const [index, m] of INPUTS.entries()) {
      for (const weight of [undefined, weightFor(m, 100 + index)]) {
        const observed = await adapter.resolventTrace(m, POINTS, weight);
        const a = weight ?? identityMatrix(m.field, m.size);
        const expected = resolventTraceByMlMatrix(m, POINTS, a);
        POINTS.forEach((z, k) => expectClose(observed[k], expected[k], allowances.resolvent(m, z, a), `${m.field} N=${m.size} ⟨G(z)A⟩ at z=${z.re}+${z.im}i, weight ${weight ? 'given' : 'none'}`));
      }
    }
  });

  it('chain traces of length 1 to 3 agree with ml-matrix', async () => {
    for (const [index, m] of INPUTS.entries()) {
      // A real weight in a complex chain checks that fields may be mixed.
      const weights = [weightFor(m, 200 + index), randomHermitian('real', m.size, 300 + index), identityMatrix(m.field, m.size)];
      for (let k = 1; k <= 3; k++) {
        const points = POINTS.slice(0, k);
        const observed = await adapter.chainTrace(m, points, weights.slice(0, k));
        const expected = chainTraceByMlMatrix(m, points, weights.slice(0, k));
        expectClose(observed, expected, allowances.chain(m, points, weights.slice(0, k)), `${m.field} N=${m.size} chain of length ${k}`);
      }
    }
  });

  it('samples each offered ensemble with the entry moments that define it', async () => {
    const size = 30;
    for (const [index, spec] of kernel.sampled.entries()) {
      const matrices = await adapter.sample(spec, size, 1000 + index, 40);
      const constants = ensembleConstants(spec, size);
      const label = ensembleLabel(spec);
      for (const m of matrices) {
        expect([m.field, m.size]).toEqual([constants.field, size]);
        expect(hermitianDefect(m), `${label} is Hermitian`).toBe(0);
      }
      const moments = sampledEntryMoments(matrices);
      expectWithinErrors(moments.offDiagonalVariance, 1, `${label} N·E|h_ij|²`);
      expectWithinErrors(moments.pseudoVariance, constants.field === 'real' ? 1 : 0, `${label} N·E h_ij² (real part)`);
      expectWithinErrors(moments.kappa4, constants.kappa4, `${label} κ4`);
      expectWithinErrors(moments.diagonalVariance, constants.diagonalVariance, `${label} σ_d²`);
      expect(moments.diagonalImaginary).toBe(0);
    }
  });

  it('samples reproducibly from the seed', async () => {
    const spec = kernel.sampled[0];
    const [a, b, c] = await Promise.all([adapter.sample(spec, 5, 7, 2), adapter.sample(spec, 5, 7, 2), adapter.sample(spec, 5, 8, 2)]);
    expect(b.map((m) => [...m.data])).toEqual(a.map((m) => [...m.data]));
    expect(c[0].data).not.toEqual(a[0].data);
  });

  it('refuses an ensemble it does not sample, so the harness can skip', async () => {
    await expect(adapter.sample(kernel.notOffered, 4, 1, 1)).rejects.toBeInstanceOf(EnsembleNotOffered);
    // And keeps serving afterwards.
    expect(await adapter.eigenvalues(INPUTS[0])).toHaveLength(INPUTS[0].size);
  });
}
