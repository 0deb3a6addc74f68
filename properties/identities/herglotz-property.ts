import fc from 'fast-check';
import { abs, formatComplex, type Complex } from '../../harness/numeric/complex.js';
import { eigenvalues } from '../../harness/numeric/eigen.js';
import type { RunSettings } from '../../harness/run-settings.js';
import { checkedResolventTraces } from './checked-resolvent-traces.js';
import { distanceToSpectrum, referenceSpectrum, resolventErrorScale } from './error-scales.js';
import { inequalityEvidence } from './inequality-evidence.js';
import { caseMatrix, describeMatrixCase, matrixCaseArbitrary, type MatrixCase } from './matrix-case.js';
import type { RandomisedIdentity } from './randomised-identity-check.js';
import { spectralPointArbitrary } from './spectral-points.js';
import { describeWeight, weightMatrix, weightSpecArbitrary, type WeightSpec } from './weight-matrices.js';
import { normalisedFrobeniusNorm, operatorNormBound } from './weight-norms.js';

const PATH = "matrices: harness sampler (per case); statistic: implementation's resolvent_trace; bounds from the harness's eigenvalues";

/**
 * The Herglotz (Nevanlinna) property of the Stieltjes transform of the empirical spectral measure:
 *     Im⟨G(z)⟩ = (1/N) Σ_i Im z / |λ_i − z|²,
 * so Im⟨G(z)⟩ has the sign of Im z, and since |λ_i − z| ≤ ‖H‖₂ + |z|,
 *     sign(Im z) · Im⟨G(z)⟩ ≥ |Im z| / (‖H‖₂ + |z|)² > 0
 * (Anderson, Guionnet and Zeitouni 2010, An Introduction to Random Matrices, §2.4, on Stieltjes
 * transforms; the explicit lower bound is elementary). A routine on the wrong branch, or evaluating
 * at z̄, flips the sign; the check holds the computed value against the lower bound.
 */
export function herglotzSign(settings: RunSettings): RandomisedIdentity<{ readonly matrix: MatrixCase; readonly z: Complex }> {
  return {
    id: 'identities/herglotz-sign',
    title: 'Herglotz property: sign(Im z)·Im⟨G(z)⟩ ≥ |Im z|/(‖H‖ + |z|)² > 0 in both half-planes',
    needs: ['resolvent_trace'],
    arbitrary: fc.record({ matrix: matrixCaseArbitrary(settings), z: spectralPointArbitrary() }),
    describe: (c) => `${describeMatrixCase(c.matrix)}; z = ${formatComplex(c.z)}`,
    path: () => PATH,
    async evaluate(context, c) {
      const h = caseMatrix(context, c.matrix);
      const [g] = await checkedResolventTraces(context, h, [c.z]);
      const spectrum = referenceSpectrum(eigenvalues(h));
      const signed = Math.sign(c.z.im) * g.im;
      const bound = Math.abs(c.z.im) / (spectrum.norm + abs(c.z)) ** 2;
      return inequalityEvidence({
        observed: signed,
        bound,
        boundSource:
          'sign(Im z)·Im⟨G(z)⟩ = (1/N)Σ|Im z|/|λ_i − z|² ≥ |Im z|/(‖H‖₂ + |z|)² (Herglotz property; Anderson, Guionnet and Zeitouni 2010, §2.4)',
        violation: Math.max(0, bound - signed),
        scale: resolventErrorScale(spectrum, c.z, 1),
        toleranceReason:
          '(bound − sign(Im z)·Im⟨G⟩)₊ / s₁, s₁ = Nε((‖H‖₂ + |z|)/d² + 1/d) the rounding-error scale of ⟨G(z)⟩ (error-scales.ts)',
      });
    },
  };
}

interface BoundCase {
  readonly matrix: MatrixCase;
  readonly z: Complex;
  readonly weight: WeightSpec;
}

/**
 * The resolvent bound: ‖G(z)‖₂ = 1/dist(z, spectrum) ≤ 1/|Im z| for Hermitian H, and by
 * Cauchy–Schwarz |⟨G(z)A⟩| ≤ ‖G(z)‖₂ ⟨A*A⟩^{1/2} (weight-norms.ts), so
 *     |⟨G(z)A⟩| ≤ ‖A‖_F / (√N dist(z, spectrum)) ≤ ‖A‖₂ / |Im z|
 * (common practice). The check holds the first, sharper form; dist comes from the harness's
 * eigenvalues.
 */
export function resolventBound(settings: RunSettings): RandomisedIdentity<BoundCase> {
  return {
    id: 'identities/resolvent-bound',
    title: 'resolvent bound |⟨G(z)A⟩| ≤ ⟨A*A⟩^½/dist(z, spectrum) ≤ ‖A‖/|Im z|',
    needs: ['resolvent_trace'],
    arbitrary: fc.record({ matrix: matrixCaseArbitrary(settings), z: spectralPointArbitrary(), weight: weightSpecArbitrary() }),
    describe: (c) => `${describeMatrixCase(c.matrix)}; z = ${formatComplex(c.z)}; A = ${describeWeight(c.weight, c.matrix.size)}`,
    path: () => PATH,
    async evaluate(context, c) {
      const h = caseMatrix(context, c.matrix);
      const a = c.weight.kind === 'identity' ? undefined : weightMatrix(context, c.weight, c.matrix.size);
      const [g] = await checkedResolventTraces(context, h, [c.z], a);
      const spectrum = referenceSpectrum(eigenvalues(h));
      const bound = (a === undefined ? 1 : normalisedFrobeniusNorm(a)) / distanceToSpectrum(spectrum, c.z);
      return inequalityEvidence({
        observed: abs(g),
        bound,
        boundSource:
          '|⟨G(z)A⟩| ≤ ‖G(z)‖₂⟨A*A⟩^½ (Cauchy–Schwarz) with ‖G(z)‖₂ = 1/dist(z, spectrum) ≤ 1/|Im z| for Hermitian H (common practice)',
        violation: Math.max(0, abs(g) - bound),
        scale: resolventErrorScale(spectrum, c.z, a === undefined ? 1 : operatorNormBound(a)),
        toleranceReason:
          '(|⟨G(z)A⟩| − bound)₊ / s₁, s₁ = Nε‖A‖((‖H‖₂ + |z|)/d² + 1/d) the rounding-error scale of ⟨G(z)A⟩, which also covers the harness\'s ' +
          'error in d (relative Nε‖H‖₂/d); error-scales.ts',
      });
    },
  };
}
