import type { CheckFinding, PropertySuite } from '../../../../harness/check-group.js';
import { toleranceTest } from '../../../../harness/tolerance-test.js';
import { exactLinearStatisticVariance } from '../../../../reference-values/linear-statistic-variance.js';

const POWERS = [2, 3, 4] as const;

/**
 * Exact Var Tr H^p of GOE at size N. p = 2: Tr H² = Σ h_ii² + 2 Σ_{i<j} h_ij² with h_ii ~ N(0, 2/N),
 * h_ij ~ N(0, 1/N), so Var = N·2(2/N)² + (N(N−1)/2)·4·2(1/N)² = 4 + 4/N; p = 3, 4 from the
 * reference values.
 */
function goePowerVariance(p: 2 | 3 | 4, size: number): number {
  return p === 2 ? 4 + 4 / size : exactLinearStatisticVariance('goe', p, size);
}

/**
 * A small suite for the report tests: the variances of Tr H², Tr H³, Tr H⁴ over GOE matrices from
 * the implementation's sampler against their exact values, with the two exhibits the semicircle
 * suite does not attach: observed against predicted variances, and a normal quantile plot of the
 * standardised Tr H⁴. `label` goes into titles, parameters and exhibit labels, so a test can feed
 * markup through every string a suite hands to the reports.
 */
export function powerTraceSuite(size: number, count: number, label = 'GOE'): PropertySuite {
  const id = `power-traces/${label}/N=${size}`;
  return {
    name: 'power-traces',
    description: `Var Tr H^p of ${label} matrices against exact values (report tests only).`,
    plan: () => [
      {
        id,
        suite: 'power-traces',
        checks: POWERS.map((p) => ({ id: `${id}/p=${p}`, title: `Var Tr H^${p} of ${label}`, parameters: { ensemble: label, N: size, power: p, samples: count } })),
        skipReason: (capabilities) => (capabilities.has('sample') && capabilities.has('eigenvalues') ? null : 'needs a sampler and eigenvalues'),
        async run(context): Promise<CheckFinding[]> {
          const matrices = await context.adapter.sample({ kind: 'goe' }, size, context.derivedSeed(id, 0), count);
          const traces = POWERS.map(() => new Float64Array(matrices.length));
          for (const [m, matrix] of matrices.entries()) {
            for (const lambda of await context.adapter.eigenvalues(matrix)) {
              for (const [k, p] of POWERS.entries()) traces[k][m] += lambda ** p;
            }
          }
          const moments = traces.map((t) => {
            const mean = t.reduce((a, b) => a + b, 0) / t.length;
            const centred = Array.from(t, (x) => x - mean);
            const variance = centred.reduce((a, d) => a + d * d, 0) / (t.length - 1);
            const fourth = centred.reduce((a, d) => a + d ** 4, 0) / t.length;
            // se of a sample variance: √((μ₄ − σ⁴)/K), with the sample moments in place of μ₄, σ².
            return { centred, variance, standardError: Math.sqrt(Math.max(fourth - variance * variance, 0) / t.length) };
          });
          const points = POWERS.map((p, k) => ({ label: `Var Tr H^${p} (${label})`, observed: moments[k].variance, standardError: moments[k].standardError, predicted: goePowerVariance(p, size) }));
          const sd4 = Math.sqrt(moments[2].variance);
          return POWERS.map((p, k) => ({
            state: 'measured',
            path: `${count} matrices from the implementation's sampler, eigenvalues from the implementation`,
            ...(k === 0 ? { exhibit: { kind: 'observed-vs-predicted' as const, points, label: `variances of Tr H^p, ${label}, N = ${size}` } } : {}),
            ...(k === 2 ? { exhibit: { kind: 'normal-quantiles' as const, standardised: moments[2].centred.map((d) => d / sd4), label: `standardised Tr H^4, ${label}, N = ${size}` } } : {}),
            evidence: toleranceTest({
              observed: moments[k].variance,
              expected: points[k].predicted,
              expectedSource: p === 2 ? 'Var Tr H² = 4 + 4/N (Wick)' : 'exact Var Tr H^p (reference values)',
              standardError: moments[k].standardError,
              standardErrorMethod: 'fourth central sample moment',
              allowance: 0,
              allowanceReason: 'exact at this N',
              sampleCount: count,
            }),
          }));
        },
      },
    ],
  };
}
