import { AdapterFault } from '../../adapters/adapter.js';
import { runComparison } from '../compare/run-comparison.js';
import type { ComparisonResult } from '../compare/comparison-result.js';
import { formatComparisonSummary } from '../reporters/comparison-summary.js';
import { fileReporter } from '../reporters/reporter-registry.js';
import type { TextSink } from '../reporters/reporter.js';
import { parseAdapterSpecification, SPECIFICATION_SYNTAX } from './adapter-specification.js';
import { resolveSettings, type CheckArguments } from './check-command.js';
import { exitCodeOf } from './report-outputs.js';
import { COMPARE_OPTIONS } from './compare-options.js';
import { withOptionDefaults } from './declare-options.js';
import { openAdapter, type OpenedAdapter } from './open-adapter.js';
import { CHECK_OPTIONS } from './option-table.js';
import { UsageError } from './usage-error.js';

/** The `compare` command's arguments as yargs hands them over (undefined: not given). */
export interface CompareArguments {
  readonly left?: string;
  readonly right?: string;
  readonly timeout?: number;
  readonly size?: string | number;
  readonly samples?: number;
  readonly seed?: number;
  readonly alpha?: number;
  readonly ensemble?: string;
  readonly only?: readonly string[];
  readonly report?: string;
  readonly junit?: string;
  readonly html?: string;
  readonly verbose?: boolean;
}

async function opened(option: 'left' | 'right', specification: string, timeoutSeconds: number): Promise<OpenedAdapter> {
  return openAdapter(parseAdapterSpecification(option, specification, timeoutSeconds));
}

/**
 * `rmt-assay compare --left SPEC --right SPEC`: both implementations on the same inputs. Prints the
 * agreement table and the summary, writes the JSON, JUnit and HTML reports asked for; exit 0 when nothing
 * distinguishes the two, 1 when a check does (or a side faults), UsageError (exit 2) for bad usage.
 */
export async function runCompareCommand(given: CompareArguments, out: TextSink & { readonly isTTY?: boolean }): Promise<number> {
  const args = withOptionDefaults(COMPARE_OPTIONS, given);
  if (args.left === undefined || args.right === undefined) {
    throw new UsageError(`compare needs --left and --right, each ${SPECIFICATION_SYNTAX}`);
  }
  const timeout = Number(args.timeout);
  if (!(timeout > 0) || !Number.isFinite(timeout)) throw new UsageError(`--timeout must be a positive number of seconds, got '${args.timeout}'`);
  const reports = (['report', 'junit', 'html'] as const).flatMap((option) => (args[option] === undefined ? [] : [{ option, file: args[option]! }]));
  for (const { option, file } of reports) if (file.trim() === '') throw new UsageError(`--${option} needs a file`);
  // The run options mean what they mean for `check`; the check table's defaults fill the rest.
  const settings = resolveSettings(withOptionDefaults(CHECK_OPTIONS, { ...args }) as unknown as CheckArguments, '');
  parseAdapterSpecification('left', args.left, timeout);
  parseAdapterSpecification('right', args.right, timeout);
  const left = await opened('left', args.left, timeout);
  let right: OpenedAdapter | undefined;
  try {
    right = await opened('right', args.right, timeout);
    let finished = 0;
    let result: ComparisonResult;
    try {
      result = await runComparison(left.adapter, right.adapter, settings, {
        specifications: { left: args.left, right: args.right },
        logs: { left: left.log, right: right.log },
        progress: {
          onRunStart: ({ totalChecks }) => out.write(`rmt-assay compare · ${totalChecks} checks\n`),
          onCheckFinished: (_o, n, total) => {
            if (n === total || n - finished >= Math.ceil(total / 4)) {
              finished = n;
              out.write(`${n}/${total} checks done\n`);
            }
          },
        },
      });
    } catch (error) {
      if (error instanceof AdapterFault) throw new UsageError(`an implementation cannot run: ${error.method}: ${error.message}`);
      throw error;
    }
    out.write(formatComparisonSummary(result, { interactive: out.isTTY === true && process.env.CI !== 'true', verbose: args.verbose === true }));
    // The file reports see the run result; the JSON one also carries the comparison (both sides, the agreement table).
    for (const { option, file } of reports) await fileReporter(option === 'report' ? 'json' : option, file).onRunEnd?.(result);
    return exitCodeOf(result);
  } finally {
    await left.adapter.close();
    await right?.adapter.close();
  }
}
