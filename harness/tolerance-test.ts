import { twoSidedNormalTail } from './estimators/normal-tail.js';
import type { DeterministicEvidence, Quantity, StatisticalEvidence } from './evidence.js';

function components(q: Quantity): number[] {
  return typeof q === 'number' ? [q] : [q.re, q.im];
}

/** Relative size of the rounding allowance every statistical check gets. */
export const ROUNDING_ALLOWANCE = 1e-12;

export interface ToleranceTestInput {
  readonly observed: Quantity;
  readonly expected: Quantity;
  readonly expectedSource: string;
  readonly standardError: Quantity;
  readonly standardErrorMethod: string;
  readonly allowance: number;
  readonly allowanceReason: string;
  readonly sampleCount: number;
}

/**
 * The excess of |observed − expected| over the allowance, in standard errors, and its two-sided
 * normal p-value; for a complex quantity each component is tested and the smaller p-value is
 * doubled (Bonferroni), which is valid whatever the correlation of the two parts.
 * The normal approximation to the sampling distribution of a mean is the central limit theorem;
 * with the sample sizes used here (hundreds) it is common practice.
 */
export function toleranceTest(input: ToleranceTestInput): StatisticalEvidence {
  const obs = components(input.observed);
  const exp = components(input.expected);
  const se = components(input.standardError);
  // A statistic with no sampling variance (E⟨H²⟩ of a Rademacher matrix is the same for every
  // sample) would turn the last bits of rounding into infinitely many standard errors: allow a
  // relative ROUNDING_ALLOWANCE of the reference's size (sums of up to N² double-precision terms
  // stay far below it for N ≤ 10⁴; common practice).
  const scale = Math.max(...exp.map(Math.abs));
  const allowance = input.allowance + ROUNDING_ALLOWANCE * scale;
  let worstZ = 0;
  for (let c = 0; c < obs.length; c++) {
    const excess = Math.max(0, Math.abs(obs[c] - exp[c]) - allowance);
    const z = excess === 0 ? 0 : excess / se[c];
    worstZ = Number.isNaN(z) || Number.isNaN(worstZ) ? NaN : Math.max(worstZ, z);
  }
  const pValue = Number.isNaN(worstZ) ? NaN : Math.min(1, obs.length * twoSidedNormalTail(worstZ));
  return {
    kind: 'statistical',
    ...input,
    allowance,
    allowanceReason: `${input.allowanceReason}; plus ${ROUNDING_ALLOWANCE} relative for rounding`,
    zScore: worstZ,
    pValue,
  };
}

export interface RatioTestInput {
  readonly observed: Quantity;
  readonly expected: Quantity;
  readonly expectedSource: string;
  /** The error scale: |observed − expected| / scale is the ratio. */
  readonly scale: number;
  readonly threshold: number;
  readonly toleranceReason: string;
  readonly worstInput?: string;
}

/** |observed − expected| (modulus for complex) over the scale; NaN anywhere gives an infinite ratio. */
export function ratioTest(input: RatioTestInput): DeterministicEvidence {
  const obs = components(input.observed);
  const exp = components(input.expected);
  let sq = 0;
  for (let c = 0; c < obs.length; c++) sq += (obs[c] - exp[c]) ** 2;
  const raw = Math.sqrt(sq) / input.scale;
  const ratio = Number.isNaN(raw) ? Infinity : raw;
  const { scale: _scale, ...rest } = input;
  return { kind: 'deterministic', ...rest, ratio };
}
