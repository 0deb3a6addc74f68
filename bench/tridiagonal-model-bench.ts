import { eigenvalues } from '../harness/numeric/eigen.js';
import { randomStream } from '../harness/numeric/random-stream.js';
import { sampleMatrix } from '../harness/numeric/sample-wigner.js';
import { largestEigenvalueOfEnsemble, spectrumOfEnsemble } from '../harness/numeric/spectrum-of-ensemble.js';
import type { BenchmarkGroup, BenchmarkOptions, BenchmarkResult } from './benchmark-group.js';
import { bestOf } from './best-of.js';
import { bestOfPeerRuns, rowsAgainstPeer, runNumpyPeer, type OurTiming } from './numpy-peer.js';

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
  const peerArgs = (sizes: readonly number[]): string[] => ['--mode', 'goe-spectrum', '--sizes', sizes.join(','), '--reps', sizes.map((n) => repetitions(n).peer).join(',')];
  const singleBefore = runNumpyPeer(peerArgs(options.sizes), true, options.log, 'tridiagonal-model');
  const freeBefore = runNumpyPeer(peerArgs(options.sizes), false, options.log, 'tridiagonal-model');
  const goe = { kind: 'goe' } as const;
  // Warm the JIT.
  for (let i = 0; i < 20; i++) {
    spectrumOfEnsemble(goe, 200, randomStream(1, 'bench-warm', i));
    largestEigenvalueOfEnsemble(goe, 200, randomStream(1, 'bench-warm', i));
  }
  eigenvalues(sampleMatrix(goe, 64, randomStream(1, 'bench-warm', 0)));
  const timings: OurTiming[] = [];
  for (const n of options.sizes) {
    const reps = repetitions(n).ours;
    const row = (routine: string, ours: number): number => timings.push({ routine, n, unit: 'call', workers: 1, ours, peer: 'goe-spectrum' });
    let index = 0;
    options.log(`tridiagonal-model: N = ${n}, spectrum ×${reps}`);
    row('goe spectrum: tridiagonal model + QL', bestOf(reps, () => spectrumOfEnsemble(goe, n, randomStream(2, 'bench-spectrum', index++))));
    options.log(`tridiagonal-model: N = ${n}, λ_max by bisection ×${reps}`);
    row('goe λ_max: tridiagonal model + bisection', bestOf(reps, () => largestEigenvalueOfEnsemble(goe, n, randomStream(2, 'bench-top', index++))));
    if (n <= DENSE_LIMIT) {
      const denseReps = Math.min(reps, 3);
      options.log(`tridiagonal-model: N = ${n}, dense route ×${denseReps}`);
      row('goe spectrum: dense sampler + eigenvalues', bestOf(denseReps, () => eigenvalues(sampleMatrix(goe, n, randomStream(2, 'bench-dense', index++)))));
    }
  }
  // The peer again after ours where that is cheap (N ≤ DENSE_LIMIT), best of both (bestOfPeerRuns).
  const again = options.sizes.filter((n) => n <= DENSE_LIMIT);
  const single = again.length === 0 ? singleBefore : bestOfPeerRuns([singleBefore, runNumpyPeer(peerArgs(again), true, options.log, 'tridiagonal-model')]);
  const free = again.length === 0 ? freeBefore : bestOfPeerRuns([freeBefore, runNumpyPeer(peerArgs(again), false, options.log, 'tridiagonal-model')]);
  const notes = [
    'numpy column: dense GOE draw + numpy.linalg.eigvalsh, per call',
    `numpy timed before and after ours for N ≤ ${DENSE_LIMIT} (best of both), before only above`,
    `ours, dense route: timed up to N = ${DENSE_LIMIT} only`,
    `numpy, 1 thread: ${single.description}`,
    `numpy, as it comes: ${free.description}`,
  ];
  return { rows: rowsAgainstPeer(timings, single, free), notes };
}
