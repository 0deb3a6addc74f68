import type { Decimal } from 'decimal.js';
import type { DecimalConstructor } from '../high-precision/decimal-complex.js';
import { besselIDecimal } from '../high-precision/bessel-i-decimal.js';

/**
 * The standard test functions of the linear-statistic checks and their Chebyshev coefficients on
 * [−2, 2] in the convention of chebyshev.ts, f(x) = Σ_k c_k T_k(x/2), c_k = (2/π)∫_0^π f(2cosθ)cos kθ dθ
 * (k ≥ 1), c_0 = (1/π)∫_0^π f(2cosθ) dθ, all in closed form:
 * - x^p, p = 1 … 8: (2cosθ)^p = Σ_j binom(p, j) e^{i(p−2j)θ} (binomial theorem), so c_k = 2·binom(p, (p − k)/2)
 *   for 1 ≤ k ≤ p with k ≡ p (mod 2), c_0 = binom(p, p/2) for even p, all others 0 (exact integers);
 * - e^x: e^{2cosθ} = I_0(2) + 2Σ_k I_k(2) cos kθ (DLMF 10.35.1, equation number from memory), so c_0 = I_0(2), c_k = 2I_k(2);
 * - the Gaussian bump e^{−x²/2} (THEORY.md's mesoscopic bump, used here at macroscopic scale):
 *   e^{−2cos²θ} = e^{−1}e^{−cos 2θ} = e^{−1}[I_0(1) + 2Σ_j (−1)^j I_j(1) cos 2jθ], so c_0 = e^{−1}I_0(1),
 *   c_{2j} = 2(−1)^j e^{−1} I_j(1), odd coefficients 0.
 */
export interface ChebyshevTestFunction {
  readonly name: string;
  readonly formula: string;
  /** c_k in decimal arithmetic (exact for the powers). */
  readonly coefficient: (D: DecimalConstructor, k: number) => Decimal;
  /** The degree beyond which every c_k is 0 (the powers); Infinity for the others. */
  readonly degree: number;
}

function binomial(n: number, k: number): bigint {
  if (k < 0 || k > n) return 0n;
  let b = 1n;
  for (let j = 1; j <= k; j++) b = (b * BigInt(n - k + j)) / BigInt(j);
  return b;
}

function power(p: number): ChebyshevTestFunction {
  return {
    name: `x^${p}`,
    formula: `x^${p}`,
    degree: p,
    coefficient: (D, k) => {
      if (k > p || (p - k) % 2 === 1) return new D(0);
      const b = binomial(p, (p - k) / 2);
      return new D((k === 0 ? b : 2n * b).toString());
    },
  };
}

export const CHEBYSHEV_TEST_FUNCTIONS: readonly ChebyshevTestFunction[] = [
  ...[1, 2, 3, 4, 5, 6, 7, 8].map(power),
  {
    name: 'exp',
    formula: 'e^x',
    degree: Infinity,
    coefficient: (D, k) => besselIDecimal(D, k, 2).times(k === 0 ? 1 : 2),
  },
  {
    name: 'gaussian-bump',
    formula: 'e^{−x²/2}',
    degree: Infinity,
    coefficient: (D, k) => {
      if (k % 2 === 1) return new D(0);
      const j = k / 2;
      const value = besselIDecimal(D, j, 1).times(new D(-1).exp());
      return k === 0 ? value : value.times(j % 2 === 0 ? 2 : -2);
    },
  },
];
