import { ensembleLabel } from '../numeric/ensemble.js';
import { shellQuote } from '../replay-command.js';
import type { RunSettings } from '../run-settings.js';

/**
 * The command that re-runs one comparison check: the same two sides, sizes, samples, seed and
 * ensembles (so the probe matrices and every stream are the same), restricted by --only.
 */
export function comparisonReplayCommand(specifications: { readonly left: string; readonly right: string }, settings: RunSettings, checkId: string): string {
  return [
    'npx rmt-assay compare',
    `--left ${shellQuote(specifications.left)}`,
    `--right ${shellQuote(specifications.right)}`,
    `--size ${settings.sizes.join(',')}`,
    `--samples ${settings.samples}`,
    `--seed ${settings.seed}`,
    `--ensemble ${shellQuote(settings.ensembles.map(ensembleLabel).join(','))}`,
    `--only ${shellQuote(checkId)}`,
  ].join(' ');
}
