import { isDeepStrictEqual } from 'node:util';
import { isSampled, type CheckGroup } from '../check-group.js';
import { RunAssembly } from '../run-assembly.js';
import { outcomeCollector, planGroups, resultOfRun, type RunProgress } from '../run-checks.js';
import { suitesOfRecipe } from '../run-recipe.js';
import type { RunResult } from '../run-result.js';
import { blockCount } from '../sampled-work.js';
import type { WorkUnit } from '../work-unit.js';
import { ShardFileError, type ShardRecord } from './shard-file.js';

/** Whether a unit read from a file names a unit of this plan. */
function isUnitOf(groups: readonly CheckGroup[], unit: WorkUnit): boolean {
  const group = groups[unit?.group];
  if (group === undefined) return false;
  if (unit.kind === 'whole') return !isSampled(group);
  return (
    unit.kind === 'block' &&
    isSampled(group) &&
    Number.isInteger(unit.set) &&
    unit.set >= 0 &&
    unit.set < group.work.setSizes.length &&
    Number.isInteger(unit.block) &&
    unit.block >= 0 &&
    unit.block < blockCount(group.work.setSizes[unit.set])
  );
}

/**
 * The result of the run the shards are parts of, as one process running it whole would report it:
 * the plan is made again from the shards' recipe, each group's parts are folded in block order
 * and concluded, and the family-wise control is applied over all checks. `records` must be the
 * shards of one run, in shard order (shard-file.ts's shardsOfOneRun).
 */
export function mergeShards(records: readonly ShardRecord[], progress: RunProgress = {}): RunResult {
  const [first] = records;
  const { settings } = first.recipe;
  const suites = suitesOfRecipe(first.recipe);
  const groups = planGroups(settings, suites);
  if (!isDeepStrictEqual(groups.map((g) => g.id), first.plan)) {
    throw new ShardFileError('the shards were planned differently from this version of rmt-assay: merge them with the version that wrote them');
  }
  const assembly = new RunAssembly(groups, { capabilities: new Set(first.adapter.capabilities), settings });
  const collect = outcomeCollector(groups, settings, first.adapter, progress);
  collect(assembly.releaseFinished());
  for (const record of records) {
    for (const { unit, outcome } of record.units) {
      if (!isUnitOf(groups, unit)) throw new ShardFileError(`shard ${record.shard.index}/${record.shard.count} holds a unit the plan does not have`);
      try {
        assembly.record(unit, outcome);
      } catch (error) {
        throw new ShardFileError(`shard ${record.shard.index}/${record.shard.count}: ${(error as Error).message}`);
      }
      collect(assembly.releaseFinished());
    }
  }
  const unfinished = assembly.unfinished();
  if (unfinished.length > 0) throw new ShardFileError(`the shards lack units of ${unfinished.length} group(s), e.g. ${unfinished[0]}: were they written by an interrupted run?`);
  const log = records.map((r) => r.adapterLog).filter((l) => l !== '').join('\n');
  return resultOfRun(first.adapter, settings, suites, collect.outcomes, log);
}
