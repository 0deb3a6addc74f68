import { ensembleLabel } from './numeric/ensemble.js';
import { DEFAULT_BUDGET, type RunSettings } from './run-settings.js';

/** Quotes a word for a POSIX shell when it holds anything but plain characters. */
export function shellQuote(word: string): string {
  return /^[A-Za-z0-9_./:=,@%+-]+$/.test(word) ? word : `'${word.replace(/'/g, `'\\''`)}'`;
}

/**
 * The command that re-runs one check: the same adapter, suite, sizes, samples, seed, budget and
 * ensembles (so every drawn parameter and random stream is the same), restricted by --only.
 */
export function replayCommand(settings: RunSettings, suite: string, checkId: string, replayCase = ''): string {
  return [runCommand(settings, suite), `--only ${shellQuote(checkId)}`, replayCase === '' ? '' : `--case ${replayCase}`]
    .filter((w) => w.length > 0)
    .join(' ');
}

/** The command that runs these settings again (all checks of `suites`, every suite by default). */
export function runCommand(settings: RunSettings, suites = settings.suites.join(',')): string {
  const words = [
    'npx rmt-assay check',
    settings.adapterArguments,
    `--suite ${suites}`,
    `--size ${settings.sizes.join(',')}`,
    `--ladder ${settings.ladder.join(',')}`,
    `--samples ${settings.samples}`,
    `--seed ${settings.seed}`,
    settings.budget === DEFAULT_BUDGET ? '' : `--budget ${settings.budget}`,
    `--ensemble ${shellQuote(settings.ensembles.map(ensembleLabel).join(','))}`,
  ];
  return words.filter((w) => w.length > 0).join(' ');
}
