import type { SampledGroup } from '../../harness/check-group.js';
import { ensembleConstants, ensembleLabel, type EnsembleSpec } from '../../harness/numeric/ensemble.js';
import type { RunSettings } from '../../harness/run-settings.js';
import { toleranceTest } from '../../harness/tolerance-test.js';
import { certifiedEvenMoment } from '../../reference-values/certified-even-moment.js';
import { evenMomentCorrection } from '../../reference-values/finite-n-corrections.js';
import { builtInTable } from '../../reference-values/reference-table-catalog.js';
import { semicircleEvenMoment } from '../../reference-values/semicircle-law.js';
import { expansionParameter } from '../support/expansion-parameter.js';
import { matrixSource } from '../support/matrix-source.js';
import { addObservation, combineCoMoments, emptyCoMoments, standardErrorOfMean, type CoMoments } from '../../harness/estimators/co-moment-accumulator.js';
import {
  addSpectrum,
  combineSpectralHistograms,
  emptySpectralHistogram,
  histogramBinEdges,
  histogramDensity,
  type SpectralHistogram,
} from '../support/spectral-histogram.js';
import { eigenvalueOrigin, nothingToExercise, pathDescription, spectrumOf } from '../support/spectral-statistics.js';

/** Moments E⟨H^{2k}⟩ for k = 1 … MAX_K. */
const MAX_K = 4;

/**
 * GOE's coefficient of N^{−j} in E⟨H^{2k}⟩ = Σ_r c_{k,r} N^{r−k−1}, i.e. c_{k,k+1−j} from the certified
 * table goe-even-moment-polynomials (j = 2: 5, 52, 374 for k = 2, 3, 4; j = 3: 41, 690 for k = 3, 4):
 * the scale of the terms a general Wigner ensemble's expansion leaves out after its 1/N term.
 */
function goeExpansionCoefficient(k: number, j: number): number {
  const r = k + 1 - j;
  return r < 1 ? 0 : Number(builtInTable('goe-even-moment-polynomials').bigint({ k, r }, 'coefficient') ?? 0n);
}

interface MomentReference {
  readonly value: number;
  readonly source: string;
  readonly allowance: number;
  readonly allowanceReason: string;
}

/**
 * The exact value where it is known (GOE, GUE: the certified tables of reference-values/tables, exact
 * at every N for k ≤ 12, see certifiedEvenMoment), else the limit plus its 1/N correction.
 */
export function evenMomentReference(ensemble: EnsembleSpec, size: number, k: number): MomentReference {
  const exact = ensemble.kind === 'goe' || ensemble.kind === 'gue' ? certifiedEvenMoment(ensemble.kind, size, k) : undefined;
  if (exact !== undefined) {
    return {
      value: exact.normalised,
      source: `E⟨H^${2 * k}⟩ = E Tr X^${2 * k}/N^${k + 1}, ${exact.source}`,
      allowance: 0,
      allowanceReason: 'none: the reference is exact at this N (one rounding to double)',
    };
  }
  const epsilon = expansionParameter(ensemble, size);
  const c = ensembleConstants(ensemble, size);
  // κ4 is O(1) for dense entries and about N/d for sparse ones; κ4/(Nε) is O(1) in both cases.
  const cumulantScale = 1 + Math.abs(c.kappa4) / (size * epsilon) + c.diagonalVariance;
  const scaleOfRest = (goeExpansionCoefficient(k, 2) + goeExpansionCoefficient(k, 3) * epsilon) * cumulantScale;
  return {
    value: semicircleEvenMoment(k) + evenMomentCorrection(k, c) / size,
    source: `Catalan(${k}) (Wigner 1955; OEIS A000108) plus the 1/N correction of E Tr f(H) for f = x^${2 * k} (Bai and Yao 2005, Bernoulli 11)`,
    allowance: 3 * scaleOfRest * epsilon * epsilon,
    allowanceReason:
      'the O(ε²) rest of the expansion (ε = 1/N, or max(1/N, 1/d) if sparse), bounded by 3× GOE\'s ε² and ε³ coefficients times (1 + |κ4|/(Nε) + σ_d²) (common practice scale)',
  };
}

/** E⟨H^{2k}⟩, k = 1 … 4, from the spectra of K matrices. */
export function momentGroup(ensemble: EnsembleSpec, size: number, settings: RunSettings): SampledGroup<MomentPart> {
  const label = ensembleLabel(ensemble);
  const id = `semicircle/even-moments/${label}/N=${size}`;
  const ks = Array.from({ length: MAX_K }, (_, i) => i + 1);
  return {
    id,
    suite: 'semicircle',
    checks: ks.map((k) => ({
      id: `${id}/k=${k}`,
      title: `E⟨H^${2 * k}⟩ against its finite-N value`,
      parameters: { ensemble: label, N: size, moment: 2 * k, samples: settings.samples },
    })),
    skipReason: (capabilities) => nothingToExercise(capabilities, 'eigenvalues'),
    work: {
      setSizes: [settings.samples],
      async observe(context, _set, start, end) {
        const source = await matrixSource(context, id, ensemble, size, settings.samples, false, { start, end });
        const sums = emptyCoMoments(MAX_K);
        const row = new Float64Array(MAX_K);
        let histogram = emptySpectralHistogram();
        for await (const matrix of source.matrices) {
          const values = await spectrumOf(context, matrix);
          histogram = addSpectrum(histogram, values);
          row.fill(0);
          for (const lambda of values) {
            const l2 = lambda * lambda;
            let power = 1;
            for (let k = 0; k < MAX_K; k++) {
              power *= l2;
              row[k] += power;
            }
          }
          for (let k = 0; k < MAX_K; k++) row[k] /= size;
          addObservation(sums, row);
        }
        return { path: pathDescription(source.description, 'eigenvalues', eigenvalueOrigin(context)), sums, histogram };
      },
      combine: (left, right) => ({
        path: left.path,
        sums: combineCoMoments(left.sums, right.sums),
        histogram: combineSpectralHistograms(left.histogram, right.histogram),
      }),
      conclude(_context, [{ path, sums, histogram }]) {
        const exhibit = {
          kind: 'spectral-histogram' as const,
          binEdges: histogramBinEdges(histogram),
          density: histogramDensity(histogram),
          label: `eigenvalues of ${sums.count} matrices (${label}, N = ${size}) against the semicircle density`,
        };
        return ks.map((k) => {
          const reference = evenMomentReference(ensemble, size, k);
          return {
            state: 'measured',
            path,
            ...(k === 1 ? { exhibit } : {}),
            evidence: toleranceTest({
              observed: sums.mean[k - 1],
              expected: reference.value,
              expectedSource: reference.source,
              standardError: standardErrorOfMean(sums, k - 1),
              standardErrorMethod: `sample standard deviation / √K over K = ${sums.count} independent matrices`,
              allowance: reference.allowance,
              allowanceReason: reference.allowanceReason,
              sampleCount: sums.count,
            }),
          };
        });
      },
    },
  };
}

/** A block's tally: the moments' means, the pooled spectrum, and where they came from. */
interface MomentPart {
  readonly path: string;
  readonly sums: CoMoments;
  readonly histogram: SpectralHistogram;
}
