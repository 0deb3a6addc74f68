import { expect } from 'vitest';

/**
 * Shared pieces of the streaming-estimator tests: running a sample sequence through a mergeable
 * state in consecutive blocks, the raw bits of a state, and the spread of z-scores.
 */

/** How a test drives one streaming estimator over samples 0 … count − 1. */
export interface StreamingDriver<State> {
  readonly empty: () => State;
  readonly observe: (state: State, sample: number) => void;
  readonly combine: (left: State, right: State) => State;
}

/**
 * The state of samples [0, count) observed block by block, the blocks split at `cuts` (increasing,
 * 0 and count allowed, so empty blocks occur), each block in a fresh state, folded left in block
 * order as a run over workers would combine them.
 */
export function foldInBlocks<State>(driver: StreamingDriver<State>, count: number, cuts: readonly number[]): State {
  const bounds = [0, ...cuts, count];
  let total: State | undefined;
  for (let b = 0; b + 1 < bounds.length; b++) {
    const block = driver.empty();
    for (let k = bounds[b]; k < bounds[b + 1]; k++) driver.observe(block, k);
    total = total === undefined ? block : driver.combine(total, block);
  }
  return total as State;
}

/** The IEEE-754 bits of every number in a plain-data state (numbers and Float64Arrays, nested), in order. */
export function stateBits(state: unknown): string[] {
  const out: string[] = [];
  const visit = (value: unknown): void => {
    if (typeof value === 'number') out.push(bitsOf(value));
    else if (value instanceof Float64Array) value.forEach((v) => out.push(bitsOf(v)));
    else if (value !== null && typeof value === 'object') for (const key of Object.keys(value).sort()) visit((value as Record<string, unknown>)[key]);
  };
  visit(state);
  return out;
}

function bitsOf(x: number): string {
  return new BigUint64Array(Float64Array.of(x).buffer)[0].toString(16);
}

/** Sample mean and standard deviation (n − 1) of a list of z-scores. */
export function meanAndSpread(values: readonly number[]): { readonly mean: number; readonly spread: number } {
  const mean = values.reduce((a, b) => a + b, 0) / values.length;
  const spread = Math.sqrt(values.reduce((a, b) => a + (b - mean) ** 2, 0) / (values.length - 1));
  return { mean, spread };
}

/**
 * z-scores (estimate − truth)/SE over independent replications must look standard normal: mean
 * within 4/√R of 0 (0.28 for R = 200) and spread in [0.8, 1.25] (the spread of 200 unit normals is
 * 1 ± 0.05, one standard error, plus the estimator's O(1/K) error in the SE).
 */
export function expectCalibrated(z: readonly number[]): void {
  const { mean, spread } = meanAndSpread(z);
  expect(Math.abs(mean)).toBeLessThan(4 / Math.sqrt(z.length));
  expect(spread).toBeGreaterThan(0.8);
  expect(spread).toBeLessThan(1.25);
}
