import type { CheckFinding } from '../../harness/check-group.js';
import type { PowerContext } from './detection-power.js';
import type { FluctuationSamples } from './fluctuation-samples.js';
import type { Statistic } from './statistic-book.js';

/**
 * One check of a fluctuation group: planned before the run (its statistics are registered in the
 * group's StatisticBook then), evaluated on the group's shared samples.
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
  evaluate(samples: FluctuationSamples, power: PowerContext): CheckFinding;
}
