import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isSampled, type CheckGroup } from '../../harness/check-group.js';
import { planGroups } from '../../harness/run-checks.js';
import { blockCount } from '../../harness/sampled-work.js';
import { unitsOfGroup, unitsOfRun, type WorkUnit } from '../../harness/work-unit.js';
import { SUITES } from '../../properties/suite-registry.js';
import { testSettings } from '../support/run-settings-for-tests.js';

/** The real plan of every suite at a small size: whole groups (identities) and sampled ones with sets of several sizes. */
function plan(samples: number, budget: number): CheckGroup[] {
  const settings = testSettings({
    suites: [...SUITES.keys()],
    sizes: [24],
    ladder: [16, 24, 32],
    samples,
    budget,
    ensembles: [{ kind: 'goe' }, { kind: 'gue' }],
  });
  return planGroups(settings, [...SUITES.values()]);
}

const key = (unit: WorkUnit) => JSON.stringify(unit);

/** Drops every third group, as groups that cannot run with the adapter's capabilities are dropped. */
const someRunnable = (groups: readonly CheckGroup[]) => (group: CheckGroup) => groups.indexOf(group) % 3 !== 1;

describe('unitsOfRun: the shards of a run', () => {
  const plans = [plan(2, 0.05), plan(64, 0.1), plan(100, 0.1), plan(161, 0.3)];

  it('plan whole and sampled groups, with sets of fewer blocks than some shard counts and of more', () => {
    expect(plans.every((groups) => groups.some((g) => !isSampled(g)))).toBe(true);
    const blockCounts = plans.flat().filter(isSampled).flatMap((g) => g.work.setSizes.map(blockCount));
    expect(Math.min(...blockCounts)).toBeLessThan(3);
    expect(Math.max(...blockCounts)).toBeGreaterThan(7);
  });

  it('are disjoint and together are every unit of the run, for 1 to 7 shards', () => {
    fc.assert(
      fc.property(fc.constantFrom(...plans.keys()), fc.integer({ min: 1, max: 7 }), fc.boolean(), (which, count, all) => {
        const groups = plans[which];
        const runnable = all ? () => true : someRunnable(groups);
        const whole = unitsOfRun(groups, runnable).map(key);
        const shards = Array.from({ length: count }, (_, i) => unitsOfRun(groups, runnable, { index: i + 1, count }).map(key));
        const seen = shards.flat();
        expect(new Set(seen).size).toBe(seen.length);
        expect([...seen].sort()).toEqual([...whole].sort());
      }),
    );
  });

  it('keep the units of one shard in the order of the whole run', () => {
    for (const groups of plans) {
      const order = new Map(unitsOfRun(groups, () => true).map((u, i) => [key(u), i]));
      for (let count = 1; count <= 7; count++) {
        for (let index = 1; index <= count; index++) {
          const positions = unitsOfRun(groups, () => true, { index, count }).map((u) => order.get(key(u))!);
          expect(positions).toEqual([...positions].sort((a, b) => a - b));
        }
      }
    }
  });

  it("give each shard one contiguous run of every set's blocks, of nearly equal length, in shard order", () => {
    for (const groups of plans) {
      for (let count = 1; count <= 7; count++) {
        const shards = Array.from({ length: count }, (_, i) => unitsOfRun(groups, () => true, { index: i + 1, count }));
        groups.forEach((group, at) => {
          if (!isSampled(group)) return;
          group.work.setSizes.forEach((size, set) => {
            const blocksOf = shards.map((units) => units.flatMap((u) => (u.group === at && u.kind === 'block' && u.set === set ? [u.block] : [])));
            // Shard 1's blocks, then shard 2's, …: 0, 1, 2, … without a gap or a repeat.
            expect(blocksOf.flat()).toEqual(Array.from({ length: blockCount(size) }, (_, b) => b));
            const lengths = blocksOf.map((b) => b.length);
            expect(Math.max(...lengths) - Math.min(...lengths)).toBeLessThanOrEqual(1);
          });
        });
      }
    }
  });

  it('hand the whole groups round the shards in turn', () => {
    for (const groups of plans) {
      for (let count = 1; count <= 7; count++) {
        const wholeGroups = Array.from({ length: count }, (_, i) =>
          unitsOfRun(groups, () => true, { index: i + 1, count }).filter((u) => u.kind === 'whole').length,
        );
        const total = groups.filter((g) => !isSampled(g)).length;
        expect(wholeGroups.reduce((a, b) => a + b, 0)).toBe(total);
        expect(Math.max(...wholeGroups) - Math.min(...wholeGroups)).toBeLessThanOrEqual(1);
      }
    }
  });

  it('with one shard are the whole run, and leave out the groups that cannot run', () => {
    for (const groups of plans) {
      expect(unitsOfRun(groups, () => true, { index: 1, count: 1 })).toEqual(unitsOfRun(groups, () => true));
      const runnable = someRunnable(groups);
      const expected = groups.flatMap((g, at) => (runnable(g) ? unitsOfGroup(g, at) : []));
      expect(unitsOfRun(groups, runnable)).toEqual(expected);
    }
  });
});
