import fc from 'fast-check';
import { abs, mul, sub, type Complex } from '../../harness/numeric/complex.js';
import { eigenvalues } from '../../harness/numeric/eigen.js';
import { identityMatrix } from '../../harness/numeric/square-matrix.js';
import type { RunSettings } from '../../harness/run-settings.js';
import { ratioTest } from '../../harness/tolerance-test.js';
import { checkedResolventTraces } from './checked-resolvent-traces.js';
import { chainErrorScale, RATIO_THRESHOLD, referenceSpectrum, resolventErrorScale } from './error-scales.js';
import { caseMatrix, describeMatrixCase, matrixCaseArbitrary, type MatrixCase } from './matrix-case.js';
import type { RandomisedIdentity } from './randomised-identity-check.js';
import { describePoints, spectralPairArbitrary } from './spectral-points.js';
import { describeWeight, weightMatrix, weightSpecArbitrary, type WeightSpec } from './weight-matrices.js';
import { operatorNormBound } from './weight-norms.js';

interface PairCase {
  readonly matrix: MatrixCase;
  readonly pair: readonly [Complex, Complex];
  readonly weight: WeightSpec;
}

/**
 * The resolvent identity G(z1) − G(z2) = (z1 − z2) G(z1) G(z2), an exact consequence of
 * (H − z2) − (H − z1) = z1 − z2 (Anderson, Guionnet and Zeitouni 2010, An Introduction to Random
 * Matrices, Cambridge University Press, §2.4; common practice), multiplied by A and traced:
 *     ⟨G(z1)A⟩ − ⟨G(z2)A⟩ = (z1 − z2)⟨G(z1) G(z2) A⟩,
 * the left side from resolvent_trace, the right from chain_trace with weights [I, A]. Near pairs
 * z1 ≈ z2 make the left side cancel; the tolerance is the sum of the three terms' scales, so a
 * correct implementation still passes and one whose error does not scale with the conditioning
 * does not.
 */
export function resolventIdentity(settings: RunSettings): RandomisedIdentity<PairCase> {
  return {
    id: 'identities/resolvent-identity',
    title: 'resolvent identity ⟨G(z1)A⟩ − ⟨G(z2)A⟩ = (z1 − z2)⟨G(z1)G(z2)A⟩',
    needs: ['resolvent_trace', 'chain_trace'],
    arbitrary: fc.record({ matrix: matrixCaseArbitrary(settings), pair: spectralPairArbitrary(), weight: weightSpecArbitrary() }),
    describe: (c) => `${describeMatrixCase(c.matrix)}; z1, z2 = ${describePoints(c.pair)}; A = ${describeWeight(c.weight, c.matrix.size)}`,
    path: () => "matrices: harness sampler (per case); statistics: implementation's resolvent_trace (left side) and chain_trace (right side)",
    async evaluate(context, c) {
      const n = c.matrix.size;
      const h = caseMatrix(context, c.matrix);
      const a = weightMatrix(context, c.weight, n);
      const [z1, z2] = c.pair;
      const [t1, t2] = await checkedResolventTraces(context, h, [z1, z2], a);
      const chain = await context.adapter.chainTrace(h, [z1, z2], [identityMatrix('real', n), a]);
      const spectrum = referenceSpectrum(eigenvalues(h));
      const norm = operatorNormBound(a);
      const gap = abs(sub(z1, z2));
      return ratioTest({
        observed: sub(t1, t2),
        expected: mul(sub(z1, z2), chain),
        expectedSource:
          '(z1 − z2)⟨G(z1)G(z2)A⟩ from the implementation\'s chain_trace: the resolvent identity G(z1) − G(z2) = (z1 − z2)G(z1)G(z2) ' +
          '(Anderson, Guionnet and Zeitouni 2010, An Introduction to Random Matrices, §2.4)',
        scale:
          resolventErrorScale(spectrum, z1, norm) + resolventErrorScale(spectrum, z2, norm) + gap * chainErrorScale(spectrum, [z1, z2], [1, norm]),
        threshold: RATIO_THRESHOLD,
        toleranceReason:
          '|left − right| / (s₁(z1) + s₁(z2) + |z1 − z2| s₂): each computed term carries its own rounding error, ' +
          's₁ = Nε‖A‖((‖H‖₂ + |z|)/d² + 1/d) and s₂ the two-resolvent chain scale (error-scales.ts; Higham 2002, §3.5)',
      });
    },
  };
}
