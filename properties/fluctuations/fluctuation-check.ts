import type { CheckFinding } from '../../harness/check-group.js';
import type { PowerContext } from './detection-power.js';
import type { Estimand } from './estimand.js';
import type { TallyView } from './fluctuation-tally.js';
import type { Statistic } from './statistic-book.js';

/**
 * One check of a fluctuation group: planned before the run (its statistics are registered in the
 * group's StatisticBook then, and what it estimates from them is declared), evaluated on the
 * group's reduced samples.
 */
export interface FluctuationCheck {
  /** Appended to the group's id. */
  readonly name: string;
  readonly title: string;
  readonly parameters?: Readonly<Record<string, string | number>>;
  /** Statistical checks enter Holm's family; a deterministic one does not. */
  readonly statistical: boolean;
  /** A statistic whose standardised fluctuations the check's verdict shows (a normal quantile plot). */
  readonly shows?: Statistic;
  /** What it estimates; the samples are reduced to these as they come. */
  readonly estimands: readonly Estimand[];
  evaluate(tally: TallyView, power: PowerContext): CheckFinding;
}
