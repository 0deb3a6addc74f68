import { RATIO_THRESHOLD } from '../../properties/identities/error-scales.js';
import { CHECK_OPTIONS, type OptionDeclaration } from './option-table.js';

const { module, exec, recorded, offer, timeout, size, samples, seed, ensemble } = CHECK_OPTIONS;

/**
 * The options of `baseline record`: where to write, the tolerance the file states, and the adapter
 * and run options it shares with `check` (taken from the check table, declared once).
 */
export const BASELINE_RECORD_OPTIONS = {
  out: { type: 'string', describe: 'write the baseline (JSON, see its schema) to this file', group: 'Output' },
  threshold: {
    type: 'number',
    describe: 'largest ratio |now − recorded| / (rounding error of two backward-stable results) that a later check accepts as unchanged',
    default: RATIO_THRESHOLD,
    group: 'Run',
  },
  module,
  exec,
  recorded,
  offer,
  timeout,
  size,
  samples,
  seed,
  ensemble,
} as const satisfies Record<string, OptionDeclaration>;
