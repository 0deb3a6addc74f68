import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { RunRecipe } from '../run-recipe.js';
import type { UnitOutcome } from '../unit-outcome.js';
import type { UnitRunner } from '../unit-runner.js';
import type { WorkUnit } from '../work-unit.js';
import type { FromWorker, ToWorker, WorkerSetup } from './worker-messages.js';

/** A worker pool cannot start (its adapter does not open there, say): the run stops with this message. */
export class WorkerPoolError extends Error {}

interface PoolWorker {
  readonly thread: Worker;
  /** The unit it is running, if any. */
  busy?: WorkUnit;
  onMessage?: (message: FromWorker) => void;
  /** Called when the thread stops after it was ready. */
  onStop?: (reason: string) => void;
  /** Why the thread stopped, once it has: it may stop after it was ready and before it is given work. */
  stoppedBecause?: string;
}

const WORKER_SCRIPT = new URL('./unit-worker.js', import.meta.url);

/**
 * Whether worker threads can start here: they load the compiled worker script, which exists in the
 * built package but not when the sources run under a TypeScript loader (a test runner, say).
 */
export function workerThreadsAvailable(): boolean {
  return existsSync(fileURLToPath(WORKER_SCRIPT));
}

/** Starts one worker and waits until its adapter is open and its plan made. */
function startWorker(setup: WorkerSetup): Promise<PoolWorker> {
  return new Promise((resolve, reject) => {
    const worker: PoolWorker = { thread: new Worker(WORKER_SCRIPT, { workerData: setup }) };
    let ready = false;
    worker.thread.on('message', (message: FromWorker) => {
      if (!ready) {
        if (message.kind === 'ready') {
          ready = true;
          resolve(worker);
        } else if (message.kind === 'setup-failed') {
          reject(new WorkerPoolError(`a worker thread could not start: ${message.message}`));
        }
        return;
      }
      worker.onMessage?.(message);
    });
    const stop = (reason: string) => {
      worker.stoppedBecause ??= reason;
      worker.onStop?.(reason);
    };
    worker.thread.on('error', (error) => {
      if (!ready) reject(new WorkerPoolError(`a worker thread could not start: ${error.message}`));
      else stop(`worker thread stopped: ${error.message}`);
    });
    worker.thread.on('exit', (code) => {
      if (!ready) reject(new WorkerPoolError(`a worker thread exited (code ${code}) before it was ready`));
      else stop(`worker thread exited with code ${code}`);
    });
  });
}

/**
 * Runs units on `count` worker threads, each with its own adapter opened from the recipe (an
 * in-process module is loaded once per thread, a program is started once per thread). Units are
 * handed out in order to whichever worker is free; outcomes are reported as they come, and the
 * run's assembly puts them back in order. A worker that stops (a crash of native code, an uncaught
 * error) faults the unit it was running and is replaced while units remain.
 */
export async function workerPoolRunner(recipe: RunRecipe, groupIds: readonly string[], count: number): Promise<UnitRunner> {
  const setup: WorkerSetup = { recipe, groupIds };
  const started = await Promise.allSettled(Array.from({ length: count }, () => startWorker(setup)));
  const workers = started.flatMap((s) => (s.status === 'fulfilled' ? [s.value] : []));
  const failure = started.find((s) => s.status === 'rejected');
  if (failure !== undefined) {
    await Promise.all(workers.map((w) => w.thread.terminate()));
    throw (failure as PromiseRejectedResult).reason;
  }
  const closed: string[] = [];
  let closing = false;

  return {
    run(units, abandon, report) {
      return new Promise<void>((resolve, reject) => {
        let next = 0;
        let outstanding = units.length;
        const finish = (unit: WorkUnit, outcome: UnitOutcome) => {
          report(unit, outcome);
          if (--outstanding === 0) resolve();
        };
        const dispatch = (worker: PoolWorker) => {
          worker.onStop = (reason) => stopped(worker, reason);
          while (next < units.length && abandon(units[next])) finish(units[next++], { kind: 'abandoned' });
          if (next >= units.length) return;
          const unit = units[next++];
          worker.busy = unit;
          worker.onMessage = (message) => {
            if (message.kind !== 'outcome') return;
            worker.busy = undefined;
            try {
              finish(unit, message.outcome);
              dispatch(worker);
            } catch (error) {
              reject(error);
            }
          };
          worker.thread.postMessage({ kind: 'unit', unit } satisfies ToWorker);
        };
        const stopped = (worker: PoolWorker, reason: string) => {
          const at = workers.indexOf(worker);
          if (at < 0) return;
          workers.splice(at, 1);
          const unit = worker.busy;
          worker.busy = undefined;
          if (unit !== undefined) finish(unit, { kind: 'fault', faultKind: 'internal-error', faultMethod: 'harness', reason });
          // Replaced only while units wait to be handed out: a thread that stopped running a unit
          // faulted it (and its group's other units are abandoned), so the replacements are bounded
          // by the units, and a run whose implementation crashes in many groups still ends with
          // those groups faulted rather than given up.
          if (outstanding === 0 || next >= units.length) return;
          startWorker(setup).then((replacement) => {
            // The other threads may have done the rest, and the pool been closed, while it started.
            if (closing) return void replacement.thread.terminate();
            workers.push(replacement);
            begin(replacement);
          }, reject);
        };
        // A thread that stopped while the others were starting would never answer the unit it is sent.
        const begin = (worker: PoolWorker) => (worker.stoppedBecause === undefined ? dispatch(worker) : stopped(worker, worker.stoppedBecause));
        if (outstanding === 0) resolve();
        else for (const worker of [...workers]) begin(worker);
      });
    },

    async close() {
      closing = true;
      const running = workers.filter((worker) => worker.stoppedBecause === undefined);
      await Promise.all(
        running.map(
          (worker) =>
            new Promise<void>((resolve) => {
              const timer = setTimeout(() => void worker.thread.terminate().then(() => resolve()), 10_000);
              worker.onMessage = (message) => {
                if (message.kind !== 'closed') return;
                clearTimeout(timer);
                if (message.log !== '') closed.push(message.log);
                resolve();
              };
              worker.onStop = () => {
                clearTimeout(timer);
                resolve();
              };
              worker.thread.postMessage({ kind: 'close' } satisfies ToWorker);
            }),
        ),
      );
      workers.length = 0;
      return closed.join('\n');
    },
  };
}
