import { eigenvalues } from '../harness/numeric/eigen.js';
import { randomStream } from '../harness/numeric/random-stream.js';
import { sampleMatrix } from '../harness/numeric/sample-wigner.js';
import { largestEigenvalueOfEnsemble, spectrumOfEnsemble } from '../harness/numeric/spectrum-of-ensemble.js';
import type { BenchmarkGroup, BenchmarkOptions, BenchmarkResult, BenchmarkRow } from './benchmark-group.js';
import { bestOf } from './best-of.js';
import { runNumpyPeer } from './numpy-peer.js';

/**
 * GOE spectra by the tridiagonal model (spectrum-of-ensemble.ts: Dumitriu–Edelman draw, O(N), then
 * root-free QL, O(N²)) and the largest eigenvalue alone (the same draw, then Sturm bisection, O(N)
 * per step), against numpy drawing the dense GOE matrix and calling eigvalsh (numpy-peer.py
 * --mode goe-spectrum), the dense route a numpy user takes to the same spectrum. Our own dense
 * route (sample-wigner.ts + eigen.ts) is timed too up to N = 2000, beyond which it takes minutes.
 * numpy at N = 10⁴ runs once per thread setting (minutes each).
 */
export const tridiagonalModelBench: BenchmarkGroup = {
  name: 'tridiagonal-model',
  defaultSizes: [1000, 10_000],
  run: runTridiagonalBench,
};

const DENSE_LIMIT = 2000;

function repetitions(n: number): { ours: number; peer: number } {
  if (n <= 2000) return { ours: 9, peer: 3 };
  if (n <= 5000) return { ours: 5, peer: 1 };
  return { ours: 3, peer: 1 };
}

async function runTridiagonalBench(options: BenchmarkOptions): Promise<BenchmarkResult> {
  const peerArgs = ['--mode', 'goe-spectrum', '--sizes', options.sizes.join(','), '--reps', options.sizes.map((n) => repetitions(n).peer).join(',')];
  const single = runNumpyPeer(peerArgs, true, options.log, 'tridiagonal-model');
  const free = runNumpyPeer(peerArgs, false, options.log, 'tridiagonal-model');
  const notes = [
    'numpy column: dense GOE draw + numpy.linalg.eigvalsh, per call',
    `ours, dense route: timed up to N = ${DENSE_LIMIT} only`,
    `numpy, 1 thread: ${single.description}`,
    `numpy, as it comes: ${free.description}`,
  ];
  const goe = { kind: 'goe' } as const;
  // Warm the JIT.
  for (let i = 0; i < 20; i++) {
    spectrumOfEnsemble(goe, 200, randomStream(1, 'bench-warm', i));
    largestEigenvalueOfEnsemble(goe, 200, randomStream(1, 'bench-warm', i));
  }
  eigenvalues(sampleMatrix(goe, 64, randomStream(1, 'bench-warm', 0)));
  const rows: BenchmarkRow[] = [];
  for (const n of options.sizes) {
    const reps = repetitions(n).ours;
    const row = (routine: string, ours: number): BenchmarkRow => ({
      routine,
      n,
      unit: 'call',
      workers: 1,
      ours_s: ours,
      numpy_1thread_s: single.times.get(`goe-spectrum/${n}`) ?? null,
      numpy_s: free.times.get(`goe-spectrum/${n}`) ?? null,
    });
    let index = 0;
    options.log(`tridiagonal-model: N = ${n}, spectrum ×${reps}`);
    rows.push(row('goe spectrum: tridiagonal model + QL', bestOf(reps, () => spectrumOfEnsemble(goe, n, randomStream(2, 'bench-spectrum', index++)))));
    options.log(`tridiagonal-model: N = ${n}, λ_max by bisection ×${reps}`);
    rows.push(row('goe λ_max: tridiagonal model + bisection', bestOf(reps, () => largestEigenvalueOfEnsemble(goe, n, randomStream(2, 'bench-top', index++)))));
    if (n <= DENSE_LIMIT) {
      const denseReps = Math.min(reps, 3);
      options.log(`tridiagonal-model: N = ${n}, dense route ×${denseReps}`);
      rows.push(row('goe spectrum: dense sampler + eigenvalues', bestOf(denseReps, () => eigenvalues(sampleMatrix(goe, n, randomStream(2, 'bench-dense', index++))))));
    }
  }
  return { rows, notes };
}
