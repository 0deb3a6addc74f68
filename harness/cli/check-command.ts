import { availableParallelism } from 'node:os';
import { ALL_CAPABILITIES, AdapterFault, type Adapter, type Capability } from '../../adapters/adapter.js';
import { SUITES } from '../../properties/suite-registry.js';
import type { PropertySuite } from '../check-group.js';
import { WorkerPoolError, workerPoolRunner, workerThreadsAvailable } from '../parallel/worker-pool.js';
import { runChecks, type ExecutionOptions } from '../run-checks.js';
import type { RunRecipe } from '../run-recipe.js';
import type { RunSettings } from '../run-settings.js';
import { runShard } from '../shards/run-shard.js';
import { ensureShardFileWritable, ShardFileError, writeShardFile, type ShardRecord } from '../shards/shard-file.js';
import type { ShardChoice } from '../work-unit.js';
import { RecordingAdapter } from '../../adapters/recorded/recording-adapter.js';
import { runCommand } from '../replay-command.js';
import { openBaselineOption, selectableSuites } from './baseline-option.js';
import { openAdapter } from './open-adapter.js';
import { exitCodeOf, reportFiles, reportersFor } from './report-outputs.js';
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
  readonly workers?: number;
  readonly shard?: string;
  readonly 'shard-file'?: string;
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

/** `--shard I/N`: 1 ≤ I ≤ N ≤ 10000. */
export function parseShard(text: string): ShardChoice {
  const match = /^\s*(\d+)\s*\/\s*(\d+)\s*$/.exec(String(text));
  const index = match === null ? NaN : Number(match[1]);
  const count = match === null ? NaN : Number(match[2]);
  if (!(index >= 1 && index <= count && count <= 10_000)) {
    throw new UsageError(`--shard must be I/N with 1 ≤ I ≤ N ≤ 10000 (the I-th of N parts), got '${text}'`);
  }
  return { index, count };
}

/**
 * Worker threads: --workers, else one per core; one when every call is recorded (a recording is one
 * sequence) or when worker threads cannot start (the sources run without the build). The figures
 * are the same whatever the number.
 */
function workerCount(args: CheckArguments): number {
  if (args.workers === undefined) return args['record-to'] === undefined && workerThreadsAvailable() ? availableParallelism() : 1;
  const workers = parseWholeNumber('workers', args.workers, 1, 256);
  if (workers > 1 && args['record-to'] !== undefined) throw new UsageError('--record-to records one sequence of calls: use it with --workers 1');
  return workers;
}

export async function runCheckCommand(args: CheckArguments, out: NodeJS.WriteStream): Promise<number> {
  if (args.module !== undefined && args.module.trim() === '') throw new UsageError('--module needs a file');
  // Validate everything before starting an implementation.
  resolveSettings(args, '');
  reportFiles(args);
  const shard = args.shard === undefined ? undefined : parseShard(args.shard);
  if (shard !== undefined && reportFiles(args).length > 0) {
    throw new UsageError("--shard writes a shard file, not reports: give --report, --junit or --html to 'rmt-assay merge'");
  }
  if (shard === undefined && args['shard-file'] !== undefined) throw new UsageError('--shard-file goes with --shard I/N');
  const workers = workerCount(args);
  if (!(args.timeout > 0) || !Number.isFinite(args.timeout)) throw new UsageError(`--timeout must be a positive number of seconds, got '${args.timeout}'`);
  const baseline = openBaselineOption(args.baseline);
  const offer = args.offer === undefined ? undefined : (parseNameList('offer', args.offer, ALL_CAPABILITIES) as Capability[]);
  const choice = { module: args.module, exec: args.exec, recorded: args.recorded, offer, timeoutSeconds: args.timeout };
  const opened = await openAdapter(choice);
  const recordTo = args['record-to'];
  const adapter = recordTo === undefined ? opened.adapter : new RecordingAdapter(opened.adapter);
  try {
    const settings = resolveSettings(args, [opened.arguments, baseline?.replayArguments ?? ''].filter((w) => w !== '').join(' '));
    const recipe: RunRecipe = { settings, adapter: choice, ...(args.baseline === undefined ? {} : { baselineFile: args.baseline }) };
    const suites = [...settings.suites.flatMap((name) => SUITES.get(name) ?? []), ...(baseline === undefined ? [] : [baseline.suite])];
    const options: ExecutionOptions = workers > 1 ? { runner: (groups) => workerPoolRunner(recipe, groups.map((g) => g.id), workers) } : {};
    let code: number;
    try {
      code = shard === undefined ? await runWhole(adapter, recipe, suites, args, out, opened.log, options) : await runPart(adapter, recipe, suites, shard, args, out, opened.log, options);
    } catch (error) {
      if (error instanceof AdapterFault) throw new UsageError(`the implementation cannot run: ${error.method}: ${error.message}`);
      if (error instanceof WorkerPoolError) throw new UsageError(error.message);
      throw error;
    }
    if (adapter instanceof RecordingAdapter && recordTo !== undefined) await adapter.save(recordTo, runCommand(settings));
    return code;
  } finally {
    await adapter.close();
  }
}

/** The whole run, reported. */
async function runWhole(
  adapter: Adapter,
  recipe: RunRecipe,
  suites: readonly PropertySuite[],
  args: CheckArguments,
  out: NodeJS.WriteStream,
  adapterLog: () => string,
  options: ExecutionOptions,
): Promise<number> {
  const reporters = reportersFor(args, out);
  const result = await runChecks(
    adapter,
    recipe.settings,
    suites,
    {
      onRunStart: (info) => reporters.forEach((r) => r.onRunStart?.(info)),
      onCheckFinished: (o, n, t) => reporters.forEach((r) => r.onCheckFinished?.(o, n, t)),
    },
    adapterLog,
    options,
  );
  for (const r of reporters) await r.onRunEnd?.(result);
  return exitCodeOf(result);
}

/** One shard of the run, written to its shard file. */
async function runPart(
  adapter: Adapter,
  recipe: RunRecipe,
  suites: readonly PropertySuite[],
  shard: ShardChoice,
  args: CheckArguments,
  out: NodeJS.WriteStream,
  adapterLog: () => string,
  options: ExecutionOptions,
): Promise<number> {
  const file = args['shard-file'] ?? `shard-${shard.index}-of-${shard.count}.json`;
  if (file.trim() === '') throw new UsageError('--shard-file needs a file');
  let record: ShardRecord;
  try {
    ensureShardFileWritable(file);
    record = await runShard(adapter, recipe, suites, shard, adapterLog, options);
    writeShardFile(file, record);
  } catch (error) {
    if (error instanceof ShardFileError) throw new UsageError(error.message);
    throw error;
  }
  const faults = record.units.filter((u) => u.outcome.kind === 'fault').length;
  out.write(
    `shard ${shard.index}/${shard.count}: ${record.units.length} units of work written to ${file}` +
      `${faults > 0 ? ` (${faults} faulted; the merge reports them)` : ''}\n` +
      `when all ${shard.count} shard files are in: npx rmt-assay merge FILE… (one report, as one run would give)\n`,
  );
  return 0;
}
