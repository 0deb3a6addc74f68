import type { Adapter } from '../../../adapters/adapter.js';
import type { Complex } from '../../../harness/numeric/complex.js';
import type { EnsembleSpec } from '../../../harness/numeric/ensemble.js';
import { randomStream } from '../../../harness/numeric/random-stream.js';
import { sampleMatrix } from '../../../harness/numeric/sample-wigner.js';
import type { SquareMatrix } from '../../../harness/numeric/square-matrix.js';
import { mutantAdapter, reference } from '../../support/mutant-adapter.js';

/** A sampler that draws `law` whenever it is asked for `declared`; it offers nothing else. */
function misdeclaredSampler(name: string, declared: EnsembleSpec['kind'], law: EnsembleSpec): Adapter {
  return mutantAdapter(name, { sample: (e, n, s, c) => reference.sample(e.kind === declared ? law : e, n, s, c) }, ['sample']);
}

/** The reference sampler with every matrix changed by `change`; it offers nothing else. */
function alteredSampler(name: string, change: (m: SquareMatrix, seed: number, index: number) => SquareMatrix): Adapter {
  return mutantAdapter(name, { sample: async (e, n, s, c) => (await reference.sample(e, n, s, c)).map((m, i) => change(m, s, i)) }, ['sample']);
}

/** cI/√N with c ~ N(0, 1) drawn afresh for each sample: every eigenvalue moves by the same c/√N. */
function commonShift(m: SquareMatrix, seed: number, index: number): SquareMatrix {
  const c = randomStream(seed, 'mutant-common-shift', index).nextNormal() / Math.sqrt(m.size);
  const data = Float64Array.from(m.data);
  const stride = m.field === 'complex' ? 2 : 1;
  for (let i = 0; i < m.size; i++) data[stride * (i * m.size + i)] += c;
  return { ...m, data };
}

/**
 * GUE off-diagonal entries whose real and imaginary parts have variances (1 + δ)/(2N) and
 * (1 − δ)/(2N), δ = 1/2 (a 3 : 1 split): E|h|² is still 1/N, so the semicircle is unchanged, but
 * E h² = δ/N ≠ 0. What sees it best are the shift-weighted statistics Tr G(z)P^k, whose covariances
 * are 0 for β = 2 and of order δ here (the large-z term Tr HP^k = Σ_i h_{i,i−k} has E(Tr HP^k)² = δ
 * exactly); their sum over k = 1 … 8 has a z-score of about δ√(8K), K the weighted samples.
 */
const SPLIT = 1 / 2;
function unequalParts(m: SquareMatrix): SquareMatrix {
  const data = Float64Array.from(m.data);
  const n = m.size;
  const re = Math.sqrt(1 + SPLIT);
  const im = Math.sqrt(1 - SPLIT);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      if (i === j) continue;
      data[2 * (i * n + j)] *= re;
      data[2 * (i * n + j) + 1] *= im;
    }
  }
  return { ...m, data };
}

/** Consecutive samples from one stream: matrices 2k and 2k + 1 of a request are the same. */
const reusedStream = mutantAdapter(
  'sampler reusing its stream for consecutive samples',
  {
    sample: async (e, n, s, c) => Array.from({ length: c }, (_, i) => sampleMatrix(e, n, randomStream(s, 'reference-sampler', Math.floor(i / 2)))),
  },
  ['sample'],
);

/**
 * A stochastic trace estimator: unbiased, but each value carries complex noise of relative size
 * 10⁻² (value·(1 + 0.01·ξ), ξ standard complex normal, fresh per sample and statistic). It offers
 * only sample_statistics; ⟨I⟩ it returns exactly (a probe-based estimator does).
 */
const noisyTraceEstimator = mutantAdapter(
  'stochastic trace estimator with 1 % noise',
  {
    sampleStatistics: async (e, n, s, c, statistics) => {
      const exact = await reference.sampleStatistics(e, n, s, c, statistics);
      const noise = randomStream(s, 'mutant-trace-noise', 0);
      return exact.map((row) =>
        row.map((v, j): Complex => {
          if (statistics[j].points.length === 0) return v;
          const xr = (0.01 * noise.nextNormal()) / Math.SQRT2;
          const xi = (0.01 * noise.nextNormal()) / Math.SQRT2;
          return { re: v.re * (1 + xr) - v.im * xi, im: v.im * (1 + xr) + v.re * xi };
        }),
      );
    },
  },
  ['sample_statistics'],
);

export interface FluctuationMutant {
  readonly name: string;
  readonly adapter: Adapter;
  readonly ensemble: EnsembleSpec;
  /** Ids of checks at least one of which must fail, naming what broke. */
  readonly broken: RegExp;
  /** The budget the test runs it with, where the default test budget lacks the power. */
  readonly budget?: number;
}

/** The six mutants: each must fail the fluctuation suite, none is visible to the semicircle suite's law of large numbers. */
export const FLUCTUATION_MUTANTS: readonly FluctuationMutant[] = [
  {
    name: 'GOE diagonal variance 1/N instead of 2/N',
    adapter: misdeclaredSampler('GOE with diagonal variance 1/N', 'goe', { kind: 'wigner', field: 'real', offDiagonal: 'gaussian', diagonal: 'gaussian', diagonalVariance: 1 }),
    ensemble: { kind: 'goe' },
    broken: /tracial|linear\/var x\^3/,
  },
  {
    name: 'Rademacher entries declared Gaussian (κ4 = −2 instead of 0)',
    adapter: misdeclaredSampler('Rademacher sampler declared GOE', 'goe', { kind: 'wigner', field: 'real', offDiagonal: 'rademacher', diagonal: 'gaussian', diagonalVariance: 2 }),
    ensemble: { kind: 'goe' },
    broken: /linear\/var x\^4|tracial/,
  },
  {
    name: 'a common random shift cI/√N added to every sample',
    adapter: alteredSampler('sampler adding cI/√N', commonShift),
    ensemble: { kind: 'goe' },
    broken: /tracial|linear\/var x\^3/,
  },
  {
    name: 'the same random stream reused for consecutive samples',
    adapter: reusedStream,
    ensemble: { kind: 'goe' },
    broken: /independence\/lag-1/,
  },
  {
    name: 'an unbiased trace estimator with relative noise 10⁻² per sample',
    adapter: noisyTraceEstimator,
    ensemble: { kind: 'gue' },
    broken: /tracial\/E\|X\|²/,
  },
  {
    name: 'GUE with unequal variances of the real and imaginary parts (3 : 1)',
    adapter: alteredSampler('GUE with a 3 : 1 split of the off-diagonal variance', unequalParts),
    ensemble: { kind: 'gue' },
    broken: /weighted\/Σ P\^k/,
    budget: 1,
  },
];
