import fc from 'fast-check';
import { ReferenceAdapter } from '../../adapters/reference-adapter.js';
import { abs, sub, type Complex } from '../../harness/numeric/complex.js';
import { eigenvalues } from '../../harness/numeric/eigen.js';
import type { RunSettings } from '../../harness/run-settings.js';
import { ratioTest } from '../../harness/tolerance-test.js';
import { chainLinksArbitrary, describeLinks, type ChainLink } from './chain-links.js';
import { checkedResolventTraces } from './checked-resolvent-traces.js';
import { countMismatch } from './count-mismatch.js';
import { chainErrorScale, eigenvalueErrorScale, RATIO_THRESHOLD, referenceSpectrum, resolventErrorScale } from './error-scales.js';
import { caseMatrix, describeMatrixCase, matrixCaseArbitrary, type MatrixCase } from './matrix-case.js';
import type { RandomisedIdentity } from './randomised-identity-check.js';
import { describePoints, spectralPointArbitrary } from './spectral-points.js';
import { describeWeight, weightMatrix, weightSpecArbitrary, type WeightSpec } from './weight-matrices.js';
import { operatorNormBound } from './weight-norms.js';

/**
 * Agreement with the harness's reference engine on the same matrix: eigenvalues, ⟨G(z)A⟩ and
 * chain traces. The reference is a backward-stable computation too, so the two may differ by the
 * sum of their error scales (error-scales.ts); the ratio is |implementation − reference| over
 * that sum.
 */
const REFERENCE_ENGINE =
  "the harness's reference engine on the same matrix: Householder tridiagonalisation and implicit QL " +
  '(Golub and Van Loan 2013, Matrix Computations, §8.3), traces from the eigendecomposition';

/** The harness's engine, through the same interface as the implementation, so both answer the same calls. */
const REFERENCE = new ReferenceAdapter();

const PATH = (statistic: string) => `matrices: harness sampler (per case); statistic: implementation's ${statistic}; compared with the reference engine`;

export function eigenvalueAgreement(settings: RunSettings): RandomisedIdentity<{ readonly matrix: MatrixCase }> {
  return {
    id: 'identities/agreement/eigenvalues',
    title: 'eigenvalues agree with the reference engine: max|Δλ| ≤ threshold · Nε‖H‖₂',
    needs: ['eigenvalues'],
    arbitrary: fc.record({ matrix: matrixCaseArbitrary(settings) }),
    describe: (c) => describeMatrixCase(c.matrix),
    path: () => PATH('eigenvalues'),
    async evaluate(context, c) {
      const h = caseMatrix(context, c.matrix);
      const observed = await context.adapter.eigenvalues(h);
      const reference = await REFERENCE.eigenvalues(h);
      if (observed.length !== reference.length) return countMismatch(observed.length, reference.length, 'eigenvalues');
      let worst = 0;
      for (let i = 0; i < reference.length; i++) {
        if (!(Math.abs(observed[i] - reference[i]) <= Math.abs(observed[worst] - reference[worst]))) worst = i;
      }
      return ratioTest({
        observed: observed[worst],
        expected: reference[worst],
        expectedSource: `λ_${worst} (ascending) from ${REFERENCE_ENGINE}`,
        scale: 2 * eigenvalueErrorScale(referenceSpectrum(reference)),
        threshold: RATIO_THRESHOLD,
        toleranceReason:
          'max_i |λ_i − λ_i(ref)| / (2Nε‖H‖₂): a backward-stable solver is exact for H + E, ‖E‖₂ = O(Nε‖H‖₂) (Golub and Van Loan 2013, §8.3.5), ' +
          "and Weyl's inequality moves each eigenvalue by at most ‖E‖₂ (Horn and Johnson 2013, Matrix Analysis, Cor. 4.3.15); 2 for the two solvers",
      });
    },
  };
}

interface ResolventCase {
  readonly matrix: MatrixCase;
  readonly points: readonly Complex[];
  readonly weight: WeightSpec;
}

export function resolventAgreement(settings: RunSettings): RandomisedIdentity<ResolventCase> {
  return {
    id: 'identities/agreement/resolvent-trace',
    title: '⟨G(z)A⟩ agrees with the reference engine within its conditioning, Nε‖A‖((‖H‖ + |z|)/d² + 1/d)',
    needs: ['resolvent_trace'],
    arbitrary: fc.record({
      matrix: matrixCaseArbitrary(settings),
      points: fc.array(spectralPointArbitrary(), { minLength: 1, maxLength: 3 }),
      weight: weightSpecArbitrary(),
    }),
    describe: (c) => `${describeMatrixCase(c.matrix)}; z = ${describePoints(c.points)}; A = ${describeWeight(c.weight, c.matrix.size)}${c.weight.kind === 'identity' ? ' (no weight passed)' : ''}`,
    path: () => PATH('resolvent_trace'),
    async evaluate(context, c) {
      const h = caseMatrix(context, c.matrix);
      const weight = c.weight.kind === 'identity' ? undefined : weightMatrix(context, c.weight, c.matrix.size);
      const observed = await checkedResolventTraces(context, h, c.points, weight);
      const expected = await REFERENCE.resolventTrace(h, c.points, weight);
      const spectrum = referenceSpectrum(eigenvalues(h));
      const a = weight === undefined ? 1 : operatorNormBound(weight);
      const ratios = c.points.map((z, j) => abs(sub(observed[j], expected[j])) / (2 * resolventErrorScale(spectrum, z, a)));
      const j = worstIndex(ratios);
      return ratioTest({
        observed: observed[j],
        expected: expected[j],
        expectedSource: `⟨G(z)A⟩ at z = ${describePoints([c.points[j]])} from ${REFERENCE_ENGINE}`,
        scale: 2 * resolventErrorScale(spectrum, c.points[j], a),
        threshold: RATIO_THRESHOLD,
        toleranceReason:
          '|Δ| / (2 s₁), s₁ = Nε‖A‖((‖H‖₂ + |z|)/d² + 1/d), d = dist(z, spectrum), ‖A‖ ≤ √(‖A‖₁‖A‖∞): first-order perturbation of G by a ' +
          'backward error of size Nε‖H‖₂ plus the rounding of λ − z and of the sum (Higham 2002, Accuracy and Stability, §3.5; error-scales.ts); 2 for the two engines',
      });
    },
  };
}

interface ChainCase {
  readonly matrix: MatrixCase;
  readonly links: readonly ChainLink[];
}

export function chainAgreement(settings: RunSettings): RandomisedIdentity<ChainCase> {
  return {
    id: 'identities/agreement/chain-trace',
    title: '⟨G(z1)A1 ⋯ G(zk)Ak⟩ agrees with the reference engine within its conditioning',
    needs: ['chain_trace'],
    arbitrary: fc.record({ matrix: matrixCaseArbitrary(settings), links: chainLinksArbitrary(1, 4) }),
    describe: (c) => `${describeMatrixCase(c.matrix)}; chain ${describeLinks(c.links, c.matrix.size)}`,
    path: () => PATH('chain_trace'),
    async evaluate(context, c) {
      const h = caseMatrix(context, c.matrix);
      const points = c.links.map((l) => l.z);
      const weights = c.links.map((l) => weightMatrix(context, l.weight, c.matrix.size));
      const observed = await context.adapter.chainTrace(h, points, weights);
      const spectrum = referenceSpectrum(eigenvalues(h));
      return ratioTest({
        observed,
        expected: await REFERENCE.chainTrace(h, points, weights),
        expectedSource: `⟨G(z1)A1 ⋯ G(zk)Ak⟩ from ${REFERENCE_ENGINE}`,
        scale: 2 * chainErrorScale(spectrum, points, weights.map(operatorNormBound)),
        threshold: RATIO_THRESHOLD,
        toleranceReason:
          '|Δ| / (2 s_k), s_k = Nε Π_j(‖A_j‖/d_j) Σ_j((‖H‖₂ + |z_j|)/d_j + 1): each resolvent adds the relative error of one, matrix products O(Nε) ' +
          '(Higham 2002, §3.5; error-scales.ts); 2 for the two engines',
      });
    },
  };
}

function worstIndex(ratios: readonly number[]): number {
  let worst = 0;
  ratios.forEach((r, j) => {
    if (!(r <= ratios[worst])) worst = j;
  });
  return worst;
}
