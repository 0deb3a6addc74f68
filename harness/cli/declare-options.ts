import type { Argv } from 'yargs';
import type { OptionDeclaration } from './option-table.js';

/**
 * Declares a table of options to yargs without letting yargs fill in defaults (they are shown in
 * the help text only), so an option the user did not type stays undefined and a config file can
 * supply it; `withOptionDefaults` fills what is still missing afterwards.
 */
export function declareOptions<T>(y: Argv<T>, table: Readonly<Record<string, OptionDeclaration>>): Argv<T> {
  for (const [name, spec] of Object.entries(table)) {
    y.option(name, {
      type: spec.type,
      array: spec.array,
      describe: spec.describe,
      group: spec.group,
      requiresArg: spec.type !== 'boolean',
      ...(spec.default === undefined ? {} : { defaultDescription: String(spec.default) }),
    });
  }
  return y;
}

/** The table's defaults under whatever `values` leaves undefined. */
export function withOptionDefaults<V extends object>(table: Readonly<Record<string, OptionDeclaration>>, values: V): V {
  const filled: Record<string, unknown> = { ...(values as Record<string, unknown>) };
  for (const [name, spec] of Object.entries(table)) {
    if (filled[name] === undefined && spec.default !== undefined) filled[name] = spec.default;
  }
  return filled as V;
}
