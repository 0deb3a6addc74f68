import { isDeepStrictEqual } from 'node:util';
import { isSampled, type CheckFinding, type CheckGroup } from '../check-group.js';
import { RunAssembly } from '../run-assembly.js';
import { outcomeCollector, planGroups, resultOfRun, type RunProgress } from '../run-checks.js';
import { suitesOfRecipe } from '../run-recipe.js';
import type { RunResult } from '../run-result.js';
import { blockCount } from '../sampled-work.js';
import type { UnitOutcome } from '../unit-outcome.js';
import { unitLabel, type WorkUnit } from '../work-unit.js';
import { ShardFileError, type ShardRecord } from './shard-file.js';

/** Whether a unit read from a file names a unit of this plan. */
function isUnitOf(groups: readonly CheckGroup[], value: unknown): value is WorkUnit {
  if (typeof value !== 'object' || value === null || !Number.isInteger((value as WorkUnit).group)) return false;
  const unit = value as WorkUnit;
  const group = groups[unit.group];
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

/** A finding as the assembly and the verdicts read it: a skip with its reason, or a measurement with its evidence. */
function isFinding(value: unknown): value is CheckFinding {
  if (typeof value !== 'object' || value === null) return false;
  const finding = value as Record<string, unknown>;
  if (finding.state === 'skipped') return typeof finding.reason === 'string';
  return finding.state === 'measured' && typeof finding.evidence === 'object' && finding.evidence !== null;
}

/**
 * Whether an outcome read from a file is one that running this unit can give, with the members the
 * assembly reads: a part for a block, one finding per check for a whole group. A damaged file is
 * refused here rather than failing later as a TypeError or concluding from a part that is not there.
 */
function isOutcomeOf(group: CheckGroup, unit: WorkUnit, outcome: unknown): outcome is UnitOutcome {
  if (typeof outcome !== 'object' || outcome === null) return false;
  const o = outcome as Record<string, unknown>;
  switch (o.kind) {
    case 'part':
      return unit.kind === 'block' && Object.hasOwn(o, 'part');
    case 'findings':
      return (
        unit.kind === 'whole' &&
        Array.isArray(o.findings) &&
        o.findings.length === group.checks.length &&
        o.findings.every(isFinding)
      );
    case 'unavailable':
      return typeof o.reason === 'string';
    case 'fault':
      return typeof o.reason === 'string' && typeof o.faultKind === 'string' && typeof o.faultMethod === 'string';
    case 'abandoned':
      return true;
    default:
      return false;
  }
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
    for (const [at, entry] of record.units.entries()) {
      const { unit, outcome } = (entry ?? {}) as { unit?: unknown; outcome?: unknown };
      if (!isUnitOf(groups, unit)) throw new ShardFileError(`shard ${record.shard.index}/${record.shard.count} holds a unit the plan does not have (entry ${at})`);
      if (!isOutcomeOf(groups[unit.group], unit, outcome)) {
        throw new ShardFileError(`shard ${record.shard.index}/${record.shard.count} is damaged: the outcome of ${unitLabel(groups[unit.group], unit)} is malformed`);
      }
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
