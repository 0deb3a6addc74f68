import type { CheckFinding, CheckGroup, PlannedCheck } from '../check-group.js';
import { sampleTraceStatistics } from '../compare/sampled-trace-statistics.js';
import { differenceEvidence } from '../compare/two-sample-evidence.js';
import { meanStandardError, varianceStandardError, type MomentSummary } from '../estimators/moment-summary.js';
import { formatComplex } from '../numeric/complex.js';
import { parseEnsemble } from '../numeric/ensemble.js';
import type { BaselineFile, RecordedSample, RecordedStatistic } from './baseline-file.js';
import { recordedBy } from './baseline-output-group.js';
import { baselineSampleKey, baselineSeeded } from './baseline-seeds.js';
import { recordedProbeInputs } from './recorded-inputs.js';
import { traceMoments } from './trace-moments.js';

function summaryOf(m: RecordedStatistic, count: number): MomentSummary {
  return { count, mean: m.mean, variance: m.variance, fourthCentralMoment: m.fourthCentralMoment };
}

const SEEDS_NOTE =
  'drawn again under the seeds of the recording: an unchanged sampler reproduces the recorded sample exactly; the standard error treats ' +
  'the two samples as independent, which is conservative when they are positively correlated (common practice)';

/**
 * The implementation's own samples now against the recorded moments, for each of Re and Im
 * Tr G(z) at the baseline's statistic points: the mean (Welch z on the difference) and the
 * variance (difference with the standard error √((m₄ − s⁴)/K) on each side, valid without
 * normality). Every p-value enters the run's Holm control.
 */
export function baselineStatisticsGroup(baseline: BaselineFile, file: string, recorded: RecordedSample): CheckGroup {
  const { ensemble: label, size, count } = recorded;
  const ensemble = parseEnsemble(label);
  const id = `baseline/statistics/${label}/N=${size}`;
  const suffix = (m: RecordedStatistic) => `${m.part}-z=${formatComplex({ re: m.point[0], im: m.point[1] })}`;
  const parameters = { ensemble: label, N: size, samples: count, baseline: file };
  const checks: PlannedCheck[] = recorded.moments.flatMap((m) => [
    { id: `baseline/mean/${label}/N=${size}/${suffix(m)}`, title: `E ${m.name} unchanged since the baseline`, parameters: { ...parameters, statistic: m.name } },
    { id: `baseline/variance/${label}/N=${size}/${suffix(m)}`, title: `Var ${m.name} unchanged since the baseline`, parameters: { ...parameters, statistic: m.name } },
  ]);
  const points = recordedProbeInputs(baseline).statisticPoints;
  return {
    id,
    suite: 'baseline',
    checks,
    skipReason: (capabilities) =>
      capabilities.has('sample') || capabilities.has('sample_statistics')
        ? null
        : `the implementation no longer draws its own matrices; the baseline's statistics came from the sampler of ${recordedBy(baseline)}`,
    async run(context): Promise<CheckFinding[]> {
      const sample = await sampleTraceStatistics(baselineSeeded(context, baseline.seed), baselineSampleKey(ensemble, size), ensemble, size, count, points);
      const now = new Map(traceMoments(sample, points).map((m) => [m.name, summaryOf(m, sample.count)]));
      const path = `now: ${sample.path}; recorded: ${recorded.path}`;
      return recorded.moments.flatMap((m): CheckFinding[] => {
        const before = summaryOf(m, count);
        const after = now.get(m.name);
        if (after === undefined) return [0, 1].map(() => ({ state: 'skipped', reason: `${m.name} is not at a statistic point of the baseline's probe set` }));
        const compared = (what: string, estimate: (m: MomentSummary) => number, standardError: (m: MomentSummary) => number, method: string): CheckFinding => ({
          state: 'measured',
          path,
          evidence: differenceEvidence(
            { estimate: estimate(after), standardError: standardError(after), count: after.count },
            { estimate: estimate(before), standardError: standardError(before), count: before.count },
            `${what} ${m.name} in the baseline ${file}, ${count} samples from ${recordedBy(baseline)}`,
            `${method}; ${SEEDS_NOTE}`,
          ),
        });
        return [
          compared('E', (s) => s.mean, meanStandardError, 's/√K'),
          compared('Var', (s) => s.variance, varianceStandardError, '√((m₄ − s⁴)/K) (moment-summary.ts)'),
        ];
      });
    },
  };
}
