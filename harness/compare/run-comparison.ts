import type { Adapter } from '../../adapters/adapter.js';
import { runChecks, type RunProgress } from '../run-checks.js';
import type { RunSettings } from '../run-settings.js';
import type { AgreementMeasurement } from './agreement-group.js';
import type { ComparedImplementation } from './compared-implementation.js';
import type { ComparisonResult, RoutineAgreement } from './comparison-result.js';
import { comparisonReplayCommand } from './comparison-replay-command.js';
import { COMPARISON_SUITE_NAME, comparisonSuite } from './comparison-suite.js';
import { DEFAULT_PROBE_INPUTS, type ProbeInputs } from './probe-inputs.js';

export interface ComparisonOptions {
  /** The words that select each side on the command line, for replay commands (e.g. `module:./a.mjs`). */
  readonly specifications?: { readonly left: string; readonly right: string };
  readonly progress?: RunProgress;
  /** Each side's diagnostic output (a process's stderr), gathered into the result's adapter log. */
  readonly logs?: { readonly left?: () => string; readonly right?: () => string };
  readonly inputs?: ProbeInputs;
}

/**
 * Compares two implementations: the comparison suite run under the harness's engine (planning,
 * faults kept inside their group, Holm over every two-sample test at the settings' alpha), then
 * the result model with both sides, the agreement table and the distinguishing checks. The
 * settings' suites are ignored; sizes, samples, seed, alpha, ensembles and only apply.
 */
export async function runComparison(left: Adapter, right: Adapter, settings: RunSettings, options: ComparisonOptions = {}): Promise<ComparisonResult> {
  const sides: [ComparedImplementation, ComparedImplementation] = [
    { role: 'left', adapter: left, description: await left.describe() },
    { role: 'right', adapter: right, description: await right.describe() },
  ];
  const specifications = options.specifications ?? { left: 'LEFT', right: 'RIGHT' };
  const measurements = new Map<string, AgreementMeasurement>();
  const suite = comparisonSuite(sides, options.inputs ?? DEFAULT_PROBE_INPUTS, (m) => measurements.set(m.checkId, m));
  const runSettings: RunSettings = { ...settings, suites: [COMPARISON_SUITE_NAME], adapterArguments: '' };
  const log = () =>
    (['left', 'right'] as const)
      .map((role) => ({ role, text: options.logs?.[role]?.() ?? '' }))
      .filter((l) => l.text !== '')
      .map((l) => `--- ${l.role} ---\n${l.text}`)
      .join('\n');
  const run = await runChecks(left, runSettings, [suite], options.progress, log);
  const replay = (id: string) => comparisonReplayCommand(specifications, runSettings, id);
  const suites = run.suites.map((s) => ({ ...s, checks: s.checks.map((v) => ({ ...v, replay: replay(v.id) })) }));
  const verdicts = suites.flatMap((s) => s.checks);
  const agreement: RoutineAgreement[] = verdicts.flatMap((v) => {
    const m = measurements.get(v.id);
    if (m === undefined || v.evidence?.kind !== 'deterministic') return [];
    return [{ ...m, threshold: v.evidence.threshold, state: v.state, replay: v.replay }];
  });
  return {
    ...run,
    suites,
    comparison: {
      left: { ...sides[0].description, specification: specifications.left },
      right: { ...sides[1].description, specification: specifications.right },
      agreement,
      distinguishing: verdicts.filter((v) => v.state === 'fail').map((v) => v.id),
    },
  };
}
