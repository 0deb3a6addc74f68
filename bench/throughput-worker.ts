import { parentPort } from 'node:worker_threads';
import { fluctuationSample, type FluctuationWorkload } from './fluctuation-sample.js';

/** A worker of worker-threads-runner.ts: computes the samples of an index range and answers with Σ Tr H⁴. */
export interface ThroughputTask {
  readonly workload: FluctuationWorkload;
  readonly n: number;
  readonly first: number;
  readonly count: number;
}

parentPort!.on('message', (task: ThroughputTask) => {
  let checksum = 0;
  for (let i = task.first; i < task.first + task.count; i++) checksum += fluctuationSample(task.workload, task.n, i).fourthTrace;
  parentPort!.postMessage(checksum);
});
