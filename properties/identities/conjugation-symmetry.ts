import fc from 'fast-check';
import { conj, formatComplex, type Complex } from '../../harness/numeric/complex.js';
import { eigenvalues } from '../../harness/numeric/eigen.js';
import type { RunSettings } from '../../harness/run-settings.js';
import { ratioTest } from '../../harness/tolerance-test.js';
import { checkedResolventTraces } from './checked-resolvent-traces.js';
import { RATIO_THRESHOLD, referenceSpectrum, resolventErrorScale } from './error-scales.js';
import { caseMatrix, describeMatrixCase, matrixCaseArbitrary, type MatrixCase } from './matrix-case.js';
import type { RandomisedIdentity } from './randomised-identity-check.js';
import { spectralPointArbitrary } from './spectral-points.js';
import { adjoint } from './weight-algebra.js';
import { describeWeight, weightMatrix, weightSpecArbitrary, type WeightSpec } from './weight-matrices.js';
import { operatorNormBound } from './weight-norms.js';

interface PointCase {
  readonly matrix: MatrixCase;
  readonly z: Complex;
  readonly weight: WeightSpec;
}

/**
 * Conjugation symmetry for Hermitian H: G(z)* = G(z̄), so
 *     ⟨G(z̄)A*⟩ = ⟨(A G(z))*⟩ = conj⟨A G(z)⟩ = conj⟨G(z)A⟩
 * (trace of an adjoint, then cyclicity; common practice). Both sides from resolvent_trace, the
 * left at z̄ with the weight's adjoint; a non-Hermitian weight makes a conjugated-but-not-
 * transposed (or transposed-but-not-conjugated) weight show.
 */
export function conjugationSymmetry(settings: RunSettings): RandomisedIdentity<PointCase> {
  return {
    id: 'identities/conjugation-symmetry',
    title: 'conjugation symmetry ⟨G(z̄)A*⟩ = conj⟨G(z)A⟩',
    needs: ['resolvent_trace'],
    arbitrary: fc.record({ matrix: matrixCaseArbitrary(settings), z: spectralPointArbitrary(), weight: weightSpecArbitrary() }),
    describe: (c) => `${describeMatrixCase(c.matrix)}; z = ${formatComplex(c.z)}; A = ${describeWeight(c.weight, c.matrix.size)}`,
    path: () => "matrices: harness sampler (per case); statistic: implementation's resolvent_trace at z and z̄",
    async evaluate(context, c) {
      const h = caseMatrix(context, c.matrix);
      const a = c.weight.kind === 'identity' ? undefined : weightMatrix(context, c.weight, c.matrix.size);
      const [atZ] = await checkedResolventTraces(context, h, [c.z], a);
      const [atConjugate] = await checkedResolventTraces(context, h, [conj(c.z)], a === undefined ? undefined : adjoint(a));
      const spectrum = referenceSpectrum(eigenvalues(h));
      const norm = a === undefined ? 1 : operatorNormBound(a);
      return ratioTest({
        observed: atConjugate,
        expected: conj(atZ),
        expectedSource: "conj⟨G(z)A⟩ from the implementation's resolvent_trace; G(z)* = G(z̄) for Hermitian H (common practice)",
        scale: 2 * resolventErrorScale(spectrum, c.z, norm),
        threshold: RATIO_THRESHOLD,
        toleranceReason:
          '|left − right| / (2 s₁), s₁ = Nε‖A‖((‖H‖₂ + |z|)/d² + 1/d), the same at z and z̄ and for A and A* (‖A*‖₁ = ‖A‖∞); error-scales.ts',
      });
    },
  };
}
