import type { AdapterDescription } from '../adapters/adapter.js';
import type { CheckVerdict, VerdictState } from './verdict.js';

export const RESULT_FORMAT_VERSION = 1;

export interface SuiteResult {
  readonly name: string;
  readonly description: string;
  readonly checks: readonly CheckVerdict[];
}

/**
 * The one result model of a run. Reporters receive this and nothing else.
 */
export interface RunResult {
  readonly formatVersion: number;
  readonly tool: { readonly name: string; readonly version: string };
  readonly adapter: AdapterDescription;
  readonly settings: {
    readonly suites: readonly string[];
    readonly sizes: readonly number[];
    readonly ladder: readonly number[];
    readonly samples: number;
    readonly seed: number;
    readonly alpha: number;
    readonly ensembles: readonly string[];
    readonly only: readonly string[];
  };
  /** Family-wise false-alarm control over the statistical checks. */
  readonly falseAlarmControl: {
    readonly method: 'holm';
    readonly level: number;
    readonly statisticalChecks: number;
  };
  readonly suites: readonly SuiteResult[];
  readonly counts: Readonly<Record<VerdictState, number>>;
  /** What a pass does and does not prove, stated in every report. */
  readonly caveats: readonly string[];
  /** The implementation's own diagnostic output (a process adapter's stderr), if any. */
  readonly adapterLog: string;
}

export const RUN_CAVEATS: readonly string[] = [
  'A statistical check is a hypothesis test with finite power: a pass means no deviation larger than the check could detect with this many samples, not that none exists.',
  'A correct implementation fails some statistical check with probability at most the family-wise level (Holm over all statistical checks of the run); a single unexpected failure is worth re-running with another seed before it is believed.',
  'A pass at one matrix size is evidence, not a proof: finite-N allowances cover the known corrections, and other sizes can behave differently.',
  'Deterministic checks (per-matrix agreement, identities) compare with a tolerance scaled by machine epsilon, the size and the conditioning; they say nothing about matrices that were not tried.',
];
