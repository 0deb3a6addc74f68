import type { CheckFinding } from '../../harness/check-group.js';
import { ratioTest } from '../../harness/tolerance-test.js';
import type { Estimand } from './estimand.js';
import type { FluctuationCheck } from './fluctuation-check.js';
import type { WorstDeviation } from './fluctuation-tally.js';
import { Z_A } from './fluctuation-design.js';
import { independenceFinding } from './fluctuation-evidence.js';
import type { StatisticBook } from './statistic-book.js';

/** Consecutive samples must be independent: lag-1 autocorrelation of Re Tr G(Z_A) in sample order. */
export function independenceCheck(book: StatisticBook): FluctuationCheck {
  const x = book.resolvent(Z_A);
  const estimand: Estimand = { kind: 'autocorrelation', statistic: x };
  return {
    name: 'independence/lag-1',
    title: 'consecutive samples are independent: lag-1 autocorrelation of Re Tr G(Z_A) within the white-noise band',
    statistical: true,
    shows: x,
    estimands: [estimand],
    evaluate: (tally, power) => independenceFinding(tally, estimand, power),
  };
}

/** Relative tolerance of ⟨I⟩ = 1: a few ulps of any sensible way to return it. */
const EMPTY_CHAIN_TOLERANCE = 1e-12;

/**
 * The initial condition on the sample_statistics path: the empty chain's normalised trace is
 * ⟨I⟩ = 1 on every sample, so its Tr statistic is 0 and has no covariance. On the sampler path the
 * harness computes it, so there is nothing of the implementation to check.
 */
export function emptyChainCheck(book: StatisticBook): FluctuationCheck {
  const estimand: Estimand = { kind: 'worst-unit-deviation', statistic: book.empty(), size: book.size };
  return {
    name: 'initial-condition/empty-chain',
    title: 'empty chain: ⟨I⟩ = 1 on every sample (Tr statistic 0)',
    statistical: false,
    estimands: [estimand],
    evaluate: (tally): CheckFinding => {
      if (tally.origin !== 'sample_statistics') {
        return { state: 'skipped', reason: 'the harness computes the empty chain on the sampler path: nothing of the implementation to check' };
      }
      const worst = tally.state<WorstDeviation>(estimand);
      const worstAt = Math.max(0, worst.at);
      return {
        state: 'measured',
        path: tally.path,
        evidence: ratioTest({
          observed: { re: worst.value[0], im: worst.value[1] },
          expected: { re: 1, im: 0 },
          expectedSource: '⟨I⟩ = Tr I / N = 1 (the empty chain; issue item 6, initial condition)',
          scale: EMPTY_CHAIN_TOLERANCE,
          threshold: 1,
          toleranceReason: `|⟨I⟩ − 1| over ${EMPTY_CHAIN_TOLERANCE}, the worst sample`,
          worstInput: `sample ${worstAt}`,
        }),
      };
    },
  };
}
