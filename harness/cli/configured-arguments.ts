import type { TextSink } from '../reporters/reporter.js';
import { PUBLISHED_CONFIG_SCHEMA } from './config-schema.js';
import { readConfigFile, type ConfigFile } from './config-file.js';
import type { OptionDeclaration } from './option-table.js';
import { UsageError } from './usage-error.js';

type Table = Readonly<Record<string, OptionDeclaration>>;

/** Where a resolved option's value came from. */
export type OptionSource = 'flag' | 'config file' | 'default';

export interface ConfiguredArguments {
  /** The options the command declares: flags over the config file over the table's defaults. */
  readonly values: Record<string, unknown>;
  readonly sources: Readonly<Record<string, OptionSource>>;
  readonly config: ConfigFile;
}

/**
 * Checks the resolved values the way the command checks its flags (`validate` throws the
 * command's UsageError, which names the option as --NAME); a bad value that came from the config
 * file is reported at its JSON path in the file, not as a flag the user never typed.
 */
function validateResolved(configured: ConfiguredArguments, validate: (values: Record<string, unknown>) => void): void {
  try {
    validate(configured.values);
  } catch (error) {
    if (!(error instanceof UsageError)) throw error;
    const named = /^--([a-z][a-z-]*):?\s*/.exec(error.message);
    if (named === null || configured.sources[named[1]] !== 'config file') throw error;
    throw new UsageError(`config file ${configured.config.file} at /${named[1]}: ${error.message.slice(named[0].length)}`);
  }
}

/**
 * The command's options from the three places they can come from. Options of the config file
 * that the command does not declare are left to the commands that do (the file is one for the
 * project; `baseline record` takes the adapter and run options, `check` everything).
 */
export function configuredArguments(
  table: Table,
  flags: Readonly<Record<string, unknown>>,
  cwd: string,
  validate: (values: Record<string, unknown>) => void,
): ConfiguredArguments {
  const config = readConfigFile(flags.config as string | undefined, cwd);
  const values: Record<string, unknown> = {};
  const sources: Record<string, OptionSource> = {};
  for (const [name, spec] of Object.entries(table)) {
    if (flags[name] !== undefined) [values[name], sources[name]] = [flags[name], 'flag'];
    else if (config.values[name] !== undefined) [values[name], sources[name]] = [config.values[name], 'config file'];
    else if (spec.default !== undefined) [values[name], sources[name]] = [spec.default, 'default'];
  }
  const configured = { values, sources, config };
  validateResolved(configured, validate);
  return configured;
}

/** What --print-config prints: the resolved options as a config file would hold them, and where each came from. */
export function printedConfiguration(configured: ConfiguredArguments): { readonly json: string; readonly origins: string } {
  const json = JSON.stringify({ $schema: PUBLISHED_CONFIG_SCHEMA, ...configured.values }, null, 2) + '\n';
  const by = (source: OptionSource) => Object.keys(configured.sources).filter((name) => configured.sources[name] === source);
  const origins = [
    `flags: ${by('flag').join(', ') || 'none'}`,
    `config file${configured.config.file === null ? ' (none found)' : ` ${configured.config.file}`}: ${by('config file').join(', ') || 'none'}`,
    `defaults: ${by('default').join(', ') || 'none'}`,
  ].join('; ');
  return { json, origins };
}

/**
 * Resolves a command's options with its config file, then prints them (--print-config, exit 0) or
 * runs the command with them.
 */
export async function withConfiguration(
  table: Table,
  flags: Readonly<Record<string, unknown>>,
  io: { readonly cwd: string; readonly out: TextSink; readonly err: TextSink },
  validate: (values: Record<string, unknown>) => void,
  run: (values: Record<string, unknown>) => Promise<number>,
): Promise<number> {
  const configured = configuredArguments(table, flags, io.cwd, validate);
  if (flags['print-config'] !== true) return run(configured.values);
  const printed = printedConfiguration(configured);
  io.out.write(printed.json);
  io.err.write(`rmt-assay: resolved from ${printed.origins}\n`);
  return 0;
}
