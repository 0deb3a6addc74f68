import type { CheckGroup, SampledGroup } from '../../harness/check-group.js';
import { ensembleConstants, ensembleLabel, type EnsembleSpec } from '../../harness/numeric/ensemble.js';
import type { RunSettings } from '../../harness/run-settings.js';
import type { PowerContext } from './detection-power.js';
import type { FluctuationCheck } from './fluctuation-check.js';
import { sampleCounts, SIXTH_ORDER_BUDGET } from './fluctuation-design.js';
import { observedAgainstPredicted, standardisedFluctuations, withExhibit } from './fluctuation-exhibits.js';
import type { Estimand } from './estimand.js';
import { observeFluctuationBlock, pilotChainValues } from './fluctuation-samples.js';
import { combineStates, TallyView, type FluctuationTally } from './fluctuation-tally.js';
import { linearStatisticChecks, meanCorrectionChecks } from './linear-statistic-checks.js';
import { mesoscopicChecks } from './mesoscopic-checks.js';
import { identityChainChecks, tracialChecks, weightedChecks } from './resolvent-checks.js';
import { emptyChainCheck, independenceCheck } from './sampling-checks.js';
import { StatisticBook } from './statistic-book.js';
import { wickChecks } from './wick-checks.js';

/** A planned group of fluctuation checks on shared samples, before the power context is known. */
export interface FluctuationGroupPlan {
  readonly statisticalChecks: number;
  group(power: PowerContext): CheckGroup;
}

/** Why the fluctuation checks cannot exercise the implementation, or null. */
export function fluctuationSkipReason(capabilities: ReadonlySet<string>): string | null {
  return capabilities.has('sample_statistics') || capabilities.has('sample')
    ? null
    : 'the implementation offers neither sample_statistics nor a sampler: nothing of it would be exercised (its per-matrix routines are checked by the identities suite)';
}

/** Samples of the pictured statistic kept for the report's normal quantile plot. */
const PICTURED_SAMPLES = 1000;

/** Runs a list of checks on one set of shared samples as a CheckGroup. */
export function fluctuationGroup(
  id: string,
  ensemble: EnsembleSpec,
  book: StatisticBook,
  checks: readonly FluctuationCheck[],
  counts: { spectral: number; weighted: number },
): FluctuationGroupPlan {
  const label = ensembleLabel(ensemble);
  // Every check's estimands, and the leading values of the statistic whose Gaussian shape the
  // report pictures (capped: memory stays fixed however many samples).
  const gaussian = checks.findIndex((c) => c.shows !== undefined);
  const shown: Estimand | undefined = gaussian >= 0 ? { kind: 'values', statistic: checks[gaussian].shows!, limit: PICTURED_SAMPLES } : undefined;
  const estimands = [...checks.flatMap((c) => c.estimands), ...(shown === undefined ? [] : [shown])];
  let pilot: Float64Array | undefined;
  return {
    statisticalChecks: checks.filter((c) => c.statistical).length,
    group: (power): SampledGroup<FluctuationTally> => ({
      id,
      suite: 'fluctuations',
      checks: checks.map((c) => ({
        id: `${id}/${c.name}`,
        title: c.title,
        parameters: { ensemble: label, N: book.size, samples: counts.spectral, weightedSamples: counts.weighted, ...c.parameters },
      })),
      skipReason: fluctuationSkipReason,
      work: {
        setSizes: [counts.spectral],
        observe(context, _set, start, end) {
          pilot ??= pilotChainValues(context, id, ensemble, book);
          return observeFluctuationBlock(context, id, ensemble, book, counts, estimands, pilot, start, end);
        },
        combine: (left, right) => ({ path: left.path, origin: left.origin, states: combineStates(estimands, left.states, right.states) }),
        conclude(_context, [tally]) {
          const view = new TallyView(estimands, tally);
          const findings = checks.map((c) => c.evaluate(view, power));
          // Pictures for the report: all of the group's checks observed against predicted on the
          // first, and the Gaussian shape of the first statistic on the check that uses it.
          const first = findings.findIndex((f) => f.state === 'measured');
          if (first >= 0) findings[first] = withExhibit(findings[first], observedAgainstPredicted(checks, findings, `${id}: observed against predicted`));
          if (shown !== undefined) findings[gaussian] = withExhibit(findings[gaussian], standardisedFluctuations(view.state(shown), checks[gaussian].shows!.label));
          return findings;
        },
      },
    }),
  };
}

/**
 * Items 1–5 at one ensemble and size, on one sequence of samples: tracial, identity-chain and
 * weighted covariances, linear statistics and their means, mesoscopic statistics, Wick
 * factorisation, and the independence of consecutive samples (plus the empty chain on the
 * sample_statistics path).
 */
export function fluctuationMainGroup(ensemble: EnsembleSpec, size: number, settings: RunSettings): FluctuationGroupPlan {
  const book = new StatisticBook(size);
  const c = ensembleConstants(ensemble, size);
  const checks = [
    ...tracialChecks(book, c),
    ...identityChainChecks(book, c),
    ...weightedChecks(book, c),
    ...linearStatisticChecks(book, ensemble),
    ...meanCorrectionChecks(book, ensemble),
    ...mesoscopicChecks(book, ensemble),
    ...wickChecks(book, c, settings.budget >= SIXTH_ORDER_BUDGET),
    independenceCheck(book),
    emptyChainCheck(book),
  ];
  return fluctuationGroup(`fluctuations/${ensembleLabel(ensemble)}/N=${size}`, ensemble, book, checks, sampleCounts(c.field, settings.budget));
}

/**
 * Item 4's decay: the covariance of the mesoscopic statistics at E1 ≠ E2 at N/4, to set beside the
 * one at N (the prediction shrinks like N^{−2γ}: four times larger here for γ = 1/2).
 */
export function decorrelationGroup(ensemble: EnsembleSpec, size: number, settings: RunSettings): FluctuationGroupPlan {
  const small = Math.max(16, Math.round(size / 4));
  const book = new StatisticBook(small);
  const c = ensembleConstants(ensemble, small);
  const checks = mesoscopicChecks(book, ensemble, true);
  const counts = sampleCounts(c.field, settings.budget);
  // Named under the size it accompanies, so that it never collides with the main group of a run at N/4.
  const id = `fluctuations/${ensembleLabel(ensemble)}/N=${size}/decorrelation/N=${small}`;
  return fluctuationGroup(id, ensemble, book, checks, { spectral: counts.spectral, weighted: 0 });
}
