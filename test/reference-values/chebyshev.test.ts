import { execFileSync, spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { chebyshevCoefficients, chebyshevExpansion, chebyshevTau } from '../../reference-values/chebyshev.js';

const EPS = Number.EPSILON;

function expectNear(label: string, observed: number, expected: number, tolerance: number): void {
  const diff = Math.abs(observed - expected);
  if (!(diff <= tolerance)) {
    expect.fail(`${label}: observed ${observed}, expected ${expected}, |diff| ${diff} > tolerance ${tolerance}`);
  }
}

function binomial(n: number, k: number): number {
  let b = 1;
  for (let j = 1; j <= k; j++) b = (b * (n - k + j)) / j;
  return b;
}

/** I_k(2) = Σ_m 1/(m!(m + k)!) — Abramowitz and Stegun 1964, eq. 9.6.10 with z = 2. */
function besselI2(k: number): number {
  let term = 1;
  for (let j = 1; j <= k; j++) term /= j; // 1/k!
  let sum = 0;
  for (let m = 0; m < 40; m++) {
    sum += term;
    term /= (m + 1) * (m + 1 + k);
  }
  return sum;
}

describe('chebyshevCoefficients', () => {
  it('gives the binomial expansion of (2cos θ)ⁿ for f = xⁿ', () => {
    // (e^{iθ} + e^{−iθ})ⁿ = Σ_j binom(n, j) cos((n − 2j)θ): c_k = 2 binom(n, (n − k)/2) for k ≥ 1 and
    // n − k even, c_0 = binom(n, n/2) for n even, other coefficients 0 (binomial theorem).
    for (let n = 0; n <= 14; n++) {
      const K = n + 3;
      const c = chebyshevCoefficients((x) => x ** n, K);
      for (let k = 0; k <= K; k++) {
        const expected = k > n || (n - k) % 2 === 1 ? 0 : k === 0 ? binomial(n, n / 2) : 2 * binomial(n, (n - k) / 2);
        expectNear(`x^${n}: c_${k}`, c[k], expected, 16 * EPS * 2 ** n);
      }
    }
  });

  it('gives c_0 = I_0(2), c_k = 2 I_k(2) for f = eˣ', () => {
    // e^{z cos θ} = I_0(z) + 2 Σ_{k≥1} I_k(z) cos kθ (Abramowitz and Stegun 1964, eq. 9.6.34), z = 2;
    // I_k(2) from the power series, A&S eq. 9.6.10.
    const K = 25;
    const c = chebyshevCoefficients(Math.exp, K);
    for (let k = 0; k <= K; k++) {
      expectNear(`e^x: c_${k}`, c[k], (k === 0 ? 1 : 2) * besselI2(k), 16 * EPS * Math.exp(2));
    }
  });

  it('agrees with Gauss–Chebyshev quadrature for τ_k (different nodes, first kind)', () => {
    // (1/π)∫_{−1}^{1} g(t)T_k(t)/√(1 − t²)dt = (1/n)Σ_j g(t_j)T_k(t_j), t_j = cos((2j − 1)π/(2n)), exact
    // for polynomials g·T_k of degree < 2n (Abramowitz and Stegun 1964, eq. 25.4.38).
    const cases: ReadonlyArray<[string, (x: number) => number]> = [
      ['sin(x)', Math.sin],
      ['1/(3 − x)', (x) => 1 / (3 - x)],
      ['cosh(x)/(1 + x²/10)', (x) => Math.cosh(x) / (1 + (x * x) / 10)],
    ];
    for (const [name, f] of cases) {
      for (let k = 0; k <= 6; k++) {
        const n = 400;
        let sum = 0;
        for (let j = 1; j <= n; j++) {
          const t = Math.cos(((2 * j - 1) * Math.PI) / (2 * n));
          let tPrev = 1;
          let tCur = t; // T_k(t) by the three-term recurrence T_{k+1} = 2tT_k − T_{k−1}
          for (let i = 1; i < k; i++) [tPrev, tCur] = [tCur, 2 * t * tCur - tPrev];
          sum += f(2 * t) * (k === 0 ? 1 : tCur);
        }
        expectNear(`τ_${k}(${name})`, chebyshevTau(f, k), sum / n, 64 * EPS);
      }
    }
  });

  it('reports non-convergence for a function with a kink, and chebyshevCoefficients refuses it', () => {
    const e = chebyshevExpansion(Math.abs, 4, { maxIntervals: 1024 });
    expect(e.converged).toBe(false);
    expect(e.aliasingEstimate).toBeGreaterThan(1e-8); // |x| has c_k ~ k^{-2}: aliasing ~ M^{-2}
    // still close: c_0 of |2cos θ| is (1/π)∫|2cos θ|dθ = 4/π
    expectNear('c_0(|x|)', e.coefficients[0], 4 / Math.PI, 1e-5);
    expect(() => chebyshevCoefficients(Math.abs, 4, { maxIntervals: 1024 })).toThrow(RangeError);
  });

  it('rejects a negative or fractional K', () => {
    expect(() => chebyshevCoefficients(Math.exp, -1)).toThrow(RangeError);
    expect(() => chebyshevCoefficients(Math.exp, 2.5)).toThrow(RangeError);
  });
});

/** numpy is an independent implementation; run it only where python3 and numpy are installed. */
const numpyAvailable = spawnSync('python3', ['-c', 'import numpy'], { stdio: 'ignore' }).status === 0;

describe.skipIf(!numpyAvailable)('chebyshevCoefficients against numpy.polynomial.chebyshev (skipped: python3 with numpy not found)', () => {
  it('matches chebinterpolate on [−1, 1] of g(t) = f(2t), and poly2cheb for a polynomial', () => {
    // numpy.polynomial.chebyshev.chebinterpolate(g, deg) interpolates g at Chebyshev points of the first
    // kind; for analytic g and deg = 60 its coefficients equal the series coefficients c_k to rounding.
    const cases: ReadonlyArray<[string, string, (x: number) => number]> = [
      ['exp', 'np.exp(x)', Math.exp],
      ['sin', 'np.sin(x)', Math.sin],
      ['1/(3 - x)', '1/(3 - x)', (x) => 1 / (3 - x)],
      ['cos(3x)', 'np.cos(3*x)', (x) => Math.cos(3 * x)],
    ];
    const K = 20;
    const script = [
      'import json, sys',
      'import numpy as np',
      'from numpy.polynomial import chebyshev as C',
      `exprs = ${JSON.stringify(cases.map((c) => c[1]))}`,
      'out = []',
      'for e in exprs:',
      '    g = eval("lambda t: (lambda x: " + e + ")(2*t)")',
      `    out.append(list(C.chebinterpolate(g, 60)[:${K + 1}]))`,
      '# x^5 - 2x^3 in the variable t = x/2: 32 t^5 - 16 t^3',
      'out.append(list(C.poly2cheb([0, 0, 0, -16, 0, 32])))',
      'print(json.dumps(out))',
    ].join('\n');
    const numpyCoefficients = JSON.parse(execFileSync('python3', ['-c', script], { encoding: 'utf8' })) as number[][];
    cases.forEach(([name, , f], i) => {
      const ours = chebyshevCoefficients(f, K);
      const theirs = numpyCoefficients[i];
      // |f| ≤ e² ≈ 7.4 on [−2, 2]; numpy's degree-60 interpolation adds rounding of about 60ε·max|f|.
      for (let k = 0; k <= K; k++) expectNear(`${name}: c_${k} vs numpy`, ours[k], theirs[k], 128 * EPS * Math.exp(2));
    });
    const poly = chebyshevCoefficients((x) => x ** 5 - 2 * x ** 3, 5);
    const theirs = numpyCoefficients[cases.length];
    for (let k = 0; k <= 5; k++) expectNear(`x^5 − 2x^3: c_${k} vs numpy poly2cheb`, poly[k], theirs[k] ?? 0, 64 * EPS);
  });
});
