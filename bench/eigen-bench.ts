import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { eigenpairs, eigenvalues } from '../harness/numeric/eigen.js';
import type { SquareMatrix } from '../harness/numeric/square-matrix.js';
import type { BenchmarkGroup, BenchmarkOptions, BenchmarkResult, BenchmarkRow } from './benchmark-group.js';

/**
 * Eigenvalues and eigenpairs of dense real symmetric matrices: ours (harness/numeric/eigen.ts)
 * against numpy.linalg.eigvalsh / eigh (LAPACK dsyevd and friends through numpy's BLAS), run
 * from python3 in the same benchmark run, once pinned to one thread and once as it comes.
 *
 * The peer runs with OPENBLAS_CORETYPE and OPENBLAS_L2_SIZE removed from its environment (both
 * together, in that command alone): this workplace sets them on some processors for old OpenBLAS
 * builds, and they slow a current numpy. The BLAS the peer actually ran is reported.
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
  const single = runPeer(options, true);
  const free = runPeer(options, false);
  notes.push(`numpy, 1 thread: ${single.description}`);
  notes.push(`numpy, as it comes: ${free.description}`);
  // Warm the JIT on a small problem before timing.
  eigenpairs(symmetricTestMatrix(64, 1));
  const rows: BenchmarkRow[] = [];
  for (const n of options.sizes) {
    const m = symmetricTestMatrix(n, n);
    const reps = repetitions(n);
    options.log(`eigen: N = ${n}, eigenvalues ×${reps.values}`);
    const values = bestOf(reps.values, () => eigenvalues(m));
    options.log(`eigen: N = ${n}, eigenpairs ×${reps.pairs}`);
    const pairs = bestOf(reps.pairs, () => eigenpairs(m));
    rows.push({ routine: 'eigenvalues', n, ours_s: values, numpy_1thread_s: single.times.get(`eigenvalues/${n}`) ?? null, numpy_s: free.times.get(`eigenvalues/${n}`) ?? null });
    rows.push({ routine: 'eigenpairs', n, ours_s: pairs, numpy_1thread_s: single.times.get(`eigenpairs/${n}`) ?? null, numpy_s: free.times.get(`eigenpairs/${n}`) ?? null });
  }
  return { rows, notes };
}

/** Best (minimum) wall-clock seconds over `reps` runs. */
function bestOf(reps: number, fn: () => unknown): number {
  let best = Number.POSITIVE_INFINITY;
  for (let r = 0; r < reps; r++) {
    const t0 = performance.now();
    fn();
    best = Math.min(best, (performance.now() - t0) / 1000);
  }
  return best;
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

interface PeerRun {
  readonly times: Map<string, number>;
  readonly description: string;
}

function peerScript(): string | null {
  for (const rel of ['../../bench/numpy-peer.py', './numpy-peer.py']) {
    const path = fileURLToPath(new URL(rel, import.meta.url));
    if (existsSync(path)) return path;
  }
  return null;
}

function runPeer(options: BenchmarkOptions, oneThread: boolean): PeerRun {
  const times = new Map<string, number>();
  const script = peerScript();
  if (script === null) return { times, description: 'absent (bench/numpy-peer.py not found)' };
  const env: NodeJS.ProcessEnv = { ...process.env };
  delete env.OPENBLAS_CORETYPE;
  delete env.OPENBLAS_L2_SIZE;
  if (oneThread) {
    env.OPENBLAS_NUM_THREADS = '1';
    env.OMP_NUM_THREADS = '1';
    env.MKL_NUM_THREADS = '1';
  }
  const reps = options.sizes.map(repetitions);
  options.log(`eigen: numpy peer (${oneThread ? 'one thread' : 'threads as they come'})`);
  const child = spawnSync(
    'python3',
    [script, '--sizes', options.sizes.join(','), '--reps', reps.map((r) => r.values).join(','), '--pair-reps', reps.map((r) => r.pairs).join(',')],
    { env, encoding: 'utf8', maxBuffer: 1 << 24 },
  );
  if (child.error) return { times, description: `absent (python3 could not be started: ${child.error.message})` };
  if (child.status !== 0) return { times, description: `absent (python3 exited with ${child.status}: ${child.stderr.trim().split('\n').pop() ?? ''})` };
  let report: { error?: string; numpy?: string; blas?: unknown; results?: { routine: string; n: number; best: number }[] };
  try {
    report = JSON.parse(child.stdout) as typeof report;
  } catch {
    return { times, description: `absent (unreadable peer output: ${child.stdout.slice(0, 200)})` };
  }
  if (report.error !== undefined) return { times, description: `absent (${report.error})` };
  for (const r of report.results ?? []) times.set(`${r.routine}/${r.n}`, r.best);
  return { times, description: `numpy ${report.numpy}, BLAS ${JSON.stringify(report.blas)}` };
}
