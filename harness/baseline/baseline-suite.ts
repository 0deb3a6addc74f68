import type { PropertySuite } from '../check-group.js';
import type { ProbeRoutine } from '../compare/probe-routines.js';
import type { BaselineFile, RecordedOutput } from './baseline-file.js';
import { baselineOutputGroup, recordedBy } from './baseline-output-group.js';
import { baselineStatisticsGroup } from './baseline-statistics-group.js';

export const BASELINE_SUITE_NAME = 'baseline';

/**
 * An implementation against its own recorded baseline: each routine's outputs on the baseline's
 * probe matrices (deterministic, within the stated tolerance), and its sampled statistics by
 * two-sample tests. It plans from the baseline alone (its seed, sizes, ensembles and samples),
 * whatever the run's settings, so the inputs are those of the recording.
 */
export function baselineSuite(baseline: BaselineFile, file: string): PropertySuite {
  return {
    name: BASELINE_SUITE_NAME,
    description: `Regression against the baseline ${file}, recorded from ${recordedBy(baseline)}: per-matrix outputs within the rounding error of two backward-stable results, sampled statistics by two-sample tests.`,
    plan() {
      const cases = new Map<string, RecordedOutput[]>();
      for (const output of baseline.outputs) {
        const key = `${output.routine}\u0000${output.ensemble}\u0000${output.size}`;
        cases.set(key, [...(cases.get(key) ?? []), output]);
      }
      return [
        ...[...cases.values()].map((recorded) => baselineOutputGroup(baseline, file, recorded[0].routine as ProbeRoutine, recorded)),
        ...baseline.statistics.map((recorded) => baselineStatisticsGroup(baseline, file, recorded)),
      ];
    },
  };
}
