import type { ChainSpec } from '../../adapters/adapter.js';
import type { CheckContext, CheckFinding } from '../../harness/check-group.js';
import { bilinearCovariance } from '../../harness/estimators/bilinear-covariance.js';
import { chainStatistics } from '../../harness/numeric/chain-statistics.js';
import type { Complex } from '../../harness/numeric/complex.js';
import { ensembleConstants, ensembleLabel, type EnsembleSpec } from '../../harness/numeric/ensemble.js';
import { sampleMatrix } from '../../harness/numeric/sample-wigner.js';
import { toleranceTest } from '../../harness/tolerance-test.js';
import { chainPairs } from './covariance-function-cases.js';
import { finiteSizeAllowance } from './covariance-check.js';
import { detectableRelativeError, type PowerContext } from './detection-power.js';
import { WEIGHTED_COVARIANCE_CONSTANT } from './fluctuation-allowances.js';
import { meanSquare } from './fluctuation-evidence.js';

/** The two Monte Carlo checks, in the order of chainPairs(…).general. */
export const MONTE_CARLO_CHECKS: readonly string[] = ['one-weight', 'two-weights'];

/** Samples of the harness's own estimate at budget 1 (eigenvectors and V*AV per weight per sample). */
const MONTE_CARLO_SAMPLES = 400;

/** The size of the Monte Carlo estimate: N, at most 100 (eigenvectors and two N³ products per sample). */
export function monteCarloSize(size: number): number {
  return Math.min(size, 100);
}

type Answer = { readonly value: Complex } | { readonly missing: string };

/**
 * For chains with no closed form here, the implementation's claimed covariance against the
 * harness's own estimate: the harness's sampler and engine at N_mc, K samples, bilinear covariance
 * with its delta-method error, and the finite-N allowance of the weighted covariances (C/N_mc, the
 * weighted chains' O(1/N) corrections; THEORY.md: GOE chains O(1/N)). Pairs the implementation does
 * not offer are skipped without sampling.
 */
export async function monteCarloFindings(
  context: CheckContext,
  ensemble: EnsembleSpec,
  size: number,
  power: PowerContext,
  ask: (left: ChainSpec, right: ChainSpec) => Promise<Answer>,
): Promise<CheckFinding[]> {
  const n = monteCarloSize(size);
  const pairs = chainPairs(n).general;
  const answers = await Promise.all(pairs.map((p) => ask(p.left, p.right)));
  const offered = pairs.map((_, j) => j).filter((j) => 'value' in answers[j]);
  if (offered.length === 0) return answers.map((a) => ({ state: 'skipped', reason: (a as { missing: string }).missing }));
  const chains = offered.flatMap((j) => [pairs[j].left, pairs[j].right]);
  const count = Math.max(50, Math.round(MONTE_CARLO_SAMPLES * context.settings.budget));
  const columns = chains.map(() => new Float64Array(2 * count));
  const key = `fluctuations/covariance-function/${ensembleLabel(ensemble)}/N=${n}/monte-carlo`;
  for (let k = 0; k < count; k++) {
    const values = chainStatistics(sampleMatrix(ensemble, n, context.stream(key, k)), chains);
    values.forEach((v, c) => {
      columns[c][2 * k] = n * v.re;
      columns[c][2 * k + 1] = n * v.im;
    });
  }
  return answers.map((answer, j): CheckFinding => {
    if (!('value' in answer)) return { state: 'skipped', reason: answer.missing };
    const at = 2 * offered.indexOf(j);
    const estimate = bilinearCovariance(columns[at], columns[at + 1]);
    const scale = Math.sqrt(meanSquare(columns[at]) * meanSquare(columns[at + 1]));
    const allowance = finiteSizeAllowance(WEIGHTED_COVARIANCE_CONSTANT, ensembleConstants(ensemble, n), n);
    const evidence = toleranceTest({
      observed: estimate.estimate,
      expected: answer.value,
      expectedSource: `the implementation's claimed limiting covariance for ${pairs[j].text}`,
      standardError: estimate.standardError,
      standardErrorMethod: `harness's Monte Carlo (its sampler and engine, N = ${n}, K = ${count}): delta method, standard deviation of the centred products over √K, per component`,
      allowance: allowance.factor * scale,
      allowanceReason: `${allowance.reason} (as for weighted resolvents; THEORY.md: GOE chains O(1/N)), at N = ${n}, relative to √(E|X|²E|Y|²)`,
      sampleCount: count,
    });
    return {
      state: 'measured',
      path: `statistic: implementation's covariance; estimate: harness sampler and reference engine (N = ${n}, ${count} samples)`,
      evidence: { ...evidence, detectableRelativeError: detectableRelativeError(evidence.allowance, estimate.standardError, scale, power) },
    };
  });
}
