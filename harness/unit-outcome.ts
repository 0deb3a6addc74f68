import { AdapterFault, NotAvailable } from '../adapters/adapter.js';
import type { CheckFinding } from './check-group.js';

/**
 * What running one work unit gave: a block's part, a whole group's findings, a reason the group
 * cannot run, or a fault. Plain data, like the parts, so it crosses threads and goes into shard
 * files. `abandoned`: not run because its group had already faulted (nothing more would change).
 */
export type UnitOutcome =
  | { readonly kind: 'part'; readonly part: unknown }
  | { readonly kind: 'findings'; readonly findings: readonly CheckFinding[] }
  | { readonly kind: 'unavailable'; readonly reason: string }
  | { readonly kind: 'fault'; readonly faultKind: string; readonly faultMethod: string; readonly reason: string }
  | { readonly kind: 'abandoned' };

/** The outcome an error thrown while running a unit stands for. */
export function outcomeOfError(error: unknown): Extract<UnitOutcome, { kind: 'fault' | 'unavailable' }> {
  if (error instanceof NotAvailable) return { kind: 'unavailable', reason: error.message };
  if (error instanceof AdapterFault) return { kind: 'fault', faultKind: error.kind, faultMethod: error.method, reason: `${error.method}: ${error.message}` };
  return { kind: 'fault', faultKind: 'internal-error', faultMethod: 'harness', reason: `harness error: ${(error as Error)?.message ?? String(error)}` };
}
