import type { RunRecipe } from '../run-recipe.js';
import type { UnitOutcome } from '../unit-outcome.js';
import type { WorkUnit } from '../work-unit.js';

/** What a unit worker is started with: the run's recipe, and the ids of the run's groups in plan order. */
export interface WorkerSetup {
  readonly recipe: RunRecipe;
  readonly groupIds: readonly string[];
}

/** Messages to a worker. */
export type ToWorker = { readonly kind: 'unit'; readonly unit: WorkUnit } | { readonly kind: 'close' };

/** Messages from a worker. */
export type FromWorker =
  | { readonly kind: 'ready' }
  | { readonly kind: 'setup-failed'; readonly message: string }
  | { readonly kind: 'outcome'; readonly outcome: UnitOutcome }
  | { readonly kind: 'closed'; readonly log: string };
