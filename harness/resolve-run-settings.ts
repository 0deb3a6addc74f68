import { suiteNames } from '../properties/suite-registry.js';
import { parseAlpha, parseBudget, parseEnsembleList, parseLadder, parseNameList, parseReplayCase, parseSizeList, parseWholeNumber } from './cli/parse-values.js';
import { CHECK_OPTIONS } from './cli/option-table.js';
import { UsageError } from './cli/usage-error.js';
import { ensembleLabel, type EnsembleSpec } from './numeric/ensemble.js';
import {
  DEFAULT_ALPHA,
  DEFAULT_BUDGET,
  DEFAULT_LADDER,
  DEFAULT_SAMPLES,
  DEFAULT_SEED,
  DEFAULT_SIZES,
  type RunSettings,
} from './run-settings.js';

/** Run settings as a program gives them: everything optional, lists as arrays. */
export interface RunOptions {
  /** Suite names (default: semicircle). */
  readonly suites?: readonly string[];
  readonly sizes?: readonly number[];
  readonly ladder?: readonly number[];
  readonly samples?: number;
  readonly seed?: number;
  readonly alpha?: number;
  /** Ensembles as specs or in the CLI syntax ('goe', 'wigner:real:rademacher:diag=zero'); default GOE and GUE. */
  readonly ensembles?: ReadonlyArray<string | EnsembleSpec>;
  readonly only?: readonly string[];
  readonly replayCase?: string;
  readonly budget?: number;
  /** The CLI words that select the adapter, for the replay commands in verdicts (default none). */
  readonly adapterArguments?: string;
}

/** The CLI's defaults, so a program and `rmt-assay check` run the same thing by default. */
const DEFAULT_SUITES: string = CHECK_OPTIONS.suite.default;
const DEFAULT_ENSEMBLES: string = CHECK_OPTIONS.ensemble.default;

/**
 * Fills the defaults `rmt-assay check` uses and validates every value by the same rules as the
 * CLI's options, so a program gets fully defaulted settings that `runChecks` accepts. A bad value
 * throws a RangeError that names the setting (and the CLI option it corresponds to).
 */
export function resolveRunSettings(options: RunOptions = {}): RunSettings {
  try {
    const only = options.only ?? [];
    return {
      suites: parseNameList('suite', options.suites ?? DEFAULT_SUITES, suiteNames()),
      sizes: parseSizeList(options.sizes ?? DEFAULT_SIZES),
      ladder: parseLadder(options.ladder ?? DEFAULT_LADDER),
      samples: parseWholeNumber('samples', options.samples ?? DEFAULT_SAMPLES, 2, 10_000_000),
      seed: parseWholeNumber('seed', options.seed ?? DEFAULT_SEED, 0),
      alpha: parseAlpha(options.alpha ?? DEFAULT_ALPHA),
      ensembles: parseEnsembleList(options.ensembles === undefined ? DEFAULT_ENSEMBLES : options.ensembles.map((e) => (typeof e === 'string' ? e : ensembleLabel(e)))),
      only,
      replayCase: parseReplayCase(options.replayCase, only),
      adapterArguments: options.adapterArguments ?? '',
      budget: parseBudget(options.budget ?? DEFAULT_BUDGET),
    };
  } catch (error) {
    if (error instanceof UsageError) throw new RangeError(`resolveRunSettings: ${error.message.replace(/^--([a-z]+)/, '$1 (--$1)')}`);
    throw error;
  }
}
