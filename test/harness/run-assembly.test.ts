import fc from 'fast-check';
import { beforeAll, describe, expect, it } from 'vitest';
import { ReferenceAdapter } from '../../adapters/reference-adapter.js';
import { isSampled, type CheckGroup, type ConcludeContext } from '../../harness/check-group.js';
import type { RawOutcome } from '../../harness/decide-verdicts.js';
import { executeUnit } from '../../harness/execute-unit.js';
import { RunAssembly } from '../../harness/run-assembly.js';
import { contextFor, planGroups } from '../../harness/run-checks.js';
import type { UnitOutcome } from '../../harness/unit-outcome.js';
import { unitsOfRun, type WorkUnit } from '../../harness/work-unit.js';
import { semicircleSuite } from '../../properties/semicircle.js';
import { testSettings } from '../support/run-settings-for-tests.js';

interface Delivery {
  readonly unit: WorkUnit;
  readonly outcome: UnitOutcome;
}

/**
 * The semicircle suite at a tiny size: 100 samples are 4 blocks (the last of 4 samples) per set of
 * the per-size groups; the Kolmogorov-decay groups draw more at the small sizes of the ladder.
 */
const settings = testSettings({ sizes: [16], ladder: [16, 24, 32], samples: 100, ensembles: [{ kind: 'goe' }, { kind: 'gue' }] });
let groups: CheckGroup[];
let concludeContext: ConcludeContext;
/** Every unit's real outcome against the reference engine, in the run's unit order. */
let inOrder: Delivery[];
/** What the assembly gives for them in that order. */
let expected: RawOutcome[];

beforeAll(async () => {
  const adapter = new ReferenceAdapter();
  const description = await adapter.describe();
  const context = contextFor(adapter, description, settings);
  concludeContext = { capabilities: context.capabilities, settings };
  groups = planGroups(settings, [semicircleSuite]);
  inOrder = [];
  for (const unit of unitsOfRun(groups, (g) => g.skipReason(context.capabilities) === null)) {
    inOrder.push({ unit, outcome: await executeUnit(groups[unit.group], unit, context) });
  }
  expected = assemble(inOrder);
});

/**
 * Feeds the deliveries to a new assembly in the given order (by index into `deliveries`, whose
 * order is the run's unit order), releasing after each as runChecks does. Each outcome is a
 * structured clone, as one from a worker thread is. With `abandonTroubled`, a unit that comes after
 * a trouble already heard of in its group (in unit order) comes as 'abandoned', as a runner reports
 * the units it has not yet handed out when their group is in trouble.
 */
function assemble(deliveries: readonly Delivery[], order: readonly number[] = deliveries.map((_, i) => i), abandonTroubled = false): RawOutcome[] {
  const assembly = new RunAssembly(groups, concludeContext);
  const released = assembly.releaseFinished();
  const firstTrouble = new Map<number, number>();
  for (const i of order) {
    const { unit, outcome } = deliveries[i];
    const abandoned = abandonTroubled && (firstTrouble.get(unit.group) ?? Infinity) < i;
    if (abandoned) expect(assembly.hasTrouble(unit)).toBe(true);
    assembly.record(unit, abandoned ? { kind: 'abandoned' } : structuredClone(outcome));
    if (!abandoned && (outcome.kind === 'fault' || outcome.kind === 'unavailable')) firstTrouble.set(unit.group, Math.min(i, firstTrouble.get(unit.group) ?? Infinity));
    released.push(...assembly.releaseFinished());
  }
  expect(assembly.unfinished()).toEqual([]);
  return released;
}

/** An order of n deliveries: a permutation of 0 … n − 1. */
const permutationOf = (n: number) => fc.shuffledSubarray(Array.from({ length: n }, (_, i) => i), { minLength: n, maxLength: n });

/** The checks of group `at`, by id. */
const checkIdsOf = (at: number) => new Set(groups[at].checks.map((c) => c.id));

/** The units of one sampled group among the deliveries, by position. */
function positionsOfGroup(at: number): number[] {
  return inOrder.flatMap((d, i) => (d.unit.group === at ? [i] : []));
}

const sampledGroupIndex = () => fc.constantFrom(...groups.flatMap((g, at) => (isSampled(g) ? [at] : [])));

function fault(reason: string): UnitOutcome {
  return { kind: 'fault', faultKind: 'bad-shape', faultMethod: 'sample', reason };
}

describe('RunAssembly: unit outcomes in any order give the run in order', () => {
  it('assembles a run of sampled groups whose checks were all measured (so the comparisons below are of real figures)', () => {
    expect(groups.every(isSampled)).toBe(true);
    expect(inOrder.length).toBeGreaterThanOrEqual(4 * groups.length);
    expect(inOrder.every((d) => d.outcome.kind === 'part')).toBe(true);
    expect(expected.map((o) => o.id)).toEqual(groups.flatMap((g) => g.checks.map((c) => c.id)));
    expect(expected.filter((o) => o.state !== 'measured').map((o) => `${o.id}: ${o.state} ${'reason' in o ? o.reason : ''}`)).toEqual([]);
  });

  it('gives the same raw outcomes, bit for bit (toStrictEqual compares numbers by Object.is), whatever the arrival order', () => {
    fc.assert(
      fc.property(permutationOf(inOrder.length), (order) => {
        expect(assemble(inOrder, order)).toStrictEqual(expected);
      }),
      { numRuns: 40 },
    );
  });

  it('faults every check of a group in which one block faulted, and only that group, whatever the order', () => {
    fc.assert(
      fc.property(sampledGroupIndex(), fc.nat(), permutationOf(inOrder.length), fc.boolean(), (at, pick, order, abandonTroubled) => {
        const positions = positionsOfGroup(at);
        const broken = positions[pick % positions.length];
        const deliveries = inOrder.map((d, i) => (i === broken ? { unit: d.unit, outcome: fault('sample: the block broke') } : d));
        const outcomes = assemble(deliveries, order, abandonTroubled);
        const ids = checkIdsOf(at);
        for (const [i, outcome] of outcomes.entries()) {
          if (ids.has(outcome.id)) expect(outcome).toMatchObject({ state: 'fault', faultKind: 'bad-shape', faultMethod: 'sample', reason: 'sample: the block broke' });
          else expect(outcome).toStrictEqual(expected[i]);
        }
      }),
      { numRuns: 40 },
    );
  });

  it('reports the first trouble in unit order, fault or unavailability, as a run that stops the group there does, whatever the order', () => {
    const troubleArbitrary = fc.uniqueArray(fc.record({ pick: fc.nat(), fault: fc.boolean() }), { minLength: 1, maxLength: 3, selector: (t) => t.pick });
    fc.assert(
      fc.property(sampledGroupIndex(), troubleArbitrary, permutationOf(inOrder.length), fc.boolean(), (at, troubles, order, abandonTroubled) => {
        const positions = positionsOfGroup(at);
        const replaced = new Map<number, UnitOutcome>();
        for (const { pick, fault: isFault } of troubles) {
          const position = positions[pick % positions.length];
          replaced.set(position, isFault ? fault(`sample: block at ${position} broke`) : { kind: 'unavailable', reason: `not offered at ${position}` });
        }
        const deliveries = inOrder.map((d, i) => ({ unit: d.unit, outcome: replaced.get(i) ?? d.outcome }));
        // The in-thread runner: units in order, the group's units after its first trouble abandoned.
        const stoppedAtFirst = assemble(deliveries, undefined, true);
        // Shards and worker threads: troubles after the first may run too, and outcomes arrive in any order.
        const heardAll = assemble(deliveries, order, abandonTroubled);
        expect(heardAll).toStrictEqual(stoppedAtFirst);
        const first = Math.min(...replaced.keys());
        const trouble = replaced.get(first)!;
        const ids = checkIdsOf(at);
        for (const outcome of heardAll.filter((o) => ids.has(o.id))) {
          if (trouble.kind === 'fault') expect(outcome).toMatchObject({ state: 'fault', reason: trouble.reason });
          else expect(outcome).toMatchObject({ state: 'skipped', reason: trouble.kind === 'unavailable' ? trouble.reason : '' });
        }
      }),
      { numRuns: 60 },
    );
  });

  it('skips the checks of a group whose only trouble is an unavailable block, with its reason', () => {
    const at = groups.findIndex(isSampled);
    const [first] = positionsOfGroup(at);
    const deliveries = inOrder.map((d, i) => (i === first ? { unit: d.unit, outcome: { kind: 'unavailable', reason: 'not offered here' } as UnitOutcome } : d));
    const outcomes = assemble(deliveries, deliveries.map((_, i) => deliveries.length - 1 - i));
    const ids = checkIdsOf(at);
    expect(outcomes.filter((o) => ids.has(o.id)).every((o) => o.state === 'skipped' && o.reason === 'not offered here')).toBe(true);
  });

  it('refuses a unit reported twice', () => {
    const assembly = new RunAssembly(groups, concludeContext);
    const positions = positionsOfGroup(0);
    for (const i of positions) assembly.record(inOrder[i].unit, structuredClone(inOrder[i].outcome));
    expect(() => assembly.record(inOrder[positions[0]].unit, structuredClone(inOrder[positions[0]].outcome))).toThrow(/more outcomes than units/);
  });

  it('releases nothing past a group that still lacks a unit, and names it as unfinished', () => {
    const assembly = new RunAssembly(groups, concludeContext);
    const missing = positionsOfGroup(1)[2];
    const released: RawOutcome[] = [];
    for (const [i, d] of inOrder.entries()) {
      if (i === missing) continue;
      assembly.record(d.unit, structuredClone(d.outcome));
      released.push(...assembly.releaseFinished());
    }
    expect(released).toStrictEqual(expected.slice(0, groups[0].checks.length));
    expect(assembly.unfinished()).toEqual([groups[1].id]);
  });
});
