import type { Decimal } from 'decimal.js';
import type { DecimalConstructor } from './decimal-complex.js';

/** B_0 … B_n as exact fractions [numerator, denominator], from Σ_{j=0}^{m} binom(m + 1, j) B_j = 0. */
function bernoulliNumbers(n: number): [bigint, bigint][] {
  const gcd = (a: bigint, b: bigint): bigint => (b === 0n ? (a < 0n ? -a : a) : gcd(b, a % b));
  const numbers: [bigint, bigint][] = [[1n, 1n]];
  for (let m = 1; m <= n; m++) {
    let num = 0n;
    let den = 1n;
    let binomial = 1n; // binom(m + 1, j)
    for (let j = 0; j < m; j++) {
      const [p, q] = numbers[j];
      num = num * q + binomial * p * den;
      den *= q;
      const g = gcd(num, den);
      num /= g;
      den /= g;
      binomial = (binomial * BigInt(m + 1 - j)) / BigInt(j + 1);
    }
    // binomial is now binom(m + 1, m) = m + 1: B_m = −(Σ_{j<m} …)/(m + 1)
    const g = gcd(num, den * binomial);
    numbers.push([-num / g, (den * binomial) / g]);
  }
  return numbers;
}

/**
 * Γ(z) for real z > 0 in decimal arithmetic at the constructor's precision (up to about 60 digits).
 *
 * Method: shift to w = z + 40 with Γ(z) = Γ(w)/(z(z + 1)⋯(z + 39)) and sum the Stirling series
 * ln Γ(w) = (w − ½) ln w − w + ½ ln(2π) + Σ_{j=1}^{30} B_{2j}/(2j(2j − 1) w^{2j−1}) (DLMF 5.11.1); the
 * first omitted term is below 1e-64 for w ≥ 40. Bernoulli numbers exact, from their recurrence.
 */
export function gammaDecimal(D: DecimalConstructor, z: Decimal.Value): Decimal {
  const x = new D(z);
  if (!x.isFinite() || x.lte(0)) throw new RangeError(`gammaDecimal: z must be positive, got ${x.toString()}`);
  if (D.precision > 60) throw new RangeError('gammaDecimal: at most 60 digits (the series is cut for that)');
  const shift = 40;
  const w = x.plus(shift);
  const bernoulli = bernoulliNumbers(60);
  let series = w.minus(0.5).times(w.ln()).minus(w).plus(D.acos(-1).times(2).ln().div(2));
  let power = w;
  const wSquared = w.times(w);
  for (let j = 1; j <= 30; j++) {
    const [p, q] = bernoulli[2 * j];
    series = series.plus(new D(p.toString()).div(new D(q.toString()).times(2 * j * (2 * j - 1)).times(power)));
    power = power.times(wSquared);
  }
  let product = new D(1);
  for (let j = 0; j < shift; j++) product = product.times(x.plus(j));
  return series.exp().div(product);
}
