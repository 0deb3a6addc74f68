import { isSampled, type CheckFinding, type CheckGroup, type ConcludeContext } from './check-group.js';
import type { RawOutcome } from './decide-verdicts.js';
import { replayCommand } from './replay-command.js';
import { blockCount } from './sampled-work.js';
import { outcomeOfError, type UnitOutcome } from './unit-outcome.js';
import { unitsOfGroup, type WorkUnit } from './work-unit.js';

/** The running left fold of one sample set's parts, in block order, with blocks that came early. */
interface SetFold {
  next: number;
  folded: unknown;
  readonly early: Map<number, unknown>;
}

interface GroupState {
  readonly group: CheckGroup;
  readonly skipReason: string | null;
  readonly expected: number;
  received: number;
  /**
   * The first fault or unavailability by unit order, whichever it is. Not "a fault before an
   * unavailability": a run abandons a group's later units at its first trouble, so a fault after an
   * unavailability is seen or not depending on how the units were spread, while the first trouble
   * by unit order always runs (a group's units are handed out in that order in every runner and shard).
   */
  trouble?: { readonly ordinal: number; readonly outcome: Extract<UnitOutcome, { kind: 'fault' | 'unavailable' }> };
  findings?: readonly CheckFinding[];
  readonly sets: SetFold[];
}

/**
 * Turns unit outcomes, arriving in any order from any number of workers or shard files, into each
 * group's raw outcomes, as one single-threaded run would: a group's sample parts are folded left
 * in block order (blocks that arrive early wait, so memory stays at the blocks in flight), and its
 * findings are concluded once every unit is in. Groups are released in plan order.
 */
export class RunAssembly {
  private readonly states: GroupState[];
  private released = 0;

  constructor(
    groups: readonly CheckGroup[],
    private readonly context: ConcludeContext,
  ) {
    this.states = groups.map((group, at) => {
      const skipReason = group.skipReason(context.capabilities);
      const sets = isSampled(group) ? group.work.setSizes.map(() => ({ next: 0, folded: undefined, early: new Map() })) : [];
      return { group, skipReason, expected: skipReason === null ? unitsOfGroup(group, at).length : 0, received: 0, sets };
    });
  }

  /** Whether a unit's group has already faulted or turned out unavailable (the unit need not run). */
  hasTrouble(unit: WorkUnit): boolean {
    return this.states[unit.group].trouble !== undefined;
  }

  record(unit: WorkUnit, outcome: UnitOutcome): void {
    const state = this.states[unit.group];
    state.received++;
    if (state.received > state.expected) throw new Error(`${state.group.id}: more outcomes than units (one unit reported twice)`);
    switch (outcome.kind) {
      case 'abandoned':
        return;
      case 'fault':
      case 'unavailable': {
        const ordinal = ordinalOf(state.group, unit);
        if (state.trouble === undefined || ordinal < state.trouble.ordinal) state.trouble = { ordinal, outcome };
        state.sets.forEach((s) => s.early.clear());
        return;
      }
      case 'findings':
        state.findings = outcome.findings;
        return;
      case 'part': {
        if (unit.kind !== 'block' || !isSampled(state.group)) throw new Error(`${state.group.id}: a part for a unit that has no blocks`);
        if (state.trouble !== undefined) return;
        const fold = state.sets[unit.set];
        fold.early.set(unit.block, outcome.part);
        const work = state.group.work;
        while (fold.early.has(fold.next)) {
          const part = fold.early.get(fold.next);
          fold.early.delete(fold.next);
          fold.folded = fold.next === 0 ? part : work.combine(fold.folded, part);
          fold.next++;
        }
      }
    }
  }

  /** Raw outcomes of the groups finished since the last call, in plan order, up to the first unfinished one. */
  releaseFinished(): RawOutcome[] {
    const out: RawOutcome[] = [];
    while (this.released < this.states.length && this.isFinished(this.states[this.released])) {
      out.push(...this.outcomesOf(this.states[this.released]));
      this.released++;
    }
    return out;
  }

  /** Groups not finished (for a message when units are missing). */
  unfinished(): string[] {
    return this.states.filter((s) => !this.isFinished(s)).map((s) => s.group.id);
  }

  private isFinished(state: GroupState): boolean {
    return state.received === state.expected;
  }

  private outcomesOf(state: GroupState): RawOutcome[] {
    const { group } = state;
    const checks = group.checks.map((c) => ({ ...c, suite: group.suite, replay: replayCommand(this.context.settings, group.suite, c.id) }));
    if (state.skipReason !== null) return checks.map((c) => ({ ...c, state: 'skipped', reason: state.skipReason! }));
    if (state.trouble !== undefined) return this.troubleOutcomes(checks, state.trouble.outcome);
    let findings: readonly CheckFinding[];
    try {
      if (isSampled(group)) findings = group.work.conclude(this.context, state.sets.map((s) => s.folded));
      else if (state.findings === undefined) throw new Error(`${group.id} gave no findings`);
      else findings = state.findings;
    } catch (error) {
      return this.troubleOutcomes(checks, outcomeOfError(error));
    }
    return checks.map((c, i) => {
      const finding = findings[i];
      const replayCase = finding.state === 'measured' ? finding.replayCase : undefined;
      return { ...c, ...finding, ...(replayCase ? { replay: replayCommand(this.context.settings, group.suite, c.id, replayCase) } : {}) };
    });
  }

  private troubleOutcomes(
    checks: ReadonlyArray<Omit<RawOutcome, 'state'> & Pick<RawOutcome, 'id'>>,
    trouble: Extract<UnitOutcome, { kind: 'fault' | 'unavailable' }>,
  ): RawOutcome[] {
    if (trouble.kind === 'unavailable') return checks.map((c) => ({ ...c, state: 'skipped', reason: trouble.reason }) as RawOutcome);
    return checks.map((c) => ({ ...c, state: 'fault', faultKind: trouble.faultKind, faultMethod: trouble.faultMethod, reason: trouble.reason }) as RawOutcome);
  }
}

/** A unit's position among its group's units. */
function ordinalOf(group: CheckGroup, unit: WorkUnit): number {
  if (unit.kind === 'whole' || !isSampled(group)) return 0;
  let before = 0;
  for (let set = 0; set < unit.set; set++) before += blockCount(group.work.setSizes[set]);
  return before + unit.block;
}
