import { isSampled, type CheckContext, type CheckGroup } from './check-group.js';
import { blockRange } from './sampled-work.js';
import { outcomeOfError, type UnitOutcome } from './unit-outcome.js';
import type { WorkUnit } from './work-unit.js';

/** Runs one unit of a group against the context's adapter; never throws. */
export async function executeUnit(group: CheckGroup, unit: WorkUnit, context: CheckContext): Promise<UnitOutcome> {
  try {
    if (unit.kind === 'whole') {
      if (isSampled(group)) throw new Error(`${group.id} is a sampled group, not a whole one`);
      return { kind: 'findings', findings: await group.run(context) };
    }
    if (!isSampled(group)) throw new Error(`${group.id} has no sample blocks`);
    const { start, end } = blockRange(group.work.setSizes[unit.set], unit.block);
    return { kind: 'part', part: await group.work.observe(context, unit.set, start, end) };
  } catch (error) {
    return outcomeOfError(error);
  }
}
