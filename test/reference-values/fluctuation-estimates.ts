import { expect } from 'vitest';
import { type Complex, abs, complex, sub } from '../../harness/numeric/complex.js';
import type { EnsembleSpec } from '../../harness/numeric/ensemble.js';
import { upperNormalQuantile } from '../../harness/estimators/normal-tail.js';
import { randomStream } from '../../harness/numeric/random-stream.js';
import { sampleMatrix } from '../../harness/numeric/sample-wigner.js';
import type { SquareMatrix } from '../../harness/numeric/square-matrix.js';

/**
 * Estimators and the agreement test shared by the simulation tests of the fluctuation reference
 * values (resolvent, chain, linear-statistic, mesoscopic covariances and the Wick rule).
 *
 * Estimator: the bilinear sample covariance Ĉ = (1/(n − 1)) Σ_s (X_s − X̄)(Y_s − Ȳ). Its standard
 * error, for the real and imaginary parts separately, is the sample standard deviation of the
 * products P_s = (X_s − X̄)(Y_s − Ȳ) over √n: the delta method for the covariance of i.i.d. pairs,
 * whose asymptotic variance is Var((X − μ_X)(Y − μ_Y)) (common practice; e.g. A. W. van der Vaart,
 * 1998, Asymptotic Statistics, Cambridge University Press, Example 3.2 for the sample variance;
 * from memory).
 *
 * Test: with bias allowance b (the known finite-N deviation of the quantity from its limit, stated
 * at each use), the reference value r passes when |Ĉ − r| ≤ b + z·SE for each real component,
 * z = z_{α/2} with α the false-alarm level per component (Bonferroni over the components of a test
 * file, family level stated in each file). Under H0 (|E Ĉ − r| ≤ b) and the normal approximation the
 * probability of a false alarm is at most α per component. Seeds are fixed, so the outcome is
 * reproducible.
 */

export interface Estimate {
  readonly value: Complex;
  /** Standard errors of the real and imaginary parts. */
  readonly standardError: Complex;
}

function mean(x: readonly Complex[]): Complex {
  let re = 0;
  let im = 0;
  for (const v of x) {
    re += v.re;
    im += v.im;
  }
  return complex(re / x.length, im / x.length);
}

/** Bilinear sample covariance of paired complex samples, with the delta-method standard errors. */
export function covarianceEstimate(x: readonly Complex[], y: readonly Complex[]): Estimate {
  const n = x.length;
  if (n < 3 || y.length !== n) throw new RangeError('covarianceEstimate: paired samples of length ≥ 3 needed');
  const mx = mean(x);
  const my = mean(y);
  const pr = new Float64Array(n);
  const pi = new Float64Array(n);
  for (let s = 0; s < n; s++) {
    const ar = x[s].re - mx.re;
    const ai = x[s].im - mx.im;
    const br = y[s].re - my.re;
    const bi = y[s].im - my.im;
    pr[s] = ar * br - ai * bi;
    pi[s] = ar * bi + ai * br;
  }
  const spread = (p: Float64Array): { sum: number; se: number } => {
    let sum = 0;
    for (const v of p) sum += v;
    const m = sum / n;
    let ss = 0;
    for (const v of p) ss += (v - m) ** 2;
    return { sum, se: Math.sqrt(ss / (n - 1) / n) };
  };
  const r = spread(pr);
  const i = spread(pi);
  return { value: complex(r.sum / (n - 1), i.sum / (n - 1)), standardError: complex(r.se, i.se) };
}

/** Sample variance of real observations with its delta-method standard error (imaginary parts 0). */
export function varianceEstimate(x: ArrayLike<number>): Estimate {
  const values = Array.from(x, (v) => complex(v, 0));
  return covarianceEstimate(values, values);
}

/** z_{α/2}: the two-sided critical value for a false-alarm level α per component. */
export function criticalValue(alpha: number): number {
  return upperNormalQuantile(alpha / 2);
}

/** |observed − reference| in units of the standard error, per component (NaN where the SE is 0). */
export function standardScores(e: Estimate, reference: Complex): Complex {
  return complex((e.value.re - reference.re) / e.standardError.re, (e.value.im - reference.im) / e.standardError.im);
}

function componentPasses(observed: number, reference: number, se: number, allowance: number, z: number): boolean {
  return Math.abs(observed - reference) <= allowance + z * se;
}

/** Whether both components agree within allowance + z·SE. */
export function agrees(e: Estimate, reference: Complex, allowance: number, z: number): boolean {
  return (
    componentPasses(e.value.re, reference.re, e.standardError.re, allowance, z) &&
    componentPasses(e.value.im, reference.im, e.standardError.im, allowance, z)
  );
}

function describe(label: string, e: Estimate, reference: Complex, allowance: number, z: number): string {
  const s = standardScores(e, reference);
  return (
    `${label}: observed ${e.value.re} ${e.value.im >= 0 ? '+' : '-'} ${Math.abs(e.value.im)}i ` +
    `(SE ${e.standardError.re}, ${e.standardError.im}), reference ${reference.re} ${reference.im >= 0 ? '+' : '-'} ${Math.abs(reference.im)}i, ` +
    `scores (${s.re.toFixed(2)}, ${s.im.toFixed(2)}) SE, allowance ${allowance}, critical value ${z.toFixed(3)}`
  );
}

/** Fails with a replayable message unless the estimate agrees with the reference (see the module note). */
export function expectAgreement(label: string, e: Estimate, reference: Complex, allowance: number, z: number): void {
  if (!agrees(e, reference, allowance, z)) expect.fail(`disagreement — ${describe(label, e, reference, allowance, z)}`);
}

/** Fails unless the estimate is rejected against a wrong reference (power: a formula missing a term must fail). */
export function expectRejection(label: string, e: Estimate, wrong: Complex, allowance: number, z: number): void {
  if (agrees(e, wrong, allowance, z)) expect.fail(`a wrong reference was not rejected — ${describe(label, e, wrong, allowance, z)}`);
}

/** n matrices of `spec` at size N from streams (seed, key, 0 … n − 1), each passed to `visit`. */
export function forEachSample(spec: EnsembleSpec, N: number, n: number, seed: number, key: string, visit: (h: SquareMatrix, s: number) => void): void {
  for (let s = 0; s < n; s++) visit(sampleMatrix(spec, N, randomStream(seed, key, s)), s);
}

/** Deterministic comparison of real numbers: fails with input, observed, expected, difference and tolerance. */
export function expectNear(label: string, observed: number, expected: number, tolerance: number): void {
  const diff = Math.abs(observed - expected);
  if (!(diff <= tolerance)) expect.fail(`${label}: observed ${observed}, expected ${expected}, |diff| ${diff} > ${tolerance}`);
}

/** Deterministic comparison of complex numbers in modulus (see `expectNear`). */
export function expectClose(label: string, observed: Complex, expected: Complex, tolerance: number): void {
  const diff = abs(sub(observed, expected));
  if (!(diff <= tolerance)) expect.fail(`${label}: observed ${observed.re}+${observed.im}i, expected ${expected.re}+${expected.im}i, |diff| ${diff} > ${tolerance}`);
}
