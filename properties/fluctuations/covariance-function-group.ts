import { closedFormCovariance } from '../../adapters/closed-form-covariance.js';
import { NotAvailable, type ChainSpec } from '../../adapters/adapter.js';
import type { CheckContext, CheckFinding, CheckGroup } from '../../harness/check-group.js';
import { abs, formatComplex, sub, type Complex } from '../../harness/numeric/complex.js';
import { ensembleLabel, type EnsembleSpec } from '../../harness/numeric/ensemble.js';
import type { RunSettings } from '../../harness/run-settings.js';
import { ratioTest } from '../../harness/tolerance-test.js';
import { chainPairs, EMPTY_CHAIN, type ChainPair } from './covariance-function-cases.js';
import type { FluctuationGroupPlan } from './fluctuation-group.js';
import { monteCarloFindings, MONTE_CARLO_CHECKS, monteCarloSize } from './covariance-monte-carlo.js';
import { adjointChain } from './adjoint-chain.js';

/**
 * Tolerance of the deterministic comparisons, in units of ε times the natural size of the
 * covariance: a closed form evaluated in double precision is good to a few hundred ε even where
 * 1/(1 − m1m2)² amplifies rounding; 10⁷ ε (about 2·10⁻⁹ relative) also admits an implementation that
 * evaluates it by quadrature or a truncated series (common practice).
 */
const RATIO_THRESHOLD = 1e7;

const CLOSED_FORM_KINDS: ReadonlyArray<ChainPair['kind']> = ['tracial', 'weighted', 'identity-chain', 'chain-vs-weighted'];

const CLOSED_FORM_SOURCE: Record<string, string> = {
  tracial: 'the tracial covariance of Khorunzhy, Khoruzhenko and Pastur 1996 (J. Math. Phys. 37), reference-values/resolvent-covariance.ts',
  weighted: 'the weighted one-resolvent covariance (tracial part times ⟨A1⟩⟨A2⟩ plus the traceless part; THEORY.md), reference-values/resolvent-covariance.ts',
  'identity-chain': 'divided differences of the tracial covariance, G(z1)G(z2) = (G(z1) − G(z2))/(z1 − z2), reference-values/chain-covariance.ts',
  'chain-vs-weighted': '⟨A⟩ times the identity-chain covariance (the traceless part is asymptotically uncorrelated with tracial statistics; THEORY.md)',
};

type Answer = { readonly value: Complex } | { readonly missing: string };

async function ask(context: CheckContext, ensemble: EnsembleSpec, left: ChainSpec, right: ChainSpec): Promise<Answer> {
  try {
    return { value: await context.adapter.covariance!(ensemble, left, right) };
  } catch (error) {
    if (error instanceof NotAvailable) return { missing: error.message };
    throw error;
  }
}

/** √(E|X|² E|Y|²) from the closed forms: the size against which a covariance's error is judged. */
function naturalSize(ensemble: EnsembleSpec, left: ChainSpec, right: ChainSpec): number {
  const own = (c: ChainSpec) => abs(closedFormCovariance(ensemble, c, adjointChain(c)) ?? { re: 1, im: 0 });
  return Math.sqrt(own(left) * own(right));
}

interface Comparison {
  readonly observed: Complex;
  readonly expected: Complex;
  readonly scale: number;
  readonly input: string;
}

/** The worst of several comparisons as deterministic evidence, or a skip when none could be made. */
function worstFinding(comparisons: readonly Comparison[], missing: readonly string[], source: string, what: string): CheckFinding {
  if (comparisons.length === 0) return { state: 'skipped', reason: missing[0] ?? 'no case' };
  const ratio = (c: Comparison) => abs(sub(c.observed, c.expected)) / (c.scale * Number.EPSILON);
  const worst = comparisons.reduce((a, b) => (!(ratio(b) <= ratio(a)) ? b : a));
  return {
    state: 'measured',
    path: `statistic: implementation's covariance (${comparisons.length} cases${missing.length > 0 ? `, ${missing.length} not offered` : ''})`,
    evidence: ratioTest({
      observed: worst.observed,
      expected: worst.expected,
      expectedSource: source,
      scale: worst.scale * Number.EPSILON,
      threshold: RATIO_THRESHOLD,
      toleranceReason: `|observed − expected| / (ε √(E|X|²E|Y|²)), worst of ${comparisons.length} ${what}; 10⁷ admits evaluation by quadrature or series`,
      worstInput: worst.input,
    }),
  };
}

/**
 * Item 6: an implementation's covariance function, checked for symmetry under exchanging left and
 * right, the initial condition (the empty chain has covariance 0 with anything), agreement with the
 * closed forms of items 1–2, and, for chains with general weights, agreement with the harness's own
 * Monte Carlo estimate within its error bar.
 */
export function covarianceFunctionGroup(ensemble: EnsembleSpec, size: number, settings: RunSettings): FluctuationGroupPlan {
  const label = ensembleLabel(ensemble);
  const id = `fluctuations/covariance-function/${label}/N=${size}`;
  const { closedForm, general } = chainPairs(size);
  const planned = [
    { id: `${id}/symmetry`, title: 'covariance(E, L, R) = covariance(E, R, L)' },
    { id: `${id}/empty-chain`, title: 'covariance with the empty chain is 0 (its statistic is Tr I − E Tr I = 0)' },
    ...CLOSED_FORM_KINDS.map((kind) => ({ id: `${id}/closed-form/${kind}`, title: `agreement with the closed form: ${kind}` })),
    ...MONTE_CARLO_CHECKS.map((name, j) => ({
      id: `${id}/monte-carlo/${name}`,
      title: `general weights ${general[j].text}: agreement with the harness's Monte Carlo estimate at N = ${monteCarloSize(size)}`,
    })),
  ];
  return {
    statisticalChecks: MONTE_CARLO_CHECKS.length,
    group: (power): CheckGroup => ({
      id,
      suite: 'fluctuations',
      checks: planned.map((p) => ({ ...p, parameters: { ensemble: label, N: size } })),
      skipReason: (capabilities) => (capabilities.has('covariance') ? null : 'the implementation does not offer covariance'),
      async run(context): Promise<CheckFinding[]> {
        if (context.adapter.covariance === undefined) throw new NotAvailable('the adapter declares covariance but has no covariance method');
        const symmetric: Comparison[] = [];
        const empty: Comparison[] = [];
        const missing: string[] = [];
        const byKind = new Map<string, { comparisons: Comparison[]; missing: string[] }>(CLOSED_FORM_KINDS.map((k) => [k, { comparisons: [], missing: [] }]));
        for (const pair of [...closedForm, ...general]) {
          const forward = await ask(context, ensemble, pair.left, pair.right);
          const backward = await ask(context, ensemble, pair.right, pair.left);
          if (!('value' in forward) || !('value' in backward)) {
            missing.push('missing' in forward ? forward.missing : (backward as { missing: string }).missing);
            if (pair.kind !== 'general') byKind.get(pair.kind)!.missing.push('not offered');
            continue;
          }
          const scale = pair.kind === 'general' ? Math.max(abs(forward.value), 1e-300) : naturalSize(ensemble, pair.left, pair.right);
          symmetric.push({ observed: backward.value, expected: forward.value, scale, input: pair.text });
          if (pair.kind !== 'general') {
            const expected = closedFormCovariance(ensemble, pair.left, pair.right)!;
            byKind.get(pair.kind)!.comparisons.push({ observed: forward.value, expected, scale, input: `${pair.text} = ${formatComplex(forward.value)}` });
          }
          for (const [l, r] of [
            [EMPTY_CHAIN, pair.right],
            [pair.left, EMPTY_CHAIN],
          ]) {
            const answer = await ask(context, ensemble, l, r);
            if ('value' in answer) empty.push({ observed: answer.value, expected: { re: 0, im: 0 }, scale, input: l === EMPTY_CHAIN ? `(∅, ${pair.text})` : `(${pair.text}, ∅)` });
          }
        }
        return [
          worstFinding(symmetric, missing, 'the bilinear covariance is symmetric: Cov(X, Y) = Cov(Y, X)', 'pairs, both orders'),
          worstFinding(empty, missing, 'the empty chain has Tr I − E Tr I = 0, so its covariance with any statistic is 0', 'pairs with the empty chain'),
          ...CLOSED_FORM_KINDS.map((kind) => {
            const k = byKind.get(kind)!;
            return worstFinding(k.comparisons, k.missing.length > 0 ? [`the implementation does not offer the ${kind} covariance`] : [], CLOSED_FORM_SOURCE[kind], `${kind} cases`);
          }),
          ...(await monteCarloFindings(context, ensemble, size, power, (l, r) => ask(context, ensemble, l, r))),
        ];
      },
    }),
  };
}
