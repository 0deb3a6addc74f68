import type { Adapter, AdapterDescription } from '../adapters/adapter.js';
import type { CheckContext, CheckGroup, PropertySuite } from './check-group.js';
import { decideVerdicts, type RawOutcome } from './decide-verdicts.js';
import { ensembleLabel } from './numeric/ensemble.js';
import { randomStream } from './numeric/random-stream.js';
import { RunAssembly } from './run-assembly.js';
import { RESULT_FORMAT_VERSION, RUN_CAVEATS, type RunResult } from './run-result.js';
import type { RunSettings } from './run-settings.js';
import { TOOL_NAME, TOOL_VERSION } from './tool-identity.js';
import { inThreadRunner, type UnitRunner } from './unit-runner.js';
import type { VerdictState } from './verdict.js';
import { unitsOfRun, type ShardChoice, type WorkUnit } from './work-unit.js';
import type { UnitOutcome } from './unit-outcome.js';

/** Progress as the run goes; reporters hook in here. Verdicts come only at the end (Holm). */
export interface RunProgress {
  onRunStart?(info: { readonly adapter: AdapterDescription; readonly totalChecks: number }): void;
  onCheckFinished?(outcome: RawOutcome, finished: number, total: number): void;
}

/** How the units run: in this thread unless a runner (a worker pool) is given. */
export interface ExecutionOptions {
  readonly runner?: (groups: readonly CheckGroup[], description: AdapterDescription) => Promise<UnitRunner>;
}

export function contextFor(adapter: Adapter, description: AdapterDescription, settings: RunSettings): CheckContext {
  return {
    adapter,
    capabilities: new Set(description.capabilities),
    settings,
    stream: (key, index) => randomStream(settings.seed, key, index),
    derivedSeed: (key, index) => randomStream(settings.seed, `implementation-seed/${key}`, index).nextUint32(),
  };
}

/** Whether a check is asked for (`--only`; all when empty). */
function wantedBy(settings: RunSettings): (id: string) => boolean {
  const only = new Set(settings.only);
  return (id) => only.size === 0 || only.has(id);
}

/**
 * The groups of a run. A group runs whole (its checks share samples); with --only, the findings of
 * the checks not asked for are dropped afterwards, never the group's own pairing of checks and findings.
 */
export function planGroups(settings: RunSettings, suites: readonly PropertySuite[]): CheckGroup[] {
  const wanted = wantedBy(settings);
  return suites.flatMap((suite) => suite.plan(settings)).filter((g) => g.checks.some((c) => wanted(c.id)));
}

/** Runs the units of `groups` (all, or one shard's) and hands each outcome to `record`. */
export async function runUnits(
  adapter: Adapter,
  description: AdapterDescription,
  settings: RunSettings,
  groups: readonly CheckGroup[],
  record: (unit: WorkUnit, outcome: UnitOutcome) => void,
  abandon: (unit: WorkUnit) => boolean,
  options: ExecutionOptions,
  shard?: ShardChoice,
): Promise<string> {
  const context = contextFor(adapter, description, settings);
  const units = unitsOfRun(groups, (g) => g.skipReason(context.capabilities) === null, shard);
  const runner = options.runner === undefined ? inThreadRunner(groups, context) : await options.runner(groups, description);
  try {
    await runner.run(units, abandon, record);
  } catch (error) {
    await runner.close();
    throw error;
  }
  return runner.close();
}

/**
 * Runs the suites against one adapter: plan, run each group's units (a fault stays inside its
 * group), assemble each group as its units come in, then apply the family-wise control and
 * assemble the result model.
 */
export async function runChecks(
  adapter: Adapter,
  settings: RunSettings,
  suites: readonly PropertySuite[],
  progress: RunProgress = {},
  adapterLog: () => string = () => '',
  options: ExecutionOptions = {},
): Promise<RunResult> {
  const description = await adapter.describe();
  const groups = planGroups(settings, suites);
  const assembly = new RunAssembly(groups, { capabilities: new Set(description.capabilities), settings });
  const collect = outcomeCollector(groups, settings, description, progress);
  collect(assembly.releaseFinished());
  const runnerLog = await runUnits(
    adapter,
    description,
    settings,
    groups,
    (unit, outcome) => {
      assembly.record(unit, outcome);
      collect(assembly.releaseFinished());
    },
    (unit) => assembly.hasTrouble(unit),
    options,
  );
  return resultOfRun(description, settings, suites, collect.outcomes, [adapterLog(), runnerLog].filter((l) => l !== '').join('\n'));
}

/** Keeps the wanted outcomes in plan order and reports progress; `onRunStart` goes out on creation. */
export function outcomeCollector(
  groups: readonly CheckGroup[],
  settings: RunSettings,
  description: AdapterDescription,
  progress: RunProgress,
): ((released: readonly RawOutcome[]) => void) & { readonly outcomes: RawOutcome[] } {
  const wanted = wantedBy(settings);
  const total = groups.reduce((n, g) => n + g.checks.filter((c) => wanted(c.id)).length, 0);
  progress.onRunStart?.({ adapter: description, totalChecks: total });
  const outcomes: RawOutcome[] = [];
  const collect = (released: readonly RawOutcome[]) => {
    for (const outcome of released) {
      if (!wanted(outcome.id)) continue;
      outcomes.push(outcome);
      progress.onCheckFinished?.(outcome, outcomes.length, total);
    }
  };
  return Object.assign(collect, { outcomes });
}

/** The result model from the raw outcomes of every group, in plan order. */
export function resultOfRun(
  description: AdapterDescription,
  settings: RunSettings,
  suites: readonly PropertySuite[],
  outcomes: readonly RawOutcome[],
  adapterLog: string,
): RunResult {
  const verdicts = decideVerdicts(outcomes, settings.alpha);
  const counts: Record<VerdictState, number> = { pass: 0, fail: 0, skipped: 0, fault: 0 };
  for (const v of verdicts) counts[v.state]++;
  return {
    formatVersion: RESULT_FORMAT_VERSION,
    tool: { name: TOOL_NAME, version: TOOL_VERSION },
    adapter: description,
    settings: {
      suites: settings.suites,
      sizes: settings.sizes,
      ladder: settings.ladder,
      samples: settings.samples,
      seed: settings.seed,
      alpha: settings.alpha,
      ensembles: settings.ensembles.map(ensembleLabel),
      only: settings.only,
    },
    falseAlarmControl: {
      method: 'holm',
      level: settings.alpha,
      statisticalChecks: verdicts.filter((v) => v.evidence?.kind === 'statistical').length,
    },
    suites: suites.map((s) => ({ name: s.name, description: s.description, checks: verdicts.filter((v) => v.suite === s.name) })),
    counts,
    caveats: RUN_CAVEATS,
    adapterLog,
  };
}
