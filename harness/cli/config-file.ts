import { existsSync, readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { Ajv, type ValidateFunction } from 'ajv';
import { schemaErrorText } from '../../adapters/process/schema-error-text.js';
import schema from './schemas/config.schema.json' with { type: 'json' };
import type { OptionDeclaration } from './option-table.js';
import { UsageError } from './usage-error.js';

/** The file `check` and `baseline record` read from the working directory when no --config is given. */
export const CONFIG_FILE_NAME = 'rmt-assay.config.json';

/** The options that choose and show the configuration, declared like every other option. */
export const CONFIG_FILE_OPTIONS = {
  config: { type: 'string', describe: `read options from this JSON file (default: ./${CONFIG_FILE_NAME} when it exists); flags override it`, group: 'Configuration' },
  'print-config': {
    type: 'boolean',
    describe: 'print the resolved options (flags over the config file over defaults) as JSON, and exit',
    group: 'Configuration',
  },
} as const satisfies Record<string, OptionDeclaration>;

/** A config file as read: where it came from (null: none) and its values by option name. */
export interface ConfigFile {
  readonly file: string | null;
  readonly values: Readonly<Record<string, unknown>>;
}

let validator: ValidateFunction | undefined;

/**
 * Reads the config file: the one --config names (which must exist), else ./rmt-assay.config.json
 * if there is one, else none. It must be JSON and match the published schema
 * (schemas/config.schema.json, derived from the option table); an error names the file and the
 * JSON path of the problem.
 */
export function readConfigFile(explicit: string | undefined, cwd: string): ConfigFile {
  if (explicit !== undefined && explicit.trim() === '') throw new UsageError('--config needs a file');
  const file = explicit ?? (existsSync(resolve(cwd, CONFIG_FILE_NAME)) ? CONFIG_FILE_NAME : undefined);
  if (file === undefined) return { file: null, values: {} };
  let text: string;
  try {
    text = readFileSync(resolve(cwd, file), 'utf8');
  } catch (error) {
    throw new UsageError(`cannot read the config file ${file}: ${(error as NodeJS.ErrnoException).code ?? (error as Error).message}`);
  }
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (error) {
    throw new UsageError(`the config file ${file} is not JSON: ${(error as Error).message}`);
  }
  validator ??= new Ajv({ allErrors: true, verbose: true, strict: true }).compile(schema);
  if (!validator(value)) throw new UsageError(`config file ${file} ${schemaErrorText(validator.errors ?? [])}`);
  const { $schema: _schema, ...values } = value as Record<string, unknown>;
  return { file, values };
}
