import fc from 'fast-check';
import { eigenvalues } from '../../harness/numeric/eigen.js';
import type { RunSettings } from '../../harness/run-settings.js';
import { ratioTest } from '../../harness/tolerance-test.js';
import { chainLinksArbitrary, describeLinks, type ChainLink } from './chain-links.js';
import { chainErrorScale, RATIO_THRESHOLD, referenceSpectrum } from './error-scales.js';
import { caseMatrix, describeMatrixCase, matrixCaseArbitrary, type MatrixCase } from './matrix-case.js';
import type { RandomisedIdentity } from './randomised-identity-check.js';
import { weightMatrix } from './weight-matrices.js';
import { operatorNormBound } from './weight-norms.js';

interface CyclicityCase {
  readonly matrix: MatrixCase;
  readonly links: readonly ChainLink[];
  /** The rotated chain starts at link `shift` (1 ≤ shift < k, taken mod k). */
  readonly shift: number;
}

/**
 * Cyclicity of the trace, Tr(XY) = Tr(YX): rotating the pairs (z_j, A_j) of a chain leaves
 *     ⟨G(z1)A1 G(z2)A2 ⋯ G(zk)Ak⟩ = ⟨G(z_{s+1})A_{s+1} ⋯ G(zk)Ak G(z1)A1 ⋯ G(z_s)A_s⟩
 * unchanged (common practice). Both sides from chain_trace; an implementation that multiplies the
 * factors out of order, or treats the first or last link specially, fails.
 */
export function chainCyclicity(settings: RunSettings): RandomisedIdentity<CyclicityCase> {
  return {
    id: 'identities/chain-cyclicity',
    title: 'cyclicity of chain traces under rotation of the (z_j, A_j) pairs',
    needs: ['chain_trace'],
    arbitrary: fc.record({ matrix: matrixCaseArbitrary(settings), links: chainLinksArbitrary(2, 4), shift: fc.integer({ min: 1, max: 3 }) }),
    describe: (c) => `${describeMatrixCase(c.matrix)}; chain ${describeLinks(c.links, c.matrix.size)}; rotated to start at link ${effectiveShift(c) + 1}`,
    path: () => "matrices: harness sampler (per case); statistic: implementation's chain_trace, the chain and its rotation",
    async evaluate(context, c) {
      const n = c.matrix.size;
      const h = caseMatrix(context, c.matrix);
      const weights = c.links.map((l) => weightMatrix(context, l.weight, n));
      const points = c.links.map((l) => l.z);
      const s = effectiveShift(c);
      const rotate = <T>(xs: readonly T[]): T[] => [...xs.slice(s), ...xs.slice(0, s)];
      const original = await context.adapter.chainTrace(h, points, weights);
      const rotated = await context.adapter.chainTrace(h, rotate(points), rotate(weights));
      const spectrum = referenceSpectrum(eigenvalues(h));
      return ratioTest({
        observed: rotated,
        expected: original,
        expectedSource: "the unrotated chain from the implementation's chain_trace (cyclicity of the trace)",
        scale: 2 * chainErrorScale(spectrum, points, weights.map(operatorNormBound)),
        threshold: RATIO_THRESHOLD,
        toleranceReason: '|rotated − original| / (2 s_k), s_k = Nε Π_j(‖A_j‖/d_j) Σ_j((‖H‖₂ + |z_j|)/d_j + 1) for each (error-scales.ts)',
      });
    },
  };
}

/** A shift in [1, k − 1]: rotating by 0 or k would compare the chain with itself. */
function effectiveShift(c: CyclicityCase): number {
  return 1 + ((c.shift - 1) % (c.links.length - 1));
}
