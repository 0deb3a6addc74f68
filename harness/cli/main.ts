#!/usr/bin/env node
import yargs from 'yargs';
import { hideBin } from 'yargs/helpers';
import { suiteNames } from '../../properties/suite-registry.js';
import { TOOL_VERSION } from '../tool-identity.js';
import { runBaselineRecordCommand, type BaselineRecordArguments } from './baseline-command.js';
import { BASELINE_RECORD_OPTIONS } from './baseline-options.js';
import { runCheckCommand, type CheckArguments } from './check-command.js';
import { runCompareCommand, type CompareArguments } from './compare-command.js';
import { COMPARE_OPTIONS } from './compare-options.js';
import { MERGE_OPTIONS, runMergeCommand, type MergeArguments } from './merge-command.js';
import { CONFIG_FILE_OPTIONS } from './config-file.js';
import { withConfiguration } from './configured-arguments.js';
import { declareOptions } from './declare-options.js';
import { CHECK_OPTIONS } from './option-table.js';
import { REFERENCE_QUANTITIES, type ReferenceArguments, referenceLines } from './reference-command.js';
import {
  type TableOptions,
  USER_TABLES_VARIABLE,
  referenceExportText,
  referenceListLines,
  referenceShowLines,
  writeExport,
} from './reference-table-commands.js';
import { UsageError } from './usage-error.js';
import { validateRunValues } from './validate-run-values.js';

const USAGE_EXIT = 2;

function fail(message: string): never {
  process.stderr.write(`rmt-assay: ${message}\n`);
  process.exit(USAGE_EXIT);
}

/** Where a command reads its config file and writes, for `withConfiguration`. */
const io = () => ({ cwd: process.cwd(), out: process.stdout, err: process.stderr });

async function main(argv: string[]): Promise<number> {
  let exitCode = 0;
  await yargs(argv)
    .scriptName('rmt-assay')
    .version(TOOL_VERSION)
    .strict()
    .command(
      'check',
      `run property suites against an implementation (suites: ${suiteNames().join(', ')}); exit 0 all passed, 1 a check failed, 2 bad usage`,
      (y) => declareOptions(declareOptions(y, CHECK_OPTIONS), CONFIG_FILE_OPTIONS),
      async (args) => {
        exitCode = await withConfiguration(CHECK_OPTIONS, args, io(), validateRunValues, (values) =>
          runCheckCommand(values as unknown as CheckArguments, process.stdout),
        );
      },
    )
    .command(
      'compare',
      'run two implementations on the same inputs and show where they differ (per-routine agreement, two-sample tests on fluctuations); exit 0 nothing distinguishes them, 1 something does, 2 bad usage',
      (y) => declareOptions(y, COMPARE_OPTIONS),
      async (args) => {
        exitCode = await runCompareCommand(args as unknown as CompareArguments, process.stdout);
      },
    )
    .command(
      'merge <files..>',
      'combine the shard files of one run (check --shard I/N, all N of them) into its report, the same bit for bit as the run in one piece; exit 0 all passed, 1 a check failed, 2 bad usage',
      (y) => declareOptions(y.positional('files', { type: 'string', array: true, describe: 'the shard files' }), MERGE_OPTIONS),
      async (args) => {
        exitCode = await runMergeCommand(args as unknown as MergeArguments, process.stdout);
      },
    )
    .command(
      'baseline',
      'regression baselines: baseline record --out FILE writes one; check --baseline FILE compares a later version with it',
      (y) =>
        y
          .command(
            'record',
            'run an implementation on a fixed, seeded input set and write its outputs and sampled statistics to --out FILE; exit 0 written, 2 bad usage',
            (z) => declareOptions(declareOptions(z, BASELINE_RECORD_OPTIONS), CONFIG_FILE_OPTIONS),
            async (args) => {
              exitCode = await withConfiguration(BASELINE_RECORD_OPTIONS, args, io(), validateRunValues, (values) =>
                runBaselineRecordCommand(values as BaselineRecordArguments, process.stdout),
              );
            },
          )
          .demandCommand(1, 'name a baseline command: record')
          .strict(),
      () => undefined,
    )
    .command(
      'reference',
      'browse and export the certified reference tables, or print a reference value (list, show NAME, export NAME, value QUANTITY AT)',
      (y) =>
        y
          .option('tables', {
            type: 'string',
            requiresArg: true,
            describe: `a folder of your own tables (JSON, validated against the same schema); default $${USER_TABLES_VARIABLE}`,
          })
          .command('list', 'list the tables: name, rows, certified digits, origin, title', {}, (args) => {
            process.stdout.write(referenceListLines(args as TableOptions).join('\n') + '\n');
          })
          .command(
            'show <name>',
            'show a table: quantity, conventions, sources, how it was produced, certified digits, rows',
            (z) => z.positional('name', { type: 'string' }).option('all', { type: 'boolean', describe: 'print every row (default: the first 20)' }),
            (args) => {
              const a = args as unknown as TableOptions & { name: string; all?: boolean };
              process.stdout.write(referenceShowLines(a.name, a).join('\n') + '\n');
            },
          )
          .command(
            'export <name>',
            'export a table to take into your own tests',
            (z) =>
              z
                .positional('name', { type: 'string' })
                .option('format', { type: 'string', demandOption: true, requiresArg: true, describe: 'json (the table with its provenance) or csv' })
                .option('output', { type: 'string', requiresArg: true, describe: 'write to FILE instead of stdout' }),
            (args) => {
              const a = args as unknown as TableOptions & { name: string; format: string; output?: string };
              const text = writeExport(referenceExportText(a.name, a.format, a), a.output);
              if (text === undefined) process.stderr.write(`rmt-assay: wrote ${a.output}\n`);
              else process.stdout.write(text);
            },
          )
          .command(
            // `reference QUANTITY AT` (without "value") keeps working as before.
            ['value [quantity] [at]', '$0 [quantity] [at]'],
            `print a reference value with its source (quantity: ${REFERENCE_QUANTITIES.join(', ')}; at: z, x or k)`,
            (z) =>
              z
                .positional('quantity', { type: 'string', describe: REFERENCE_QUANTITIES.join(', ') })
                .positional('at', { type: 'string', describe: 'z (stieltjes), x (density, cdf) or k (moment)' })
                .option('size', { type: 'number', describe: 'matrix size, for exact finite-N values' })
                .option('ensemble', { type: 'string', describe: 'ensemble, for finite-N corrections' }),
            (args) => {
              process.stdout.write(referenceLines(args as unknown as ReferenceArguments).join('\n') + '\n');
            },
          )
          .strict(),
      () => undefined,
    )
    .demandCommand(1, 'name a command: check, merge, compare, baseline or reference')
    .fail((message, error) => {
      if (error instanceof UsageError) fail(error.message);
      if (error) throw error;
      fail(message.split('\n')[0]);
    })
    .help()
    .parseAsync();
  return exitCode;
}

main(hideBin(process.argv)).then(
  (code) => process.exit(code),
  (error: unknown) => {
    if (error instanceof UsageError) fail(error.message);
    process.stderr.write(`rmt-assay: internal error: ${(error as Error)?.stack ?? String(error)}\n`);
    process.exit(3);
  },
);
