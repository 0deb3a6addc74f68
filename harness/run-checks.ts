import { AdapterFault, NotAvailable, type Adapter, type AdapterDescription } from '../adapters/adapter.js';
import type { CheckContext, CheckGroup, PropertySuite } from './check-group.js';
import { decideVerdicts, type RawOutcome } from './decide-verdicts.js';
import { ensembleLabel } from './numeric/ensemble.js';
import { randomStream } from './numeric/random-stream.js';
import { replayCommand } from './replay-command.js';
import { RESULT_FORMAT_VERSION, RUN_CAVEATS, type RunResult } from './run-result.js';
import type { RunSettings } from './run-settings.js';
import { TOOL_NAME, TOOL_VERSION } from './tool-identity.js';
import type { VerdictState } from './verdict.js';

/** Progress as the run goes; reporters hook in here. Verdicts come only at the end (Holm). */
export interface RunProgress {
  onRunStart?(info: { readonly adapter: AdapterDescription; readonly totalChecks: number }): void;
  onCheckFinished?(outcome: RawOutcome, finished: number, total: number): void;
}

function contextFor(adapter: Adapter, description: AdapterDescription, settings: RunSettings): CheckContext {
  return {
    adapter,
    capabilities: new Set(description.capabilities),
    settings,
    stream: (key, index) => randomStream(settings.seed, key, index),
    derivedSeed: (key, index) => randomStream(settings.seed, `implementation-seed/${key}`, index).nextUint32(),
  };
}

function planned(group: CheckGroup, settings: RunSettings) {
  return group.checks.map((c) => ({ ...c, suite: group.suite, replay: replayCommand(settings, group.suite, c.id) }));
}

async function runGroup(group: CheckGroup, context: CheckContext): Promise<RawOutcome[]> {
  const checks = planned(group, context.settings);
  const skip = group.skipReason(context.capabilities);
  if (skip !== null) return checks.map((c) => ({ ...c, state: 'skipped', reason: skip }));
  try {
    const findings = await group.run(context);
    return checks.map((c, i) => {
      const finding = findings[i];
      const replayCase = finding.state === 'measured' ? finding.replayCase : undefined;
      return { ...c, ...finding, ...(replayCase ? { replay: replayCommand(context.settings, group.suite, c.id, replayCase) } : {}) };
    });
  } catch (error) {
    if (error instanceof NotAvailable) {
      return checks.map((c) => ({ ...c, state: 'skipped', reason: error.message }));
    }
    const fault =
      error instanceof AdapterFault
        ? { faultKind: error.kind, faultMethod: error.method, reason: `${error.method}: ${error.message}` }
        : { faultKind: 'internal-error', faultMethod: 'harness', reason: `harness error: ${(error as Error)?.message ?? String(error)}` };
    return checks.map((c) => ({ ...c, state: 'fault', ...fault }));
  }
}

/**
 * Runs the suites against one adapter: plan, run each group (a fault stays inside its group),
 * then apply the family-wise control and assemble the result model.
 */
export async function runChecks(
  adapter: Adapter,
  settings: RunSettings,
  suites: readonly PropertySuite[],
  progress: RunProgress = {},
  adapterLog: () => string = () => '',
): Promise<RunResult> {
  const description = await adapter.describe();
  const context = contextFor(adapter, description, settings);
  // A group runs whole (its checks share samples); with --only, the findings of the checks not
  // asked for are dropped afterwards, never the group's own pairing of checks and findings.
  const only = new Set(settings.only);
  const wanted = (id: string) => only.size === 0 || only.has(id);
  const groups = suites.flatMap((suite) => suite.plan(settings)).filter((g) => g.checks.some((c) => wanted(c.id)));
  const total = groups.reduce((n, g) => n + g.checks.filter((c) => wanted(c.id)).length, 0);
  progress.onRunStart?.({ adapter: description, totalChecks: total });
  const outcomes: RawOutcome[] = [];
  for (const group of groups) {
    for (const outcome of await runGroup(group, context)) {
      if (!wanted(outcome.id)) continue;
      outcomes.push(outcome);
      progress.onCheckFinished?.(outcome, outcomes.length, total);
    }
  }
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
    adapterLog: adapterLog(),
  };
}
