import { Worker } from 'node:worker_threads';
import { fluctuationSample, type FluctuationWorkload } from './fluctuation-sample.js';
import type { ThroughputTask } from './throughput-worker.js';

/** Wall-clock and CPU seconds (all threads of the process) of one timed run. */
export interface ThroughputTiming {
  readonly wallSeconds: number;
  readonly cpuSeconds: number;
}

/**
 * How the fluctuation-throughput benchmark gets samples computed: in this thread, or on worker
 * threads. A runner computes samples first … first + count − 1 of a workload at order n. Sample i
 * is drawn from randomStream(seed, key, i), so the samples are the same whatever the number of
 * workers; every runner checks Σ Tr H⁴ > 0 so the work stays observable.
 */
export interface ThroughputRunner {
  readonly workers: number;
  readonly description: string;
  run(workload: FluctuationWorkload, n: number, first: number, count: number): Promise<ThroughputTiming>;
  close(): Promise<void>;
}

/** Times `work`: wall clock and the process's CPU time over every thread (CPU/wall = cores busy). */
async function timed(work: () => Promise<number>): Promise<ThroughputTiming> {
  const cpu0 = process.cpuUsage();
  const t0 = performance.now();
  const checksum = await work();
  const wallSeconds = (performance.now() - t0) / 1000;
  const cpu = process.cpuUsage(cpu0);
  // A sum of positive traces is positive; checking it keeps the work observable to the compiler.
  if (!(checksum > 0)) throw new Error(`fluctuation throughput: non-positive Σ Tr H⁴ (${checksum})`);
  return { wallSeconds, cpuSeconds: (cpu.user + cpu.system) / 1e6 };
}

export const inProcessRunner: ThroughputRunner = {
  workers: 1,
  description: 'in process, single-threaded',
  run: (workload, n, first, count) =>
    timed(async () => {
      let checksum = 0;
      for (let i = first; i < first + count; i++) checksum += fluctuationSample(workload, n, i).fourthTrace;
      return checksum;
    }),
  close: async () => undefined,
};

/**
 * `workers` worker threads, started on the first run and kept: each run cuts the index range into
 * `workers` contiguous parts, one per thread.
 */
export function workerThreadsRunner(workers: number): ThroughputRunner {
  let threads: Worker[] | undefined;
  const ask = (thread: Worker, task: ThroughputTask) =>
    new Promise<number>((resolve, reject) => {
      thread.once('message', resolve);
      thread.once('error', reject);
      thread.postMessage(task);
    });
  return {
    workers,
    description: `${workers} worker threads, contiguous index ranges`,
    run(workload, n, first, count) {
      threads ??= Array.from({ length: workers }, () => new Worker(new URL('./throughput-worker.js', import.meta.url)));
      const pool = threads;
      return timed(async () => {
        const parts = pool.map((thread, w) => {
          const from = first + Math.floor((w * count) / workers);
          const to = first + Math.floor(((w + 1) * count) / workers);
          return ask(thread, { workload, n, first: from, count: to - from });
        });
        return (await Promise.all(parts)).reduce((a, b) => a + b, 0);
      });
    },
    async close() {
      await Promise.all((threads ?? []).map((t) => t.terminate()));
      threads = undefined;
    },
  };
}
