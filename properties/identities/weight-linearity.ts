import fc from 'fast-check';
import { abs, add, formatComplex, mul, type Complex } from '../../harness/numeric/complex.js';
import { eigenvalues } from '../../harness/numeric/eigen.js';
import type { RunSettings } from '../../harness/run-settings.js';
import { ratioTest } from '../../harness/tolerance-test.js';
import { checkedResolventTraces } from './checked-resolvent-traces.js';
import { RATIO_THRESHOLD, referenceSpectrum, resolventErrorScale } from './error-scales.js';
import { caseMatrix, describeMatrixCase, matrixCaseArbitrary, type MatrixCase } from './matrix-case.js';
import type { RandomisedIdentity } from './randomised-identity-check.js';
import { milliGrid, spectralPointArbitrary } from './spectral-points.js';
import { linearCombination } from './weight-algebra.js';
import { describeWeight, weightMatrix, weightSpecArbitrary, type WeightSpec } from './weight-matrices.js';
import { operatorNormBound } from './weight-norms.js';

interface LinearityCase {
  readonly matrix: MatrixCase;
  readonly z: Complex;
  readonly alpha: Complex;
  readonly beta: Complex;
  readonly a: WeightSpec;
  readonly b: WeightSpec;
}

/** α, β with real and imaginary parts in [−2, 2] on a grid of step 10⁻³. */
const coefficient = fc.record({ re: milliGrid(-2, 2), im: milliGrid(-2, 2) });

/**
 * Linearity of the trace in the weight: ⟨G(z)(αA + βB)⟩ = α⟨G(z)A⟩ + β⟨G(z)B⟩ for complex α, β
 * (linearity of the trace; common practice). The combination is passed as one complex weight, so
 * an implementation that ignores the weight, or mishandles a complex one, fails.
 */
export function weightLinearity(settings: RunSettings): RandomisedIdentity<LinearityCase> {
  return {
    id: 'identities/weight-linearity',
    title: 'linearity in the weight: ⟨G(z)(αA + βB)⟩ = α⟨G(z)A⟩ + β⟨G(z)B⟩',
    needs: ['resolvent_trace'],
    arbitrary: fc
      .record({
        matrix: matrixCaseArbitrary(settings),
        z: spectralPointArbitrary(),
        alpha: coefficient,
        beta: coefficient,
        a: weightSpecArbitrary(),
        b: weightSpecArbitrary(),
      })
      // α = β = 0 would make the combination the zero matrix, whose trace has no rounding scale.
      .filter((c) => !isZero(c.alpha) || !isZero(c.beta)),
    describe: (c) =>
      `${describeMatrixCase(c.matrix)}; z = ${formatComplex(c.z)}; α = ${formatComplex(c.alpha)}, A = ${describeWeight(c.a, c.matrix.size)}; ` +
      `β = ${formatComplex(c.beta)}, B = ${describeWeight(c.b, c.matrix.size)}`,
    path: () => "matrices: harness sampler (per case); statistic: implementation's resolvent_trace with three weights",
    async evaluate(context, c) {
      const n = c.matrix.size;
      const h = caseMatrix(context, c.matrix);
      const a = weightMatrix(context, c.a, n);
      const b = weightMatrix(context, c.b, n);
      const combined = linearCombination(c.alpha, a, c.beta, b);
      const [tCombined] = await checkedResolventTraces(context, h, [c.z], combined);
      const [tA] = await checkedResolventTraces(context, h, [c.z], a);
      const [tB] = await checkedResolventTraces(context, h, [c.z], b);
      const spectrum = referenceSpectrum(eigenvalues(h));
      return ratioTest({
        observed: tCombined,
        expected: add(mul(c.alpha, tA), mul(c.beta, tB)),
        expectedSource: "α⟨G(z)A⟩ + β⟨G(z)B⟩ from the implementation's resolvent_trace (linearity of the trace)",
        scale:
          resolventErrorScale(spectrum, c.z, operatorNormBound(combined)) +
          abs(c.alpha) * resolventErrorScale(spectrum, c.z, operatorNormBound(a)) +
          abs(c.beta) * resolventErrorScale(spectrum, c.z, operatorNormBound(b)),
        threshold: RATIO_THRESHOLD,
        toleranceReason:
          '|left − right| / (s₁(αA + βB) + |α|s₁(A) + |β|s₁(B)), s₁ = Nε‖W‖((‖H‖₂ + |z|)/d² + 1/d) for each weight W (error-scales.ts)',
      });
    },
  };
}

function isZero(x: Complex): boolean {
  return x.re === 0 && x.im === 0;
}
