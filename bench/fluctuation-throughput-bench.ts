import type { BenchmarkGroup, BenchmarkOptions, BenchmarkResult } from './benchmark-group.js';
import type { FluctuationWorkload } from './fluctuation-sample.js';
import { bestOfPeerRuns, rowsAgainstPeer, runNumpyPeer, type OurTiming } from './numpy-peer.js';
import { inProcessRunner, type ThroughputRunner } from './throughput-runner.js';

/**
 * Samples per second of the fluctuation statistics: per sample, draw a GOE matrix, its eigenvalues,
 * ⟨G(z)⟩ at four spectral parameters and Tr H⁴ (fluctuation-sample.ts). Ours by the dense route
 * (any ensemble) and by the tridiagonal model (GOE/GUE), on each runner given (throughput-runner.ts:
 * in process, and on worker threads), against numpy doing the dense route's work
 * in the same run (numpy-peer.py --mode fluctuation: standard_normal, symmetrise, eigvalsh, the same
 * ⟨G(z)⟩ and Tr H⁴). Rows are seconds per sample; the table prints samples per second beside them.
 */
const Z: readonly (readonly [number, number])[] = [
  [0, 0.5],
  [1.5, 0.2],
  [-1, 1],
  [2.2, 0.1],
];

/** Samples per timed repetition: about a second of work per repetition at each size. */
function samplesPerRepetition(n: number): number {
  if (n <= 100) return 300;
  if (n <= 200) return 100;
  if (n <= 400) return 30;
  return Math.max(4, Math.round(30 * (400 / n) ** 3));
}

const REPETITIONS = 3;

export function fluctuationThroughputBench(runners: readonly ThroughputRunner[] = [inProcessRunner]): BenchmarkGroup {
  return {
    name: 'fluctuation-throughput',
    defaultSizes: [100, 200, 400],
    run: (options) => runThroughput(options, runners),
  };
}

async function runThroughput(options: BenchmarkOptions, runners: readonly ThroughputRunner[]): Promise<BenchmarkResult> {
  const samples = options.sizes.map(samplesPerRepetition);
  const zArgument = Z.map(([re, im]) => `${re}:${im}`).join(',');
  const peerArgs = ['--mode', 'fluctuation', '--sizes', options.sizes.join(','), '--samples', samples.join(','), '--reps', options.sizes.map(() => REPETITIONS).join(','), '--z', zArgument];
  const singleBefore = runNumpyPeer(peerArgs, true, options.log, 'fluctuation-throughput');
  const freeBefore = runNumpyPeer(peerArgs, false, options.log, 'fluctuation-throughput');
  const timings: OurTiming[] = [];
  for (const [s, n] of options.sizes.entries()) {
    const count = samples[s];
    for (const route of ['dense', 'tridiagonal'] as const) {
      const workload: FluctuationWorkload = { route, z: Z, seed: 20240603, key: `bench-fluctuation-${route}` };
      for (const runner of runners) {
        await runner.run(workload, Math.min(n, 64), 0, 8); // warm the JIT
        options.log(`fluctuation-throughput: N = ${n}, ${route}, ${runner.workers} worker(s), ${REPETITIONS} × ${count} samples`);
        let best = Number.POSITIVE_INFINITY;
        let coresBusy = 0;
        for (let r = 0; r < REPETITIONS; r++) {
          const timing = await runner.run(workload, n, r * count, count);
          if (timing.wallSeconds / count < best) {
            best = timing.wallSeconds / count;
            coresBusy = timing.cpuSeconds / timing.wallSeconds;
          }
        }
        const routine = route === 'dense' ? 'fluctuation sample (dense GOE)' : 'fluctuation sample (tridiagonal model)';
        timings.push({ routine, n, unit: 'sample', workers: runner.workers, ours: best, coresBusy, peer: 'fluctuation-sample' });
      }
    }
  }
  await Promise.all(runners.map((r) => r.close()));
  // The peer again after ours, best of both (numpy-peer.ts, bestOfPeerRuns).
  const single = bestOfPeerRuns([singleBefore, runNumpyPeer(peerArgs, true, options.log, 'fluctuation-throughput')]);
  const free = bestOfPeerRuns([freeBefore, runNumpyPeer(peerArgs, false, options.log, 'fluctuation-throughput')]);
  const notes = [
    `per sample: GOE matrix, eigenvalues, ⟨G(z)⟩ at z = ${Z.map(([re, im]) => `${re}+${im}i`).join(', ')}, Tr H⁴; numpy does the dense route's work`,
    `runners: ${runners.map((r) => `${r.workers} worker(s), ${r.description}`).join('; ')}; cores busy = CPU time of every thread / wall time`,
    'numpy timed before and after ours; best of both runs',
    `numpy, 1 thread: ${single.description}`,
    `numpy, as it comes: ${free.description}`,
  ];
  return { rows: rowsAgainstPeer(timings, single, free), notes };
}
