import { eigenpairs, eigenvalues } from '../harness/numeric/eigen.js';
import type { SquareMatrix } from '../harness/numeric/square-matrix.js';
import { tridiagonalEigenvalues } from '../harness/numeric/tridiagonal-eigenvalues.js';
import { tridiagonaliseReal } from '../harness/numeric/tridiagonalise-real.js';
import { tridiagonaliseRealBlocked } from '../harness/numeric/tridiagonalise-real-blocked.js';
import type { BenchmarkGroup, BenchmarkOptions, BenchmarkResult } from './benchmark-group.js';
import { bestOf } from './best-of.js';
import { bestOfPeerRuns, rowsAgainstPeer, runNumpyPeer, type OurTiming } from './numpy-peer.js';

/**
 * Eigenvalues and eigenpairs of dense real symmetric matrices: ours (harness/numeric/eigen.ts)
 * against numpy.linalg.eigvalsh / eigh (LAPACK dsyevd and friends through numpy's BLAS), run
 * from python3 in the same benchmark run, once pinned to one thread and once as it comes
 * (numpy-peer.ts). Two more rows time the alternatives to the default reduction with the same QL,
 * against the same numpy eigvalsh, so the choice of default can be re-measured: the fused sweep in
 * scalar code (no WebAssembly SIMD kernel) and the blocked reduction (tridiagonalise-real-blocked.ts).
 */
export const eigenBench: BenchmarkGroup = {
  name: 'eigen',
  defaultSizes: [200, 500, 1000, 2000],
  run: runEigenBench,
};

/** Repetitions per size: enough for a stable best-of at small N, bounded time at large N. */
function repetitions(n: number): { values: number; pairs: number } {
  if (n <= 300) return { values: 9, pairs: 5 };
  if (n <= 700) return { values: 5, pairs: 3 };
  if (n <= 1500) return { values: 3, pairs: 2 };
  return { values: 2, pairs: 1 };
}

async function runEigenBench(options: BenchmarkOptions): Promise<BenchmarkResult> {
  const notes: string[] = [];
  const reps = options.sizes.map(repetitions);
  const peerArgs = ['--mode', 'eigen', '--sizes', options.sizes.join(','), '--reps', reps.map((r) => r.values).join(','), '--pair-reps', reps.map((r) => r.pairs).join(',')];
  const singleBefore = runNumpyPeer(peerArgs, true, options.log, 'eigen');
  const freeBefore = runNumpyPeer(peerArgs, false, options.log, 'eigen');
  // Warm the JIT on a small problem before timing.
  eigenpairs(symmetricTestMatrix(64, 1));
  scalarEigenvalues(symmetricTestMatrix(64, 1));
  blockedEigenvalues(symmetricTestMatrix(64, 1));
  const timings: OurTiming[] = [];
  for (const n of options.sizes) {
    const m = symmetricTestMatrix(n, n);
    const r = repetitions(n);
    options.log(`eigen: N = ${n}, eigenvalues ×${r.values} (default, scalar sweep and blocked reduction, alternating)`);
    let values = Number.POSITIVE_INFINITY;
    let scalar = Number.POSITIVE_INFINITY;
    let blocked = Number.POSITIVE_INFINITY;
    // Alternate the three so that a change in the machine's load hits them alike.
    for (let k = 0; k < r.values; k++) {
      values = Math.min(values, bestOf(1, () => eigenvalues(m)));
      scalar = Math.min(scalar, bestOf(1, () => scalarEigenvalues(m)));
      blocked = Math.min(blocked, bestOf(1, () => blockedEigenvalues(m)));
    }
    options.log(`eigen: N = ${n}, eigenpairs ×${r.pairs}`);
    const pairs = bestOf(r.pairs, () => eigenpairs(m));
    timings.push({ routine: 'eigenvalues', n, unit: 'call', workers: 1, ours: values, peer: 'eigenvalues' });
    timings.push({ routine: 'eigenvalues, scalar sweep', n, unit: 'call', workers: 1, ours: scalar, peer: 'eigenvalues' });
    timings.push({ routine: 'eigenvalues, blocked reduction', n, unit: 'call', workers: 1, ours: blocked, peer: 'eigenvalues' });
    timings.push({ routine: 'eigenpairs', n, unit: 'call', workers: 1, ours: pairs, peer: 'eigenpairs' });
  }
  // The peer again after ours, best of both (numpy-peer.ts, bestOfPeerRuns).
  const single = bestOfPeerRuns([singleBefore, runNumpyPeer(peerArgs, true, options.log, 'eigen')]);
  const free = bestOfPeerRuns([freeBefore, runNumpyPeer(peerArgs, false, options.log, 'eigen')]);
  notes.push('numpy timed before and after ours; each routine its best of both runs');
  notes.push(`numpy, 1 thread: ${single.description}`);
  notes.push(`numpy, as it comes: ${free.description}`);
  return { rows: rowsAgainstPeer(timings, single, free), notes };
}

/** The fused reduction without the SIMD kernel, then the same root-free QL as eigenvalues(). */
function scalarEigenvalues(m: SquareMatrix): Float64Array {
  return tridiagonalEigenvalues(tridiagonaliseReal(m.data, m.size, false, 'scalar').tridiagonal);
}

/** The blocked reduction (default panel width) followed by the same root-free QL as eigenvalues(). */
function blockedEigenvalues(m: SquareMatrix): Float64Array {
  return tridiagonalEigenvalues(tridiagonaliseRealBlocked(m.data, m.size, false).tridiagonal);
}

/** Uniform entries on [−1/2, 1/2), symmetric; a 32-bit LCG (Numerical Recipes' ranqd1 constants). */
function symmetricTestMatrix(n: number, seed: number): SquareMatrix {
  let s = seed >>> 0;
  const draw = (): number => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 2 ** 32 - 0.5;
  };
  const data = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j <= i; j++) {
      const x = draw();
      data[i * n + j] = x;
      data[j * n + i] = x;
    }
  }
  return { field: 'real', size: n, data };
}
