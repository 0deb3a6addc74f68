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
import { declareOptions } from './declare-options.js';
import { CHECK_OPTIONS } from './option-table.js';
import { REFERENCE_QUANTITIES, referenceLines } from './reference-command.js';
import { UsageError } from './usage-error.js';

const USAGE_EXIT = 2;

function fail(message: string): never {
  process.stderr.write(`rmt-assay: ${message}\n`);
  process.exit(USAGE_EXIT);
}

async function main(argv: string[]): Promise<number> {
  let exitCode = 0;
  await yargs(argv)
    .scriptName('rmt-assay')
    .version(TOOL_VERSION)
    .strict()
    .command(
      'check',
      `run property suites against an implementation (suites: ${suiteNames().join(', ')}); exit 0 all passed, 1 a check failed, 2 bad usage`,
      (y) => {
        for (const [name, spec] of Object.entries(CHECK_OPTIONS)) {
          y.option(name, { ...spec, requiresArg: spec.type !== 'boolean' });
        }
        return y;
      },
      async (args) => {
        exitCode = await runCheckCommand(args as unknown as CheckArguments, process.stdout);
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
      'baseline',
      'regression baselines: baseline record --out FILE writes one; check --baseline FILE compares a later version with it',
      (y) =>
        y
          .command(
            'record',
            'run an implementation on a fixed, seeded input set and write its outputs and sampled statistics to --out FILE; exit 0 written, 2 bad usage',
            (z) => declareOptions(z, BASELINE_RECORD_OPTIONS),
            async (args) => {
              exitCode = await runBaselineRecordCommand(args as unknown as BaselineRecordArguments, process.stdout);
            },
          )
          .demandCommand(1, 'name a baseline command: record')
          .strict(),
      () => undefined,
    )
    .command(
      'reference <quantity> <at>',
      `print a reference value with its source (quantity: ${REFERENCE_QUANTITIES.join(', ')}; at: z, x or k)`,
      (y) =>
        y
          .positional('quantity', { type: 'string', choices: REFERENCE_QUANTITIES as unknown as string[] })
          .positional('at', { type: 'string' })
          .option('size', { type: 'number', describe: 'matrix size, for exact finite-N values' })
          .option('ensemble', { type: 'string', describe: 'ensemble, for finite-N corrections' }),
      (args) => {
        process.stdout.write(referenceLines(args as unknown as { quantity: string; at: string; size?: number; ensemble?: string }).join('\n') + '\n');
      },
    )
    .demandCommand(1, 'name a command: check, compare, baseline or reference')
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
