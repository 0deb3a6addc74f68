import { expect } from 'vitest';

/**
 * Shared assertions for the statistical tests of the random streams and ensemble samplers.
 *
 * Every check is a two-sided z-test: |observed − expected| ≤ Z_LIMIT · standardError. With
 * Z_LIMIT = 4.5 one comparison raises a false alarm with probability 2(1 − Φ(4.5)) ≈ 6.8·10⁻⁶
 * (normal tail, common practice), so even a few hundred comparisons together stay below 10⁻³.
 * The tests run at fixed seeds, so a pass is reproducible; the level says how unlucky a seed
 * would have to be for a correct generator to fail.
 */
export const Z_LIMIT = 4.5;

export function expectWithinStandardErrors(
  label: string,
  observed: number,
  expected: number,
  standardError: number,
  limit: number = Z_LIMIT,
): void {
  const z = (observed - expected) / standardError;
  const message = `${label}: observed ${observed}, expected ${expected}, difference ${observed - expected}, standard error ${standardError}, z = ${z} (limit ±${limit})`;
  expect(Number.isFinite(z), message).toBe(true);
  expect(Math.abs(z), message).toBeLessThanOrEqual(limit);
}

/** Sample mean and the standard error of the mean (from the sample variance, n − 1 divisor). */
export function meanAndStandardError(values: ArrayLike<number>): { mean: number; standardError: number } {
  const n = values.length;
  let sum = 0;
  for (let k = 0; k < n; k++) sum += values[k];
  const mean = sum / n;
  let ss = 0;
  for (let k = 0; k < n; k++) ss += (values[k] - mean) ** 2;
  return { mean, standardError: Math.sqrt(ss / (n - 1) / n) };
}

/** Pearson correlation coefficient of two equally long samples. */
export function pearsonCorrelation(x: ArrayLike<number>, y: ArrayLike<number>): number {
  const n = x.length;
  let mx = 0;
  let my = 0;
  for (let k = 0; k < n; k++) {
    mx += x[k];
    my += y[k];
  }
  mx /= n;
  my /= n;
  let sxy = 0;
  let sxx = 0;
  let syy = 0;
  for (let k = 0; k < n; k++) {
    sxy += (x[k] - mx) * (y[k] - my);
    sxx += (x[k] - mx) ** 2;
    syy += (y[k] - my) ** 2;
  }
  return sxy / Math.sqrt(sxx * syy);
}

/**
 * Survival function P(χ²_ν > x) for even ν = 2m, exact: the chi-square law with 2m degrees of
 * freedom is the Gamma(m, 2) law, whose tail is the Poisson(x/2) distribution function at m − 1,
 * e^{−x/2} Σ_{k<m} (x/2)^k / k! (M. Abramowitz and I. A. Stegun, Handbook of Mathematical
 * Functions, 1964, 26.4.21; equation number from memory).
 */
export function chiSquareSurvivalEven(x: number, degreesOfFreedom: number): number {
  if (degreesOfFreedom % 2 !== 0 || degreesOfFreedom <= 0) throw new RangeError('even degrees of freedom only');
  const half = x / 2;
  // Sum in log space to avoid overflow of e^{x/2}: term_k = exp(−half + k log half − log k!).
  let logTerm = -half;
  let sum = Math.exp(logTerm);
  for (let k = 1; k < degreesOfFreedom / 2; k++) {
    logTerm += Math.log(half) - Math.log(k);
    sum += Math.exp(logTerm);
  }
  return Math.min(1, sum);
}

/** Pearson's chi-square statistic Σ (O − E)²/E for counts against equal expected counts. */
export function chiSquareEqualCells(counts: ArrayLike<number>): number {
  let total = 0;
  for (let k = 0; k < counts.length; k++) total += counts[k];
  const expected = total / counts.length;
  let chi2 = 0;
  for (let k = 0; k < counts.length; k++) chi2 += (counts[k] - expected) ** 2 / expected;
  return chi2;
}
