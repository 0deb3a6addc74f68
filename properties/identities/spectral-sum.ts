import fc from 'fast-check';
import { abs, add, inv, sub, type Complex } from '../../harness/numeric/complex.js';
import { eigenvalues } from '../../harness/numeric/eigen.js';
import type { RunSettings } from '../../harness/run-settings.js';
import { ratioTest } from '../../harness/tolerance-test.js';
import { checkedResolventTraces } from './checked-resolvent-traces.js';
import { RATIO_THRESHOLD, referenceSpectrum, resolventErrorScale } from './error-scales.js';
import { caseMatrix, describeMatrixCase, matrixCaseArbitrary, type MatrixCase } from './matrix-case.js';
import type { RandomisedIdentity } from './randomised-identity-check.js';
import { describePoints, spectralPointArbitrary } from './spectral-points.js';

interface SpectralSumCase {
  readonly matrix: MatrixCase;
  readonly points: readonly Complex[];
}

/**
 * The trace as a spectral sum: ⟨G(z)⟩ = (1/N) Σ_i 1/(λ_i − z) (spectral theorem; common
 * practice), with the λ_i the implementation's own eigenvalues and N the matrix size (not the
 * number of values returned). It ties the implementation's resolvent_trace to its eigenvalues, so
 * a trace normalised by the wrong N, or a spectrum missing or repeating a value, shows.
 */
export function spectralSum(settings: RunSettings): RandomisedIdentity<SpectralSumCase> {
  return {
    id: 'identities/spectral-sum',
    title: "⟨G(z)⟩ = (1/N)Σ 1/(λ_i − z) over the implementation's own eigenvalues",
    needs: ['resolvent_trace', 'eigenvalues'],
    arbitrary: fc.record({ matrix: matrixCaseArbitrary(settings), points: fc.array(spectralPointArbitrary(), { minLength: 1, maxLength: 3 }) }),
    describe: (c) => `${describeMatrixCase(c.matrix)}; z = ${describePoints(c.points)}`,
    path: () => "matrices: harness sampler (per case); statistics: implementation's resolvent_trace and eigenvalues",
    async evaluate(context, c) {
      const n = c.matrix.size;
      const h = caseMatrix(context, c.matrix);
      const traces = await checkedResolventTraces(context, h, c.points);
      const values = await context.adapter.eigenvalues(h);
      const spectrum = referenceSpectrum(eigenvalues(h));
      const sums = c.points.map((z) => {
        let s: Complex = { re: 0, im: 0 };
        for (const v of values) s = add(s, inv({ re: v - z.re, im: -z.im }));
        return { re: s.re / n, im: s.im / n };
      });
      const ratios = c.points.map((z, j) => abs(sub(traces[j], sums[j])) / resolventErrorScale(spectrum, z, 1));
      let j = 0;
      ratios.forEach((r, k) => {
        if (!(r <= ratios[j])) j = k;
      });
      return ratioTest({
        observed: traces[j],
        expected: sums[j],
        expectedSource: `(1/N)Σ_i 1/(λ_i − z) at z = ${describePoints([c.points[j]])} over the implementation's eigenvalues (spectral theorem)`,
        scale: 2 * resolventErrorScale(spectrum, c.points[j], 1),
        threshold: RATIO_THRESHOLD,
        toleranceReason:
          '|Δ| / (2 s₁), s₁ = Nε((‖H‖₂ + |z|)/d² + 1/d): eigenvalues within Nε‖H‖₂ move the sum by at most that (error-scales.ts); 2 for the two routines',
      });
    },
  };
}
