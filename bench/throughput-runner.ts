import { fluctuationSample, type FluctuationWorkload } from './fluctuation-sample.js';

/**
 * How the fluctuation-throughput benchmark gets samples computed: the extension point for running
 * them on several workers. A runner computes samples first … first + count − 1 of a workload at
 * order n and resolves to the wall-clock seconds that took. The benchmark times every runner it is
 * given on the same workloads and reports one row per runner, labelled with its `workers`.
 *
 * Only the in-process runner (one worker, this thread) exists here. A worker-pool runner sends the
 * workload (plain data) and a range of indices to each worker, which calls `fluctuationSample` for
 * its indices; because sample i is drawn from randomStream(seed, key, i), the samples are the same
 * whatever the number of workers. Add it to the list in run-bench.ts when the pool exists.
 */
export interface ThroughputRunner {
  readonly workers: number;
  readonly description: string;
  run(workload: FluctuationWorkload, n: number, first: number, count: number): Promise<number>;
}

export const inProcessRunner: ThroughputRunner = {
  workers: 1,
  description: 'in process, single-threaded',
  async run(workload, n, first, count) {
    let checksum = 0;
    const t0 = performance.now();
    for (let i = first; i < first + count; i++) checksum += fluctuationSample(workload, n, i).fourthTrace;
    const seconds = (performance.now() - t0) / 1000;
    // A sum of positive traces is positive; checking it keeps the work observable to the compiler.
    if (!(checksum > 0)) throw new Error(`fluctuation throughput: non-positive Σ Tr H⁴ (${checksum})`);
    return seconds;
  },
};
