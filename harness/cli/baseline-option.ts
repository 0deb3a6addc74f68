import type { PropertySuite } from '../check-group.js';
import { BASELINE_SUITE_NAME, baselineSuite } from '../baseline/baseline-suite.js';
import { BaselineError, loadBaseline } from '../baseline/load-baseline.js';
import { suiteNames } from '../../properties/suite-registry.js';
import { shellQuote } from '../replay-command.js';
import { UsageError } from './usage-error.js';

/** What `check --baseline FILE` adds to a run: the baseline suite, and the words that add it again. */
export interface BaselineOption {
  readonly suite: PropertySuite;
  /** `--baseline FILE`, carried into every replay command with the adapter's words. */
  readonly replayArguments: string;
}

/** Loads the baseline named by --baseline (validated against its schema); undefined without the option. */
export function openBaselineOption(file: string | undefined): BaselineOption | undefined {
  if (file === undefined) return undefined;
  if (file.trim() === '') throw new UsageError('--baseline needs a file');
  try {
    return { suite: baselineSuite(loadBaseline(file), file), replayArguments: `--baseline ${shellQuote(file)}` };
  } catch (error) {
    if (error instanceof BaselineError) throw new UsageError(error.message);
    throw error;
  }
}

/**
 * The names --suite accepts: the registered suites, and with --baseline also 'baseline' (which
 * runs always with --baseline; naming it alone runs nothing else).
 */
export function selectableSuites(baselineFile: string | undefined): string[] {
  return baselineFile === undefined ? suiteNames() : [...suiteNames(), BASELINE_SUITE_NAME];
}
