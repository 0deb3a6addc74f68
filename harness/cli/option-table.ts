import { DEFAULT_ALPHA, DEFAULT_BUDGET, DEFAULT_LADDER, DEFAULT_SAMPLES, DEFAULT_SEED, DEFAULT_SIZES } from '../run-settings.js';

/**
 * The `check` command's options, declared once: yargs is configured from this table, and so is
 * everything else that needs to know the options (help text, a config file's schema).
 */
export interface OptionDeclaration {
  readonly type: 'string' | 'number' | 'boolean';
  readonly array?: boolean;
  readonly describe: string;
  readonly default?: string | number | boolean;
  /**
   * A comma-separated list on the command line, of numbers or of names: a config file may give it
   * as a JSON array instead.
   */
  readonly list?: 'number' | 'string';
  readonly group: 'Adapter' | 'Run' | 'Output' | 'Configuration';
}

export const CHECK_OPTIONS = {
  module: {
    type: 'string',
    describe: 'check a JavaScript module exporting eigenvalues / resolventTrace / chainTrace / sample',
    group: 'Adapter',
  },
  exec: {
    type: 'string',
    describe: 'check a program that speaks the JSON-RPC protocol on stdin/stdout (a shell command, e.g. "python3 kernel.py")',
    group: 'Adapter',
  },
  recorded: {
    type: 'string',
    describe: 'check results recorded elsewhere: a recording file (see adapters/recorded/RECORDING.md)',
    group: 'Adapter',
  },
  offer: {
    type: 'string',
    describe: 'use only these capabilities of the implementation, comma-separated (eigenvalues, resolvent_trace, chain_trace, sample, …)',
    list: 'string',
    group: 'Adapter',
  },
  'record-to': {
    type: 'string',
    describe: 'also write every call to the implementation and its answer to this recording file',
    group: 'Adapter',
  },
  timeout: {
    type: 'number',
    describe: 'seconds to wait for one answer from an --exec program before it counts as hung',
    default: 60,
    group: 'Adapter',
  },
  suite: { type: 'string', describe: 'suites to run, comma-separated', default: 'semicircle', list: 'string', group: 'Run' },
  size: { type: 'string', describe: 'matrix sizes N, comma-separated', default: DEFAULT_SIZES.join(','), list: 'number', group: 'Run' },
  ladder: {
    type: 'string',
    describe: 'matrix sizes of the rate-of-convergence fits, comma-separated, at least three',
    default: DEFAULT_LADDER.join(','),
    list: 'number',
    group: 'Run',
  },
  samples: { type: 'number', describe: 'matrices per statistical estimate', default: DEFAULT_SAMPLES, group: 'Run' },
  seed: { type: 'number', describe: 'seed of every random stream and drawn parameter', default: DEFAULT_SEED, group: 'Run' },
  budget: {
    type: 'number',
    describe: 'scale of the fluctuation suite\'s sample counts: more is slower and more powerful (each verdict states the error it could detect)',
    default: DEFAULT_BUDGET,
    group: 'Run',
  },
  alpha: {
    type: 'number',
    describe: 'family-wise false-alarm level over the statistical checks (Holm)',
    default: DEFAULT_ALPHA,
    group: 'Run',
  },
  ensemble: {
    type: 'string',
    describe: 'ensembles: goe, gue, wigner:real|complex:LAW[:d=DEGREE]:diag=LAW[:VARIANCE], comma-separated',
    default: 'goe,gue',
    list: 'string',
    group: 'Run',
  },
  baseline: {
    type: 'string',
    describe: "also hold the implementation against a baseline written by 'rmt-assay baseline record' (the checks of the suite 'baseline'; --suite baseline runs only those)",
    group: 'Run',
  },
  only: { type: 'string', array: true, describe: 'run only the check with this id (repeatable)', group: 'Run' },
  workers: {
    type: 'number',
    describe: 'worker threads that sample and compute statistics, each with its own adapter (default: one per core); the report is the same to the last bit whatever the number',
    group: 'Run',
  },
  shard: {
    type: 'string',
    describe: "run only part I of N of the samples (e.g. 2/4) and write a shard file instead of a report; 'rmt-assay merge' combines the N files into the report of the whole run",
    group: 'Run',
  },
  'shard-file': {
    type: 'string',
    describe: 'where --shard writes its part (default: shard-I-of-N.json)',
    group: 'Output',
  },
  case: {
    type: 'string',
    describe: "replay one randomised case of the check named by --only (fast-check's path, from a replay command)",
    group: 'Run',
  },
  report: { type: 'string', describe: 'write the JSON report (the whole result model, see its JSON Schema) to this file', group: 'Output' },
  junit: { type: 'string', describe: 'write a JUnit XML report (one testcase per check) to this file', group: 'Output' },
  html: { type: 'string', describe: 'write a self-contained HTML report with plots to this file', group: 'Output' },
  verbose: { type: 'boolean', describe: 'list passing checks too', default: false, group: 'Output' },
} as const satisfies Record<string, OptionDeclaration>;

export type CheckOptionName = keyof typeof CHECK_OPTIONS;
