import type { SampledGroup } from '../../harness/check-group.js';
import { abs, add, formatComplex, scale, sub, mul, type Complex } from '../../harness/numeric/complex.js';
import { ensembleConstants, ensembleLabel, type EnsembleSpec } from '../../harness/numeric/ensemble.js';
import type { RunSettings } from '../../harness/run-settings.js';
import { toleranceTest } from '../../harness/tolerance-test.js';
import { resolventMeanCorrection } from '../../reference-values/finite-n-corrections.js';
import { stieltjesSemicircle } from '../../reference-values/semicircle-law.js';
import { expansionParameter } from '../support/expansion-parameter.js';
import { matrixSource } from '../support/matrix-source.js';
import { addObservation, combineCoMoments, emptyCoMoments, standardErrorOfMean, type CoMoments } from '../../harness/estimators/co-moment-accumulator.js';
import { drawSpectralParameters } from '../support/spectral-parameter-arbitraries.js';
import { nothingToExercise, normalisedResolventTracesOf, pathDescription, resolventOrigin } from '../support/spectral-statistics.js';

/** Points per region (bulk, edge, outside) at which E⟨G(z)⟩ is checked. */
const POINTS_PER_REGION = 2;

/**
 * Allowance for what the expected value leaves out: the remainder of the 1/N expansion
 * E⟨G(z)⟩ = m(z) + δ(z)/N + O(ε²), ε = 1/N for dense matrices. Its terms carry powers of
 * 1/(1 − m²), which grow near the edge, so the allowance is C·|m|³·ε²/|1 − m²|⁵. For sparse entries
 * with mean degree d the j-th cumulant of √N·h is of order (N/d)^(j/2 − 1), so the expansion is in
 * ε = max(1/N, 1/d) (common practice). C = 8 covers, with a factor of about 3 to
 * spare, the largest remainder measured with the reference engine (GOE, GUE, Rademacher; N = 50 to
 * 400; 2·10⁴ samples; at the regions' points), see test/properties/semicircle-allowance.test.ts.
 * Source: our own simulation; the form follows the edge singularity of the 1/N expansion
 * (common practice).
 */
export function stieltjesRemainderAllowance(z: Complex, ensemble: EnsembleSpec, size: number): number {
  const m = stieltjesSemicircle(z);
  const oneMinusM2 = abs(sub({ re: 1, im: 0 }, mul(m, m)));
  const epsilon = expansionParameter(ensemble, size);
  return (8 * abs(m) ** 3 * epsilon * epsilon) / oneMinusM2 ** 5;
}

/** E⟨G(z)⟩ at finite N: m(z) + δ(z)/N, δ the resolvent mean correction. */
export function expectedStieltjesMean(z: Complex, ensemble: EnsembleSpec, size: number): Complex {
  return add(stieltjesSemicircle(z), scale(resolventMeanCorrection(z, ensembleConstants(ensemble, size)), 1 / size));
}

const EXPECTED_SOURCE =
  'm(z) = (−z + √(z² − 4))/2, Im m·Im z > 0 (Wigner 1955, Ann. Math. 62; Anderson, Guionnet and Zeitouni 2010, ' +
  'An Introduction to Random Matrices, §2.4), plus δ(z)/N with δ = m³/(1 − m²)² + (σ_d² − 2)m³/(1 − m²) + κ4 m⁵/(1 − m²) ' +
  '(real) or (σ_d² − 1)m³/(1 − m²) + κ4 m⁵/(1 − m²) (complex), the resolvent form of the mean correction of Bai and Yao ' +
  '2005, Bernoulli 11';

/**
 * E⟨G(z)⟩ against the Stieltjes transform of the semicircle law, at points drawn by fast-check
 * in the bulk, near the edge and outside the spectrum, in both half-planes, with Im z from order
 * one down to the mesoscopic scale.
 */
export function stieltjesMeanGroup(ensemble: EnsembleSpec, size: number, settings: RunSettings): SampledGroup<StieltjesPart> {
  const label = ensembleLabel(ensemble);
  const id = `semicircle/stieltjes-mean/${label}/N=${size}`;
  const drawn = drawSpectralParameters(settings.seed ^ size, size, POINTS_PER_REGION);
  const points = drawn.map((d) => d.z);
  return {
    id,
    suite: 'semicircle',
    checks: drawn.map(({ z, region }) => ({
      id: `${id}/z=${formatComplex(z)}`,
      title: `E⟨G(z)⟩ = m(z) + δ(z)/N at z = ${formatComplex(z)} (${region})`,
      parameters: { ensemble: label, N: size, z: formatComplex(z), region, samples: settings.samples },
    })),
    skipReason: (capabilities) => nothingToExercise(capabilities, 'resolvent_trace'),
    work: {
      setSizes: [settings.samples],
      async observe(context, _set, start, end) {
        const source = await matrixSource(context, id, ensemble, size, settings.samples, false, { start, end });
        const sums = emptyCoMoments(2 * points.length);
        const row = new Float64Array(2 * points.length);
        for await (const matrix of source.matrices) {
          const traces = await normalisedResolventTracesOf(context, matrix, points);
          traces.forEach((t, j) => {
            row[2 * j] = t.re;
            row[2 * j + 1] = t.im;
          });
          addObservation(sums, row);
        }
        return { path: pathDescription(source.description, 'resolvent_trace', resolventOrigin(context)), sums };
      },
      combine: (left, right) => ({ path: left.path, sums: combineCoMoments(left.sums, right.sums) }),
      conclude(_context, [{ path, sums }]) {
        return points.map((z, j) => ({
          state: 'measured',
          path,
          evidence: toleranceTest({
            observed: { re: sums.mean[2 * j], im: sums.mean[2 * j + 1] },
            expected: expectedStieltjesMean(z, ensemble, size),
            expectedSource: EXPECTED_SOURCE,
            standardError: { re: standardErrorOfMean(sums, 2 * j), im: standardErrorOfMean(sums, 2 * j + 1) },
            standardErrorMethod: `sample standard deviation / √K over K = ${sums.count} independent matrices, per component`,
            allowance: stieltjesRemainderAllowance(z, ensemble, size),
            allowanceReason: 'remainder of the 1/N expansion, 8|m|³ε²/|1 − m²|⁵ with ε = 1/N (max(1/N, 1/d) if sparse), calibrated by simulation',
            sampleCount: sums.count,
          }),
        }));
      },
    },
  };
}

/** A block's tally: the means of Re and Im ⟨G(z)⟩ at each point, and where the statistics came from. */
interface StieltjesPart {
  readonly path: string;
  readonly sums: CoMoments;
}
