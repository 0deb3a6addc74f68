import type { AdapterChoice } from './open-adapter.js';
import { UsageError } from './usage-error.js';

/**
 * The kinds of implementation one word can name, with the option of `check` each stands for:
 * `reference` (the built-in engine), `module:FILE`, `exec:COMMAND`, `recorded:FILE`. A new kind of
 * adapter is one row here and one branch in open-adapter.ts.
 */
const SPECIFICATION_KINDS = {
  module: 'module',
  exec: 'exec',
  recorded: 'recorded',
} as const satisfies Record<string, keyof AdapterChoice>;

export const SPECIFICATION_SYNTAX = 'reference, module:FILE, exec:COMMAND or recorded:FILE';

/**
 * Reads one side of a comparison, e.g. `module:./kernel.mjs` or `exec:python3 kernel.py`, into the
 * choice that open-adapter.ts opens. Everything after the first colon is the value, so a command
 * may hold colons and spaces.
 */
export function parseAdapterSpecification(option: string, text: string, timeoutSeconds: number): AdapterChoice {
  const trimmed = text.trim();
  if (trimmed === 'reference') return { timeoutSeconds };
  const colon = trimmed.indexOf(':');
  const kind = colon < 0 ? trimmed : trimmed.slice(0, colon);
  const value = colon < 0 ? '' : trimmed.slice(colon + 1).trim();
  if (!Object.hasOwn(SPECIFICATION_KINDS, kind)) {
    throw new UsageError(`--${option} must name an implementation as ${SPECIFICATION_SYNTAX}, got '${text}'`);
  }
  if (value === '') throw new UsageError(`--${option} ${kind}: needs a ${kind === 'exec' ? 'command' : 'file'} after the colon`);
  return { [SPECIFICATION_KINDS[kind as keyof typeof SPECIFICATION_KINDS]]: value, timeoutSeconds };
}
