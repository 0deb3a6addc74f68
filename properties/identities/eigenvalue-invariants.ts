import fc from 'fast-check';
import type { CheckContext } from '../../harness/check-group.js';
import type { DeterministicEvidence } from '../../harness/evidence.js';
import { eigenvalues } from '../../harness/numeric/eigen.js';
import { entryRe, frobeniusNorm, type SquareMatrix } from '../../harness/numeric/square-matrix.js';
import type { RunSettings } from '../../harness/run-settings.js';
import { ratioTest } from '../../harness/tolerance-test.js';
import { countMismatch } from './count-mismatch.js';
import { EPSILON, eigenvalueErrorScale, RATIO_THRESHOLD, referenceSpectrum, type ReferenceSpectrum } from './error-scales.js';
import { inequalityEvidence } from './inequality-evidence.js';
import { caseMatrix, describeMatrixCase, matrixCaseArbitrary, type MatrixCase } from './matrix-case.js';
import type { RandomisedIdentity } from './randomised-identity-check.js';

type EigenCase = { readonly matrix: MatrixCase };

const PATH = "matrices: harness sampler (per case); statistic: implementation's eigenvalues; ‖H‖₂ from the harness's eigenvalues";

/**
 * Invariants of a spectrum that need no reference solver: N values, ascending, summing to Tr H,
 * with squares summing to Tr H² = Σ|h_ij|² (the Frobenius norm, unitarily invariant; Horn and
 * Johnson 2013, Matrix Analysis, §5.6; common practice).
 *
 * Scales (error-scales.ts): each eigenvalue is within Nε‖H‖₂ of the exact one, so their sum is
 * within N·Nε‖H‖₂ of Tr H (Σλ_i(H + E) = Tr H + Tr E, |Tr E| ≤ N‖E‖₂), and the sum of squares
 * within 2N·‖H‖₂·Nε‖H‖₂ of ‖H‖_F²; summation adds less (Higham 2002, §4.2). Sortedness is exact:
 * a correct routine has no descent at all, so any descent above a few ulps fails.
 */
function eigenvalueCheck(
  settings: RunSettings,
  id: string,
  title: string,
  judge: (values: Float64Array, h: SquareMatrix, spectrum: ReferenceSpectrum) => DeterministicEvidence,
): RandomisedIdentity<EigenCase> {
  return {
    id,
    title,
    needs: ['eigenvalues'],
    arbitrary: fc.record({ matrix: matrixCaseArbitrary(settings) }),
    describe: (c) => describeMatrixCase(c.matrix),
    path: () => PATH,
    async evaluate(context: CheckContext, c: EigenCase) {
      const h = caseMatrix(context, c.matrix);
      const values = await context.adapter.eigenvalues(h);
      return judge(values, h, referenceSpectrum(eigenvalues(h)));
    },
  };
}

export function eigenvalueCount(settings: RunSettings): RandomisedIdentity<EigenCase> {
  return eigenvalueCheck(settings, 'identities/eigenvalues/count', 'eigenvalues: exactly N of them', (values, h) =>
    values.length === h.size
      ? { ...countMismatch(values.length, h.size, 'eigenvalues (one per row of H)'), ratio: 0 }
      : countMismatch(values.length, h.size, 'eigenvalues (one per row of H)'),
  );
}

export function eigenvalueOrder(settings: RunSettings): RandomisedIdentity<EigenCase> {
  return eigenvalueCheck(settings, 'identities/eigenvalues/ascending', 'eigenvalues: in ascending order', (values, _h, spectrum) => {
    let descent = 0;
    let at = 0;
    for (let i = 0; i + 1 < values.length; i++) {
      const d = values[i] - values[i + 1];
      if (!(d <= descent)) {
        descent = d;
        at = i;
      }
    }
    // With fewer than two values there is no order to check (the count check says what is wrong).
    const pair = values.length > 1;
    return inequalityEvidence({
      observed: pair ? values[at + 1] : values.length,
      bound: pair ? values[at] : values.length,
      boundSource: `λ_${at + 1} ≥ λ_${at}: eigenvalues are returned ascending (the adapter contract, adapters/adapter.ts)`,
      violation: pair ? descent : 0,
      scale: eigenvalueErrorScale(spectrum),
      toleranceReason: 'largest descent max_i (λ_i − λ_{i+1})₊ / (Nε‖H‖₂): a sorted output has none',
    });
  });
}

export function eigenvalueTrace(settings: RunSettings): RandomisedIdentity<EigenCase> {
  return eigenvalueCheck(settings, 'identities/eigenvalues/trace', 'eigenvalues: Σλ_i = Tr H', (values, h, spectrum) => {
    let trace = 0;
    for (let i = 0; i < h.size; i++) trace += entryRe(h, i, i);
    return ratioTest({
      observed: values.reduce((s, v) => s + v, 0),
      expected: trace,
      expectedSource: 'Tr H = Σ_i h_ii, computed by the harness (the trace is the sum of the eigenvalues)',
      scale: h.size * eigenvalueErrorScale(spectrum),
      threshold: RATIO_THRESHOLD,
      toleranceReason: '|Σλ_i − Tr H| / (N·Nε‖H‖₂): Σλ_i(H + E) − Tr H = Tr E, |Tr E| ≤ N‖E‖₂ with ‖E‖₂ = O(Nε‖H‖₂) (Golub and Van Loan 2013, §8.3.5)',
    });
  });
}

export function eigenvalueSquares(settings: RunSettings): RandomisedIdentity<EigenCase> {
  return eigenvalueCheck(settings, 'identities/eigenvalues/sum-of-squares', 'eigenvalues: Σλ_i² = Tr H² = Σ|h_ij|²', (values, h, spectrum) => {
    const frobenius = frobeniusNorm(h);
    return ratioTest({
      observed: values.reduce((s, v) => s + v * v, 0),
      expected: frobenius * frobenius,
      expectedSource: 'Tr H² = Σ_ij |h_ij|² = ‖H‖_F², computed by the harness (Horn and Johnson 2013, Matrix Analysis, §5.6)',
      scale: Math.max(2 * h.size * h.size * EPSILON * spectrum.norm * spectrum.norm, Number.MIN_VALUE),
      threshold: RATIO_THRESHOLD,
      toleranceReason: '|Σλ_i² − ‖H‖_F²| / (2N²ε‖H‖₂²): each of N eigenvalues within Nε‖H‖₂ moves its square by at most 2‖H‖₂ times that',
    });
  });
}
