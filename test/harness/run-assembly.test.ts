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
 * Feeds the outcomes to a new assembly in the given order, releasing after each as runChecks does.
 * Each outcome is a structured clone, as one from a worker thread is. With `abandonTroubled`, a
 * unit whose group already has trouble comes as 'abandoned', as the runners report units they skip.
 */
function assemble(deliveries: readonly Delivery[], abandonTroubled = false): RawOutcome[] {
  const assembly = new RunAssembly(groups, concludeContext);
  const released = assembly.releaseFinished();
  for (const { unit, outcome } of deliveries) {
    assembly.record(unit, abandonTroubled && assembly.hasTrouble(unit) ? { kind: 'abandoned' } : structuredClone(outcome));
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
        expect(assemble(order.map((i) => inOrder[i]))).toStrictEqual(expected);
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
        const outcomes = assemble(
          order.map((i) => deliveries[i]),
          abandonTroubled,
        );
        const ids = checkIdsOf(at);
        for (const [i, outcome] of outcomes.entries()) {
          if (ids.has(outcome.id)) expect(outcome).toMatchObject({ state: 'fault', faultKind: 'bad-shape', faultMethod: 'sample', reason: 'sample: the block broke' });
          else expect(outcome).toStrictEqual(expected[i]);
        }
      }),
      { numRuns: 40 },
    );
  });

  it('reports the first fault in unit order, and a fault before an unavailability, whatever the order they arrive in', () => {
    fc.assert(
      fc.property(sampledGroupIndex(), fc.uniqueArray(fc.nat(), { minLength: 3, maxLength: 3 }), permutationOf(inOrder.length), (at, picks, order) => {
        const positions = positionsOfGroup(at);
        const chosen = [...new Set(picks.map((p) => positions[p % positions.length]))].sort((a, b) => a - b);
        fc.pre(chosen.length === 3);
        // The earliest unit is merely unavailable; of the two faults, the earlier one is reported.
        const [unavailable, firstFault, laterFault] = chosen;
        const replaced = new Map<number, UnitOutcome>([
          [unavailable, { kind: 'unavailable', reason: 'the ensemble is not offered' }],
          [firstFault, fault('sample: the earlier block broke')],
          [laterFault, fault('sample: the later block broke')],
        ]);
        const deliveries = inOrder.map((d, i) => ({ unit: d.unit, outcome: replaced.get(i) ?? d.outcome }));
        const ids = checkIdsOf(at);
        const reasons = new Set(
          assemble(order.map((i) => deliveries[i]))
            .filter((o) => ids.has(o.id))
            .map((o) => `${o.state}: ${'reason' in o ? o.reason : ''}`),
        );
        expect([...reasons]).toEqual(['fault: sample: the earlier block broke']);
      }),
      { numRuns: 40 },
    );
  });

  it('skips the checks of a group whose only trouble is an unavailable block, with its reason', () => {
    const at = groups.findIndex(isSampled);
    const [first] = positionsOfGroup(at);
    const deliveries = inOrder.map((d, i) => (i === first ? { unit: d.unit, outcome: { kind: 'unavailable', reason: 'not offered here' } as UnitOutcome } : d));
    const outcomes = assemble([...deliveries].reverse());
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
