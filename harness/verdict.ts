import type { Evidence } from './evidence.js';
import type { Exhibit } from './exhibit.js';

export type VerdictState = 'pass' | 'fail' | 'skipped' | 'fault';

/**
 * The outcome of one check, as reporters see it. Data only: formatting is the reporters' job.
 * - pass / fail: `evidence` holds what was measured; a statistical check also carries its
 *   Holm-adjusted p-value, and fails when that is ≤ the run's level.
 * - skipped: `reason` says why (a capability the adapter lacks, an ensemble it does not sample).
 * - fault: the implementation misbehaved (crashed, hung, answered nonsense); `reason` says how.
 */
export interface CheckVerdict {
  readonly id: string;
  readonly suite: string;
  readonly title: string;
  readonly parameters: Readonly<Record<string, string | number>>;
  readonly state: VerdictState;
  readonly evidence?: Evidence;
  readonly adjustedPValue?: number;
  readonly path?: string;
  readonly reason?: string;
  readonly faultKind?: string;
  readonly faultMethod?: string;
  /** Data for a picture of what was measured (drawn by the HTML report). */
  readonly exhibit?: Exhibit;
  /** The command that re-runs exactly this check. */
  readonly replay: string;
}
