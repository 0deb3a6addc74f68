import type { CheckContext, CheckGroup } from './check-group.js';
import { executeUnit } from './execute-unit.js';
import type { UnitOutcome } from './unit-outcome.js';
import type { WorkUnit } from './work-unit.js';

/**
 * Runs work units and reports each outcome as it comes: in this thread one after another, or on a
 * pool of worker threads (parallel/worker-pool.ts). Which runner ran a unit never changes its
 * outcome: a unit's samples depend only on the seed and the unit.
 */
export interface UnitRunner {
  /** Resolves when every unit has been reported; `abandon(unit)` says a unit need not run any more. */
  run(units: readonly WorkUnit[], abandon: (unit: WorkUnit) => boolean, report: (unit: WorkUnit, outcome: UnitOutcome) => void): Promise<void>;
  /** Releases threads and adapters; returns the implementation's diagnostic output gathered by the runner's own adapters. */
  close(): Promise<string>;
}

/** Runs the units in this thread, in order, against the context's adapter. */
export function inThreadRunner(groups: readonly CheckGroup[], context: CheckContext): UnitRunner {
  return {
    async run(units, abandon, report) {
      for (const unit of units) report(unit, abandon(unit) ? { kind: 'abandoned' } : await executeUnit(groups[unit.group], unit, context));
    },
    close: async () => '',
  };
}
