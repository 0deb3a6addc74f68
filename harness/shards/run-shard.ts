import type { Adapter } from '../../adapters/adapter.js';
import type { PropertySuite } from '../check-group.js';
import { planGroups, runUnits, type ExecutionOptions } from '../run-checks.js';
import type { RunRecipe } from '../run-recipe.js';
import type { UnitOutcome } from '../unit-outcome.js';
import type { ShardChoice, WorkUnit } from '../work-unit.js';
import { shardRecord, type ShardRecord } from './shard-file.js';

/** Unit order: group, then sample set, then block. */
function unitOrder(a: WorkUnit, b: WorkUnit): number {
  if (a.group !== b.group) return a.group - b.group;
  if (a.kind === 'block' && b.kind === 'block') return a.set - b.set || a.block - b.block;
  return 0;
}

/**
 * Runs the i-th of n disjoint parts of a run (work-unit.ts says which units) and returns what
 * `merge` needs: the outcomes of its units, in unit order, with the run's recipe and plan.
 */
export async function runShard(
  adapter: Adapter,
  recipe: RunRecipe,
  suites: readonly PropertySuite[],
  shard: ShardChoice,
  adapterLog: () => string = () => '',
  options: ExecutionOptions = {},
): Promise<ShardRecord> {
  const description = await adapter.describe();
  const groups = planGroups(recipe.settings, suites);
  const units: Array<{ unit: WorkUnit; outcome: UnitOutcome }> = [];
  const troubled = new Set<number>();
  const runnerLog = await runUnits(
    adapter,
    description,
    recipe.settings,
    groups,
    (unit, outcome) => {
      units.push({ unit, outcome });
      if (outcome.kind === 'fault' || outcome.kind === 'unavailable') troubled.add(unit.group);
    },
    (unit) => troubled.has(unit.group),
    options,
    shard,
  );
  return shardRecord({
    shard,
    recipe,
    adapter: description,
    adapterLog: [adapterLog(), runnerLog].filter((l) => l !== '').join('\n'),
    plan: groups.map((g) => g.id),
    units: units.sort((a, b) => unitOrder(a.unit, b.unit)),
  });
}
