import { BaselineError } from '../baseline/load-baseline.js';
import { mergeShards } from '../shards/merge-shards.js';
import { ShardFileError, readShardFile, shardsOfOneRun } from '../shards/shard-file.js';
import { CHECK_OPTIONS, type OptionDeclaration } from './option-table.js';
import { exitCodeOf, reportFiles, reportersFor, type ReportOptions } from './report-outputs.js';
import { UsageError } from './usage-error.js';

const { report, junit, html, verbose } = CHECK_OPTIONS;

/** The `merge` command's options: the reports of `check`, declared there. */
export const MERGE_OPTIONS = { report, junit, html, verbose } as const satisfies Record<string, OptionDeclaration>;

export interface MergeArguments extends ReportOptions {
  readonly files: readonly string[];
}

/**
 * Combines the shard files of one run (`check --shard I/N`, N files) into the report that run
 * would have given in one piece, bit for bit, and exits as `check` would.
 */
export async function runMergeCommand(args: MergeArguments, out: NodeJS.WriteStream): Promise<number> {
  reportFiles(args);
  const files = (args.files ?? []).map(String);
  if (files.length === 0) throw new UsageError('merge needs the shard files written by check --shard I/N');
  try {
    const records = shardsOfOneRun(files.map((file) => ({ file, record: readShardFile(file) })));
    const reporters = reportersFor(args, out);
    const result = mergeShards(records, {
      onRunStart: (info) => reporters.forEach((r) => r.onRunStart?.(info)),
      onCheckFinished: (o, n, t) => reporters.forEach((r) => r.onCheckFinished?.(o, n, t)),
    });
    for (const r of reporters) await r.onRunEnd?.(result);
    return exitCodeOf(result);
  } catch (error) {
    if (error instanceof ShardFileError || error instanceof BaselineError) throw new UsageError(error.message);
    throw error;
  }
}
