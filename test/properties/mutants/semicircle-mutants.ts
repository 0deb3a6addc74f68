import type { Adapter } from '../../../adapters/adapter.js';
import { conj, type Complex } from '../../../harness/numeric/complex.js';
import type { SquareMatrix } from '../../../harness/numeric/square-matrix.js';
import { mutantAdapter, reference } from '../../support/mutant-adapter.js';

function scaled(m: SquareMatrix, factor: number): SquareMatrix {
  return { ...m, data: m.data.map((x) => x * factor) };
}

/** A sampler whose matrices are the right ones times `factor`; it offers nothing else. */
function scaledSampler(name: string, factor: (size: number) => number): Adapter {
  return mutantAdapter(
    name,
    { sample: async (e, n, s, c) => (await reference.sample(e, n, s, c)).map((m) => scaled(m, factor(n))) },
    ['sample'],
  );
}

/** The semicircle suite's mutants: each must fail it. */
export const SEMICIRCLE_MUTANTS: ReadonlyArray<{ readonly name: string; readonly adapter: Adapter; readonly broken: RegExp }> = [
  {
    // Entries of variance 1 instead of 1/N: the spectrum spreads over [−2√N, 2√N].
    name: 'entries of variance 1',
    adapter: scaledSampler('variance-one sampler', (n) => Math.sqrt(n)),
    broken: /stieltjes-mean|even-moments|kolmogorov-decay/,
  },
  {
    // Entries of variance 2/N: the spectrum spreads over [−2√2, 2√2].
    name: 'entries of variance 2/N',
    adapter: scaledSampler('variance-2/N sampler', () => Math.SQRT2),
    broken: /stieltjes-mean|even-moments|kolmogorov-decay/,
  },
  {
    // A sampler 2 % too wide: a subtle scale error.
    name: 'sampler scale off by 2 %',
    adapter: scaledSampler('scale-1.02 sampler', () => 1.02),
    broken: /stieltjes-mean|even-moments/,
  },
  {
    // ⟨G(z)⟩ always on the upper branch: below the real axis it returns the value at z̄.
    name: 'wrong branch below the real axis',
    adapter: mutantAdapter(
      'upper-branch resolvent',
      {
        resolventTrace: async (m, points) => {
          const upper: Complex[] = points.map((z) => (z.im < 0 ? conj(z) : z));
          return reference.resolventTrace(m, upper);
        },
      },
      ['resolvent_trace'],
    ),
    broken: /stieltjes-mean/,
  },
];
