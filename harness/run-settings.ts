import type { EnsembleSpec } from './numeric/ensemble.js';

/**
 * Everything a run needs, fully defaulted: resolved once from the CLI, a config or an API call,
 * so nothing downstream checks for undefined.
 */
export interface RunSettings {
  readonly suites: readonly string[];
  /** Matrix sizes N for the per-size checks. */
  readonly sizes: readonly number[];
  /** Matrix sizes of the checks that fit a rate over N (at least three). */
  readonly ladder: readonly number[];
  /** Matrices per statistical estimate. */
  readonly samples: number;
  /** The run's seed: every random stream and every drawn parameter derives from it. */
  readonly seed: number;
  /** Family-wise false-alarm level over the run's statistical checks (Holm). */
  readonly alpha: number;
  readonly ensembles: readonly EnsembleSpec[];
  /** Run only the checks with these ids (empty: all). */
  readonly only: readonly string[];
  /**
   * A randomised check's case to replay, as fast-check's path (e.g. "3:1:0"), with `only` naming
   * the check and `seed` the run: the check then runs that one shrunk case. Empty: none.
   */
  readonly replayCase: string;
  /** The CLI words that select the adapter, for replay commands (e.g. `--module ./kernel.js`). */
  readonly adapterArguments: string;
  /**
   * Scales the sample counts of the fluctuation suite (1 = the default, sized for about a minute
   * at N = 200 on two cores): more samples, more power, more time.
   */
  readonly budget: number;
}

export const DEFAULT_ALPHA = 1e-3;
export const DEFAULT_SAMPLES = 300;
export const DEFAULT_SIZES: readonly number[] = [200];
export const DEFAULT_LADDER: readonly number[] = [100, 200, 400, 800];
export const DEFAULT_SEED = 20261202;
export const DEFAULT_BUDGET = 1;
