import type { SampledGroup } from '../../harness/check-group.js';
import { ensembleLabel, type EnsembleSpec } from '../../harness/numeric/ensemble.js';
import { weightedSlope } from '../../harness/estimators/weighted-slope.js';
import type { RunSettings } from '../../harness/run-settings.js';
import { toleranceTest } from '../../harness/tolerance-test.js';
import { formatCitation } from '../../reference-values/citation.js';
import { kolmogorovSlopeRange } from '../../reference-values/kolmogorov-rate.js';
import { kolmogorovDistanceToSemicircle } from '../support/kolmogorov-distance.js';
import { matrixSource } from '../support/matrix-source.js';
import { addObservation, combineCoMoments, emptyCoMoments, standardErrorOfMean, type CoMoments } from '../../harness/estimators/co-moment-accumulator.js';
import { eigenvalueOrigin, nothingToExercise, pathDescription, spectrumOf } from '../support/spectral-statistics.js';

/**
 * Samples at size N: the distance concentrates (its spread shrinks like its mean), so fewer large
 * matrices give the same relative precision; K_N = max(8, ⌈K·100/(3N)⌉) keeps the cost of the
 * largest size near that of the smallest.
 */
export function samplesAtSize(samples: number, size: number): number {
  return Math.max(8, Math.ceil((samples * 100) / (3 * size)));
}

/**
 * The rate of convergence of the empirical spectral distribution to the semicircle: the mean
 * Kolmogorov distance at each size of a ladder, and the weighted least-squares slope of log E D_N
 * on log N, against the known exponent −1 (up to logarithms).
 */
export function kolmogorovDecayGroup(ensemble: EnsembleSpec, settings: RunSettings): SampledGroup<DistancePart> {
  const label = ensembleLabel(ensemble);
  const ladder = [...settings.ladder];
  const counts = ladder.map((n) => samplesAtSize(settings.samples, n));
  const id = `semicircle/kolmogorov-decay/${label}/N=${ladder.join(',')}`;
  return {
    id,
    suite: 'semicircle',
    checks: [
      {
        id,
        title: 'log–log slope of the Kolmogorov distance to the semicircle over N',
        parameters: { ensemble: label, N: ladder.join(','), samples: counts.join(',') },
      },
    ],
    skipReason: (capabilities) => nothingToExercise(capabilities, 'eigenvalues'),
    work: {
      // One sample set per size of the ladder.
      setSizes: counts,
      async observe(context, set, start, end) {
        const size = ladder[set];
        const source = await matrixSource(context, `${id}/N=${size}`, ensemble, size, counts[set], false, { start, end });
        const sums = emptyCoMoments(1);
        const row = new Float64Array(1);
        for await (const matrix of source.matrices) {
          row[0] = kolmogorovDistanceToSemicircle(await spectrumOf(context, matrix));
          addObservation(sums, row);
        }
        return { matrices: source.description.replace(/, N = \d+, \d+ matrices/, ''), sums };
      },
      combine: (left, right) => ({ matrices: left.matrices, sums: combineCoMoments(left.sums, right.sums) }),
      conclude(context, parts) {
        const logN: number[] = [];
        const logD: number[] = [];
        const sigma: number[] = [];
        const means: string[] = [];
        const points: { n: number; value: number; standardError: number }[] = [];
        let total = 0;
        parts.forEach(({ sums }, set) => {
          const size = ladder[set];
          total += sums.count;
          const mean = sums.mean[0];
          const standardError = standardErrorOfMean(sums, 0);
          logN.push(Math.log(size));
          logD.push(Math.log(mean));
          // Delta method: se(log D̄) = se(D̄)/D̄.
          sigma.push(standardError / mean);
          means.push(`N=${size}: ${mean.toPrecision(4)}`);
          points.push({ n: size, value: mean, standardError });
        });
        const fit = weightedSlope(logN, logD, sigma);
        // The admissible slopes form an interval [lower, upper] around the exponent −1; the test
        // holds the fitted slope against its centre with the half-width as the allowance.
        const range = kolmogorovSlopeRange('empirical', ladder);
        const centre = (range.lower + range.upper) / 2;
        return [
          {
            state: 'measured',
            path: `${pathDescription(parts[parts.length - 1].matrices, 'eigenvalues', eigenvalueOrigin(context))}; mean distances ${means.join(', ')}`,
            exhibit: {
              kind: 'log-log-decay',
              points,
              slope: fit.slope,
              intercept: fit.intercept,
              label: `mean Kolmogorov distance to the semicircle over N (${label})`,
            },
            evidence: toleranceTest({
              observed: fit.slope,
              expected: centre,
              expectedSource: `slope ${range.exponent} up to logarithms: the centre of the admissible range [${range.lower.toFixed(3)}, ${range.upper.toFixed(3)}] over N = ${ladder.join(', ')} (${range.sources.map(formatCitation).join('; ')})`,
              standardError: fit.standardError,
              standardErrorMethod: 'weighted least squares on log N, weights from the delta-method standard errors se(D̄_N)/D̄_N of each size\'s mean',
              allowance: (range.upper - range.lower) / 2,
              allowanceReason: `half-width of the admissible range: ${range.note}`,
              sampleCount: total,
            }),
          },
        ];
      },
    },
  };
}

/** A block's tally at one size: the mean distance, and which sampler made the matrices. */
interface DistancePart {
  readonly matrices: string;
  readonly sums: CoMoments;
}
