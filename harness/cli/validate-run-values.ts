import { ALL_CAPABILITIES } from '../../adapters/adapter.js';
import { resolveSettings, type CheckArguments } from './check-command.js';
import { withOptionDefaults } from './declare-options.js';
import { CHECK_OPTIONS } from './option-table.js';
import { parseNameList } from './parse-values.js';
import { UsageError } from './usage-error.js';

/**
 * Checks the run and adapter options that `check` and `baseline record` share, by the rules the
 * commands apply (resolveSettings, the timeout, the capabilities of --offer), throwing their
 * UsageError that names the option; options not given take the check table's defaults.
 */
export function validateRunValues(values: Readonly<Record<string, unknown>>): void {
  const args = withOptionDefaults(CHECK_OPTIONS, { ...values }) as unknown as CheckArguments;
  resolveSettings(args, '');
  if (!(Number(args.timeout) > 0) || !Number.isFinite(Number(args.timeout))) {
    throw new UsageError(`--timeout must be a positive number of seconds, got '${args.timeout}'`);
  }
  if (args.offer !== undefined) parseNameList('offer', args.offer, ALL_CAPABILITIES);
}
