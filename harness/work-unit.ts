import { isSampled, type CheckGroup } from './check-group.js';
import { blockCount } from './sampled-work.js';

/**
 * The smallest piece of a run that can go to a worker thread or a shard: a whole group, or one
 * block of one sample set of a sampled group. `group` indexes the run's planned groups.
 */
export type WorkUnit =
  | { readonly group: number; readonly kind: 'whole' }
  | { readonly group: number; readonly kind: 'block'; readonly set: number; readonly block: number };

/** Which of n disjoint parts of a run to do: `index` from 1 to `count`. */
export interface ShardChoice {
  readonly index: number;
  readonly count: number;
}

/** Every unit of one group, in the order its outcomes are assembled. */
export function unitsOfGroup(group: CheckGroup, at: number): WorkUnit[] {
  if (!isSampled(group)) return [{ group: at, kind: 'whole' }];
  return group.work.setSizes.flatMap((count, set) => Array.from({ length: blockCount(count) }, (_, block) => ({ group: at, kind: 'block' as const, set, block })));
}

/**
 * The units of a run (groups that are skipped have none), or of one shard of it: each sample set's
 * blocks are cut into `count` contiguous runs of nearly equal length, the i-th going to shard i, so
 * every shard does about 1/count of every statistical group; whole groups go round the shards in
 * turn. The shards' units are disjoint and together are all of them.
 */
export function unitsOfRun(groups: readonly CheckGroup[], runnable: (group: CheckGroup) => boolean, shard?: ShardChoice): WorkUnit[] {
  const units: WorkUnit[] = [];
  let wholeSeen = 0;
  groups.forEach((group, at) => {
    if (!runnable(group)) return;
    for (const unit of unitsOfGroup(group, at)) {
      if (shard === undefined || shardOfUnit(group, unit, unit.kind === 'whole' ? wholeSeen : 0, shard.count) === shard.index) units.push(unit);
    }
    if (!isSampled(group)) wholeSeen++;
  });
  return units;
}

/** The shard (1 … count) a unit belongs to; `wholeOrdinal` counts the whole groups before it. */
function shardOfUnit(group: CheckGroup, unit: WorkUnit, wholeOrdinal: number, count: number): number {
  if (unit.kind === 'whole' || !isSampled(group)) return (wholeOrdinal % count) + 1;
  const blocks = blockCount(group.work.setSizes[unit.set]);
  return Math.floor((unit.block * count) / blocks) + 1;
}

/** A unit's name in messages and shard files. */
export function unitLabel(group: CheckGroup, unit: WorkUnit): string {
  return unit.kind === 'whole' ? group.id : `${group.id} set ${unit.set} block ${unit.block}`;
}
