import { Decimal } from 'decimal.js';
import { describe, expect, it } from 'vitest';
import { chebyshevCoefficients } from '../../reference-values/chebyshev.js';
import { logRelativeError } from '../../reference-values/log-relative-error.js';
import { builtInTable } from '../../reference-values/reference-table-catalog.js';
import { TABULATED_COEFFICIENTS } from '../../reference-values/tables/chebyshev-variances.generate.js';
import { pythonHas, runPython } from './python-reference.js';

const coefficients = builtInTable('chebyshev-coefficients');
const variances = builtInTable('chebyshev-variances');
const EPS = Number.EPSILON;

/** The test functions in double precision, for the independent evaluations. */
const FUNCTIONS: Record<string, { f: (x: number) => number; numpy: string; mpmath?: string }> = {
  ...Object.fromEntries(Array.from({ length: 8 }, (_, i) => [`x^${i + 1}`, { f: (x: number) => x ** (i + 1), numpy: `x**${i + 1}` }])),
  exp: { f: Math.exp, numpy: 'np.exp(x)', mpmath: 'exp' },
  'gaussian-bump': { f: (x) => Math.exp(-(x * x) / 2), numpy: 'np.exp(-x*x/2)', mpmath: 'gaussian-bump' },
};

const c = (name: string, k: number): number => coefficients.number({ function: name, k }, 'c') as number;

function binomial(n: number, k: number): number {
  let b = 1;
  for (let j = 1; j <= k; j++) b = (b * (n - k + j)) / j;
  return b;
}

describe('chebyshev-coefficients', () => {
  it('has the binomial coefficients for x^p exactly: c_k = 2·binom(p, (p − k)/2), c_0 = binom(p, p/2) (binomial theorem)', () => {
    for (let p = 1; p <= 8; p++) {
      for (let k = 0; k <= TABULATED_COEFFICIENTS; k++) {
        const expected = k > p || (p - k) % 2 === 1 ? 0 : (k === 0 ? 1 : 2) * binomial(p, (p - k) / 2);
        expect(coefficients.text({ function: `x^${p}`, k }, 'c'), `x^${p}, k = ${k}`).toBe(String(expected));
      }
    }
  });

  it('agrees with chebyshev.ts\u2019s double-precision trapezoid rule (an independent method) to a few ε·max|f|', () => {
    for (const [name, { f }] of Object.entries(FUNCTIONS)) {
      const ours = chebyshevCoefficients(f, TABULATED_COEFFICIENTS);
      const scale = Math.max(Math.abs(f(2)), Math.abs(f(-2)), 1);
      for (let k = 0; k <= TABULATED_COEFFICIENTS; k++) {
        expect(Math.abs(ours[k] - c(name, k)), `${name}, k = ${k}`).toBeLessThanOrEqual(64 * EPS * scale);
      }
    }
  });

  it.skipIf(!pythonHas('numpy'))('agrees with numpy.polynomial.chebyshev.chebinterpolate of f(2t) (skipped without numpy)', () => {
    const names = Object.keys(FUNCTIONS);
    const theirs = runPython<number[][]>([
      'import json, numpy as np',
      'from numpy.polynomial import chebyshev as C',
      `exprs = ${JSON.stringify(names.map((n) => FUNCTIONS[n].numpy))}`,
      `print(json.dumps([list(C.chebinterpolate(eval("lambda t: (lambda x: " + e + ")(2*t)"), 60)[:${TABULATED_COEFFICIENTS + 1}]) for e in exprs]))`,
    ]);
    names.forEach((name, i) => {
      const scale = Math.max(Math.abs(FUNCTIONS[name].f(2)), Math.abs(FUNCTIONS[name].f(-2)), 1);
      for (let k = 0; k <= TABULATED_COEFFICIENTS; k++) {
        expect(Math.abs(theirs[i][k] - c(name, k)), `${name}, k = ${k}`).toBeLessThanOrEqual(256 * EPS * scale);
      }
    });
  });

  it.skipIf(!pythonHas('mpmath'))('agrees with mpmath\u2019s Bessel functions at 40 digits in every printed digit: c_k = 2I_k(2) for e^x, 2(−1)^j e^{−1} I_j(1) for e^{−x²/2}, and so do the sums Σ k c_k² (skipped without mpmath)', () => {
    const theirs = runPython<string[][]>([
      'import json, mpmath as mp',
      'mp.mp.dps = 40',
      `K = ${TABULATED_COEFFICIENTS}`,
      'ce = lambda k: mp.besseli(k, 2) * (1 if k == 0 else 2)',
      'cg = lambda k: 0 if k % 2 else mp.exp(-1) * mp.besseli(k // 2, 1) * (1 if k == 0 else 2 * (-1) ** (k // 2))',
      'sums = [mp.nsum(lambda k: k * c(int(k))**2, [1, 150]) for c in (ce, cg)]',
      'print(json.dumps([[mp.nstr(ce(k), 30) for k in range(K + 1)], [mp.nstr(cg(k), 30) for k in range(K + 1)], [mp.nstr(v, 30) for v in sums]]))',
    ]);
    ['exp', 'gaussian-bump'].forEach((name, i) => {
      const ours = new Decimal(variances.text({ function: name }, 'pairing') as string);
      expect(ours.minus(theirs[2][i]).abs().div(theirs[2][i]).toNumber(), `Σ k c_k² for ${name}`).toBeLessThan(1e-19);
    });
    ['exp', 'gaussian-bump'].forEach((name, i) => {
      for (let k = 0; k <= TABULATED_COEFFICIENTS; k++) {
        const ours = new Decimal(coefficients.text({ function: name, k }, 'c') as string);
        const exact = new Decimal(theirs[i][k]);
        const difference = exact.isZero() ? ours.abs() : ours.minus(exact).abs().div(exact.abs());
        expect(difference.toNumber(), `${name}, k = ${k}`).toBeLessThan(1e-19);
      }
    });
  });
});

describe('chebyshev-variances: Var → pairing/(2β) + (σ_d² − 2/β)·diagonal + κ4·cumulant', () => {
  const variance = (name: string, beta: number, diagonalVariance: number, kappa4: number): number =>
    (variances.number({ function: name }, 'pairing') as number) / (2 * beta) +
    (diagonalVariance - 2 / beta) * (variances.number({ function: name }, 'diagonal') as number) +
    kappa4 * (variances.number({ function: name }, 'cumulant') as number);

  it('gives f = x → σ_d² and f = x² → 4/β + 2κ4 for any ensemble (THEORY.md, "Fluctuations: linear statistics")', () => {
    for (const beta of [1, 2]) {
      for (const diagonalVariance of [0, 1, 2, 3.5]) {
        for (const kappa4 of [-2, 0, 1.5]) {
          expect(variance('x^1', beta, diagonalVariance, kappa4)).toBeCloseTo(diagonalVariance, 12);
          expect(variance('x^2', beta, diagonalVariance, kappa4)).toBeCloseTo(4 / beta + 2 * kappa4, 12);
        }
      }
    }
  });

  it('gives the leading terms of the exact variances: GOE Var Tr H³ → 24, Var Tr H⁴ → 72; GUE 12 and 36 (THEORY.md, by Wick enumeration)', () => {
    expect(variances.text({ function: 'x^3' }, 'variance_goe')).toBe('24');
    expect(variances.text({ function: 'x^4' }, 'variance_goe')).toBe('72');
    expect(variances.text({ function: 'x^3' }, 'variance_gue')).toBe('12');
    expect(variances.text({ function: 'x^4' }, 'variance_gue')).toBe('36');
  });

  it('has Σ k c_k² equal to the sum over the table\u2019s own coefficients and over chebyshev.ts\u2019s (LRE ≥ 14)', () => {
    for (const name of ['exp', 'gaussian-bump']) {
      const ours = chebyshevCoefficients(FUNCTIONS[name].f, 40);
      let fromDouble = 0;
      let fromTable = 0;
      for (let k = 1; k <= 40; k++) fromDouble += k * ours[k] * ours[k];
      for (let k = 1; k <= TABULATED_COEFFICIENTS; k++) fromTable += k * c(name, k) ** 2;
      const certified = variances.text({ function: name }, 'pairing') as string;
      expect(logRelativeError(fromDouble, certified, 15), name).toBeGreaterThanOrEqual(14);
      expect(logRelativeError(fromTable, certified, 15), name).toBeGreaterThanOrEqual(14);
    }
  });
});
