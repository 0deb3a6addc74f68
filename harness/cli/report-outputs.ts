import { resolve } from 'node:path';
import { isInteractiveTerminal } from '../reporters/interactive-terminal.js';
import type { Reporter } from '../reporters/reporter.js';
import { fileReporter } from '../reporters/reporter-registry.js';
import { terminalReporter } from '../reporters/terminal-reporter.js';
import type { RunResult } from '../run-result.js';
import { UsageError } from './usage-error.js';

/** The output options that `check` and `merge` share. */
export interface ReportOptions {
  readonly report?: string;
  readonly junit?: string;
  readonly html?: string;
  readonly verbose: boolean;
}

/** The file reports asked for, by format name; an empty or repeated file name is a usage error. */
export function reportFiles(args: ReportOptions): Array<[format: string, file: string]> {
  const asked = (['report', 'junit', 'html'] as const).filter((option) => args[option] !== undefined);
  const files = asked.map((option): [string, string] => [option === 'report' ? 'json' : option, args[option]!]);
  for (const [i, [, file]] of files.entries()) {
    if (file.trim() === '') throw new UsageError(`--${asked[i]} needs a file`);
    const other = files.findIndex(([, f]) => resolve(f) === resolve(file));
    if (other !== i) throw new UsageError(`--${asked[other]} and --${asked[i]} name the same file '${file}'`);
  }
  return files;
}

/** The terminal report, and one reporter per file report asked for. */
export function reportersFor(args: ReportOptions, out: NodeJS.WriteStream): Reporter[] {
  const interactive = isInteractiveTerminal(out, process.env);
  return [terminalReporter(out, { interactive, verbose: args.verbose }), ...reportFiles(args).map(([format, file]) => fileReporter(format, file))];
}

/** Exit code: 0 when every check passed (skips allowed), 1 when one failed or faulted. */
export function exitCodeOf(result: RunResult): number {
  return result.counts.fail + result.counts.fault > 0 ? 1 : 0;
}
