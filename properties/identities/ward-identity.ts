import fc from 'fast-check';
import type { Capability } from '../../adapters/adapter.js';
import type { CheckContext } from '../../harness/check-group.js';
import { conj, formatComplex, type Complex } from '../../harness/numeric/complex.js';
import { eigenvalues } from '../../harness/numeric/eigen.js';
import { identityMatrix, type SquareMatrix } from '../../harness/numeric/square-matrix.js';
import type { RunSettings } from '../../harness/run-settings.js';
import { ratioTest } from '../../harness/tolerance-test.js';
import { checkedResolventTraces } from './checked-resolvent-traces.js';
import { chainErrorScale, RATIO_THRESHOLD, referenceSpectrum, resolventErrorScale } from './error-scales.js';
import { caseMatrix, describeMatrixCase, matrixCaseArbitrary, type MatrixCase } from './matrix-case.js';
import type { RandomisedIdentity } from './randomised-identity-check.js';
import { spectralPointArbitrary } from './spectral-points.js';

/**
 * The Ward identity: for Hermitian H, G(z)* = G(z̄) and G(z)G(z)* = (G(z) − G(z̄))/(z − z̄), so
 *     ⟨G(z)G(z)*⟩ = ⟨G(z)G(z̄)⟩ = Im⟨G(z)⟩ / Im z
 * (common practice in random-matrix theory; it is the resolvent identity at z2 = z̄). The left
 * side is the chain ⟨G(z)·I·G(z̄)·I⟩ from chain_trace; the right side ⟨G(z)⟩ from resolvent_trace
 * when the implementation offers it, else from a chain of length one.
 */
export function wardIdentity(settings: RunSettings): RandomisedIdentity<{ readonly matrix: MatrixCase; readonly z: Complex }> {
  return {
    id: 'identities/ward-identity',
    title: 'Ward identity ⟨G(z)G(z)*⟩ = Im⟨G(z)⟩/Im z',
    needs: ['chain_trace'],
    arbitrary: fc.record({ matrix: matrixCaseArbitrary(settings), z: spectralPointArbitrary() }),
    describe: (c) => `${describeMatrixCase(c.matrix)}; z = ${formatComplex(c.z)}`,
    path: (capabilities) =>
      `matrices: harness sampler (per case); statistics: implementation's chain_trace (left side) and ${singleSource(capabilities)} (right side)`,
    async evaluate(context, c) {
      const n = c.matrix.size;
      const h = caseMatrix(context, c.matrix);
      const identity = identityMatrix('real', n);
      const left = await context.adapter.chainTrace(h, [c.z, conj(c.z)], [identity, identity]);
      const single = await singleTrace(context, h, c.z, identity);
      const spectrum = referenceSpectrum(eigenvalues(h));
      const eta = Math.abs(c.z.im);
      return ratioTest({
        observed: left,
        expected: { re: single.im / c.z.im, im: 0 },
        expectedSource: `Im⟨G(z)⟩/Im z from the implementation's ${singleSource(context.capabilities)}: the Ward identity (common practice)`,
        scale: chainErrorScale(spectrum, [c.z, conj(c.z)], [1, 1]) + resolventErrorScale(spectrum, c.z, 1) / eta,
        threshold: RATIO_THRESHOLD,
        toleranceReason:
          '|left − right| / (s₂ + s₁/|Im z|): s₂ the chain scale of ⟨G(z)G(z̄)⟩, s₁ = Nε((‖H‖₂ + |z|)/d² + 1/d) that of ⟨G(z)⟩, divided by |Im z| ' +
          'with it (error-scales.ts)',
      });
    },
  };
}

function singleSource(capabilities: ReadonlySet<Capability>): string {
  return capabilities.has('resolvent_trace') ? 'resolvent_trace' : 'chain_trace (one link)';
}

async function singleTrace(context: CheckContext, h: SquareMatrix, z: Complex, identity: SquareMatrix): Promise<Complex> {
  if (context.capabilities.has('resolvent_trace')) return (await checkedResolventTraces(context, h, [z]))[0];
  return context.adapter.chainTrace(h, [z], [identity]);
}
