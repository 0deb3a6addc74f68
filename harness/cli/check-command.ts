import { resolve } from 'node:path';
import { ALL_CAPABILITIES, AdapterFault, type Capability } from '../../adapters/adapter.js';
import { SUITES } from '../../properties/suite-registry.js';
import { isInteractiveTerminal } from '../reporters/interactive-terminal.js';
import type { Reporter } from '../reporters/reporter.js';
import { fileReporter } from '../reporters/reporter-registry.js';
import { terminalReporter } from '../reporters/terminal-reporter.js';
import { runChecks } from '../run-checks.js';
import type { RunResult } from '../run-result.js';
import type { RunSettings } from '../run-settings.js';
import { RecordingAdapter } from '../../adapters/recorded/recording-adapter.js';
import { runCommand } from '../replay-command.js';
import { openBaselineOption, selectableSuites } from './baseline-option.js';
import { openAdapter } from './open-adapter.js';
import { parseReplayCase, parseAlpha, parseBudget, parseEnsembleList, parseLadder, parseNameList, parseSizeList, parseWholeNumber } from './parse-values.js';
import { UsageError } from './usage-error.js';

/** The `check` command's arguments as yargs hands them over. */
export interface CheckArguments {
  readonly module?: string;
  readonly exec?: string;
  readonly recorded?: string;
  readonly 'record-to'?: string;
  readonly offer?: string;
  readonly timeout: number;
  readonly suite: string;
  readonly size: string | number;
  readonly ladder: string | number;
  readonly samples: number;
  readonly seed: number;
  readonly budget: number;
  readonly alpha: number;
  readonly ensemble: string;
  readonly baseline?: string;
  readonly only?: readonly string[];
  readonly case?: string;
  readonly report?: string;
  readonly junit?: string;
  readonly html?: string;
  readonly verbose: boolean;
}

export function resolveSettings(args: CheckArguments, adapterArguments: string): RunSettings {
  return {
    suites: parseNameList('suite', args.suite, selectableSuites(args.baseline)),
    sizes: parseSizeList(args.size),
    ladder: parseLadder(args.ladder),
    samples: parseWholeNumber('samples', args.samples, 2, 10_000_000),
    seed: parseWholeNumber('seed', args.seed, 0),
    alpha: parseAlpha(args.alpha),
    ensembles: parseEnsembleList(args.ensemble),
    only: args.only ?? [],
    replayCase: parseReplayCase(args.case, args.only),
    adapterArguments,
    budget: parseBudget(args.budget),
  };
}

/** Exit code: 0 when every check passed (skips allowed), 1 when one failed or faulted. */
export function exitCodeOf(result: RunResult): number {
  return result.counts.fail + result.counts.fault > 0 ? 1 : 0;
}

/** The file reports asked for, by format name; an empty or repeated file name is a usage error. */
function reportFiles(args: CheckArguments): Array<[format: string, file: string]> {
  const asked = (['report', 'junit', 'html'] as const).filter((option) => args[option] !== undefined);
  const files = asked.map((option): [string, string] => [option === 'report' ? 'json' : option, args[option]!]);
  for (const [i, [, file]] of files.entries()) {
    if (file.trim() === '') throw new UsageError(`--${asked[i]} needs a file`);
    const other = files.findIndex(([, f]) => resolve(f) === resolve(file));
    if (other !== i) throw new UsageError(`--${asked[other]} and --${asked[i]} name the same file '${file}'`);
  }
  return files;
}

export async function runCheckCommand(args: CheckArguments, out: NodeJS.WriteStream): Promise<number> {
  if (args.module !== undefined && args.module.trim() === '') throw new UsageError('--module needs a file');
  // Validate everything before starting an implementation.
  resolveSettings(args, '');
  reportFiles(args);
  if (!(args.timeout > 0) || !Number.isFinite(args.timeout)) throw new UsageError(`--timeout must be a positive number of seconds, got '${args.timeout}'`);
  const baseline = openBaselineOption(args.baseline);
  const offer = args.offer === undefined ? undefined : (parseNameList('offer', args.offer, ALL_CAPABILITIES) as Capability[]);
  const opened = await openAdapter({ module: args.module, exec: args.exec, recorded: args.recorded, offer, timeoutSeconds: args.timeout });
  const recordTo = args['record-to'];
  const adapter = recordTo === undefined ? opened.adapter : new RecordingAdapter(opened.adapter);
  try {
    const settings = resolveSettings(args, [opened.arguments, baseline?.replayArguments ?? ''].filter((w) => w !== '').join(' '));
    const interactive = isInteractiveTerminal(out, process.env);
    const reporters: Reporter[] = [terminalReporter(out, { interactive, verbose: args.verbose })];
    for (const [format, file] of reportFiles(args)) reporters.push(fileReporter(format, file));
    const suites = [...settings.suites.flatMap((name) => SUITES.get(name) ?? []), ...(baseline === undefined ? [] : [baseline.suite])];
    let result: RunResult;
    try {
      result = await runChecks(
        adapter,
        settings,
        suites,
        {
          onRunStart: (info) => reporters.forEach((r) => r.onRunStart?.(info)),
          onCheckFinished: (o, n, t) => reporters.forEach((r) => r.onCheckFinished?.(o, n, t)),
        },
        opened.log,
      );
    } catch (error) {
      if (error instanceof AdapterFault) throw new UsageError(`the implementation cannot run: ${error.method}: ${error.message}`);
      throw error;
    }
    for (const r of reporters) await r.onRunEnd?.(result);
    if (adapter instanceof RecordingAdapter && recordTo !== undefined) await adapter.save(recordTo, runCommand(settings));
    return exitCodeOf(result);
  } finally {
    await adapter.close();
  }
}
