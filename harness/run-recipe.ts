import type { AdapterChoice } from './cli/open-adapter.js';
import type { PropertySuite } from './check-group.js';
import { baselineSuite } from './baseline/baseline-suite.js';
import { loadBaseline } from './baseline/load-baseline.js';
import type { RunSettings } from './run-settings.js';
import { SUITES } from '../properties/suite-registry.js';

/**
 * Everything that re-creates a run's plan and adapter somewhere else (a worker thread, a merge of
 * shards): plain data. Two runs with equal recipes plan the same groups and draw the same samples.
 */
export interface RunRecipe {
  readonly settings: RunSettings;
  readonly adapter: AdapterChoice;
  /** The --baseline file, whose suite joins the run. */
  readonly baselineFile?: string;
}

/** The suites of a recipe: the named ones, then the baseline's. */
export function suitesOfRecipe(recipe: RunRecipe): PropertySuite[] {
  const named = recipe.settings.suites.flatMap((name) => SUITES.get(name) ?? []);
  return recipe.baselineFile === undefined ? named : [...named, baselineSuite(loadBaseline(recipe.baselineFile), recipe.baselineFile)];
}
