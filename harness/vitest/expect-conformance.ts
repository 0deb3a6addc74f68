import { AssertionError } from 'node:assert';
import type { Adapter } from '../../adapters/adapter.js';
import { SUITES } from '../../properties/suite-registry.js';
import type { PropertySuite } from '../check-group.js';
import { resolveRunSettings, type RunOptions } from '../resolve-run-settings.js';
import { runChecks } from '../run-checks.js';
import type { RunResult } from '../run-result.js';
import { conformanceFailureMessage } from './conformance-failure-message.js';

/**
 * Throws an AssertionError (node:assert, so any test runner reports it as a failed assertion)
 * when the run has a failed or faulted check, or when no check passed at all; its message lists
 * each failing check with observed, expected, error bar and replay command. Returns nothing
 * when the run conforms.
 */
export function assertConforms(result: RunResult): void {
  const message = conformanceFailureMessage(result);
  if (message === null) return;
  const failing = result.suites.flatMap((s) => s.checks).filter((v) => v.state === 'fail' || v.state === 'fault');
  throw new AssertionError({ message, actual: failing.map((v) => v.id), expected: [], operator: 'conforms' });
}

/** Settings of `expectConformance`: those of `rmt-assay check` by their API names, plus suites of one's own. */
export interface ConformanceOptions extends RunOptions {
  /** Suites to run besides those named in `suites` (a baseline suite, say). */
  readonly extraSuites?: readonly PropertySuite[];
}

/**
 * Runs the suites on the adapter with fully resolved settings (the CLI's defaults for anything not
 * given) and asserts that it conforms; resolves to the result for further assertions. Meant for a
 * lab's own test suite: `await expectConformance(adapter, { suites: ['identities'], sizes: [64] })`.
 * It does not close the adapter.
 */
export async function expectConformance(adapter: Adapter, options: ConformanceOptions = {}): Promise<RunResult> {
  const settings = resolveRunSettings(options);
  const suites = [...settings.suites.map((name) => SUITES.get(name)!), ...(options.extraSuites ?? [])];
  const result = await runChecks(adapter, settings, suites);
  assertConforms(result);
  return result;
}
