import type { AdapterDescription } from '../../adapters/adapter.js';
import type { RunResult } from '../run-result.js';
import type { VerdictState } from '../verdict.js';

/** One routine's agreement on the probe matrices of one ensemble and size, for a table. */
export interface RoutineAgreement {
  /** The id of the check that holds the verdict (its evidence has the worst input and ratio). */
  readonly checkId: string;
  readonly routine: string;
  readonly ensemble: string;
  readonly size: number;
  /** Matrices compared. */
  readonly inputs: number;
  /** Largest relative difference over the inputs (normwise for a spectrum, per trace otherwise). */
  readonly maxRelativeDifference: number;
  /** Log relative error of that difference: the fewest decimal digits on which the two agree. */
  readonly digits: number;
  /** Worst |left − right| over the rounding-error scale both may carry; the check's threshold. */
  readonly ratio: number;
  readonly threshold: number;
  /** The input with the worst ratio, in replayable words. */
  readonly worstInput: string;
  readonly state: VerdictState;
  readonly replay: string;
}

/** One side of a comparison: its description and the words that select it on the command line. */
export type ComparedSide = AdapterDescription & { readonly specification: string };

/**
 * The result of `compare`: a run result whose single suite, 'compare', holds one verdict per
 * comparison (so every reporter shows it), with the two sides, the agreement table and the ids of
 * the checks that tell the two apart. `adapter` is the left side.
 */
export interface ComparisonResult extends RunResult {
  readonly comparison: {
    readonly left: ComparedSide;
    readonly right: ComparedSide;
    readonly agreement: readonly RoutineAgreement[];
    /** Checks that failed: each is a difference between the two beyond what chance or rounding explains. */
    readonly distinguishing: readonly string[];
  };
}
