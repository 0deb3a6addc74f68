import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { BenchmarkRow } from './benchmark-group.js';

/**
 * Runs bench/numpy-peer.py in one mode and reads its JSON: the peer every benchmark group times
 * against, in the same benchmark run.
 *
 * The peer runs with OPENBLAS_CORETYPE and OPENBLAS_L2_SIZE removed from its environment (both
 * together, in that command alone): this workplace sets them on some processors for old OpenBLAS
 * builds, and they slow a current numpy. With `oneThread` the BLAS is pinned to one thread. The
 * BLAS the peer actually ran is reported in `description`.
 */
export interface NumpyPeerRun {
  /** Best seconds by "routine/n" (per call, or per sample for the throughput mode). */
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

export function runNumpyPeer(args: readonly string[], oneThread: boolean, log: (line: string) => void, label: string): NumpyPeerRun {
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
  log(`${label}: numpy peer (${oneThread ? 'one thread' : 'threads as they come'})`);
  const child = spawnSync('python3', [script, ...args], { env, encoding: 'utf8', maxBuffer: 1 << 24 });
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

/**
 * One run from several runs of the same peer: the best time of each routine over all of them, and
 * the first run's description. Timing the peer both before and after our side and keeping the best
 * of each stops a burst of load from other work on a shared machine from landing on one side only.
 */
export function bestOfPeerRuns(runs: readonly NumpyPeerRun[]): NumpyPeerRun {
  const times = new Map<string, number>();
  for (const run of runs) for (const [key, seconds] of run.times) times.set(key, Math.min(seconds, times.get(key) ?? Number.POSITIVE_INFINITY));
  return { times, description: runs[0]?.description ?? 'absent (not run)' };
}

/** Our side of one row: what was timed, and which peer routine it is held against. */
export interface OurTiming {
  readonly routine: string;
  readonly n: number;
  readonly unit: BenchmarkRow['unit'];
  readonly workers: number;
  readonly ours: number;
  /** CPU time over wall time of our side (all threads): how many cores it kept busy. */
  readonly coresBusy?: number;
  /** The peer's routine name (its times are keyed "routine/n"). */
  readonly peer: string;
}

/** The table's rows: each timing beside the peer's best time for the same routine and N, one thread and as it comes. */
export function rowsAgainstPeer(timings: readonly OurTiming[], single: NumpyPeerRun, free: NumpyPeerRun): BenchmarkRow[] {
  return timings.map((t) => ({
    routine: t.routine,
    n: t.n,
    unit: t.unit,
    workers: t.workers,
    ours_s: t.ours,
    cores_busy: t.coresBusy ?? null,
    numpy_1thread_s: single.times.get(`${t.peer}/${t.n}`) ?? null,
    numpy_s: free.times.get(`${t.peer}/${t.n}`) ?? null,
  }));
}
