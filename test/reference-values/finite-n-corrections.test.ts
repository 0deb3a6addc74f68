import { describe, expect, it } from 'vitest';
import { type Complex, abs, complex, div, mul, sub } from '../../harness/numeric/complex.js';
import type { EnsembleConstants } from '../../harness/numeric/ensemble.js';
import {
  evenMomentCorrection,
  exactEvenMomentGOE,
  exactEvenMomentGUE,
  goeTraceMoment,
  gueTraceMoment,
  linearStatisticMeanCorrection,
  ratioToNumber,
  resolventMeanCorrection,
} from '../../reference-values/finite-n-corrections.js';
import { catalanNumber } from '../../reference-values/semicircle-law.js';
import {
  type IntegerMomentLaw,
  evaluatePolynomial,
  gaussianMoment,
  momentMethodPolynomial,
  wickTraceExplicit,
  wickTracePolynomial,
} from './exact-moment-enumeration.js';

const EPS = Number.EPSILON;
const GOE: EnsembleConstants = { field: 'real', beta: 1, diagonalVariance: 2, kappa4: 0 };
const GUE: EnsembleConstants = { field: 'complex', beta: 2, diagonalVariance: 1, kappa4: 0 };

function expectNear(label: string, observed: number, expected: number, tolerance: number): void {
  const diff = Math.abs(observed - expected);
  if (!(diff <= tolerance)) {
    expect.fail(`${label}: observed ${observed}, expected ${expected}, |diff| ${diff} > tolerance ${tolerance}`);
  }
}

/**
 * Entry laws with integer moments (so the enumeration is exact in BigInt), with their constants:
 * κ4 = E x⁴ − 3 (real) or E|x|⁴ − 2 (complex), σ_d² = E d² (THEORY.md, "Conventions").
 */
const scaledGaussian = (variance: number) => (p: number) =>
  p % 2 === 1 ? 0n : gaussianMoment(p) * BigInt(variance) ** BigInt(p / 2);
const rademacher = (p: number) => (p % 2 === 0 ? 1n : 0n);
const zero = (p: number) => (p === 0 ? 1n : 0n);
/** x = ±2 with probability 1/8 each, else 0: E x² = 1, E x^p = 2^p/4 for even p ≥ 2, κ4 = 1. */
const sparseTwo = (p: number) => (p === 0 ? 1n : p % 2 === 1 ? 0n : 2n ** BigInt(p) / 4n);
const LAWS: ReadonlyArray<[string, IntegerMomentLaw, EnsembleConstants]> = [
  ['GOE', { field: 'real', offDiagonal: gaussianMoment, diagonal: scaledGaussian(2) }, GOE],
  ['real Rademacher, zero diagonal', { field: 'real', offDiagonal: rademacher, diagonal: zero }, { field: 'real', beta: 1, diagonalVariance: 0, kappa4: -2 }],
  ['real Rademacher, Rademacher diagonal', { field: 'real', offDiagonal: rademacher, diagonal: rademacher }, { field: 'real', beta: 1, diagonalVariance: 1, kappa4: -2 }],
  ['real sparse ±2, Gaussian diagonal of variance 3', { field: 'real', offDiagonal: sparseTwo, diagonal: scaledGaussian(3) }, { field: 'real', beta: 1, diagonalVariance: 3, kappa4: 1 }],
  // complex Gaussian: |x|² ~ Exp(1), E|x|^{2q} = q!
  ['GUE', { field: 'complex', offDiagonal: (q) => [1n, 1n, 2n, 6n, 24n, 120n][q], diagonal: gaussianMoment }, GUE],
  ['complex uniform phase, zero diagonal', { field: 'complex', offDiagonal: () => 1n, diagonal: zero }, { field: 'complex', beta: 2, diagonalVariance: 0, kappa4: -1 }],
  ['complex uniform phase, Gaussian diagonal of variance 2', { field: 'complex', offDiagonal: () => 1n, diagonal: scaledGaussian(2) }, { field: 'complex', beta: 2, diagonalVariance: 2, kappa4: -1 }],
];

describe('exact GUE moments (Harer and Zagier 1986, Invent. Math. 85)', () => {
  it('reproduce a_2 = 2N³ + N and a_3 = 5N⁴ + 10N² (THEORY.md, Harer and Zagier 1986)', () => {
    for (let N = 1; N <= 12; N++) {
      const n = BigInt(N);
      expect(gueTraceMoment(N, 0)).toBe(n);
      expect(gueTraceMoment(N, 1)).toBe(n * n);
      expect(gueTraceMoment(N, 2)).toBe(2n * n ** 3n + n);
      expect(gueTraceMoment(N, 3)).toBe(5n * n ** 4n + 10n * n ** 2n);
    }
  });

  it('agree with Wick enumeration (Isserlis 1918), symbolic for k ≤ 5 and with explicit indices for N ≤ 3, k ≤ 3', () => {
    for (let k = 0; k <= 5; k++) {
      const polynomial = wickTracePolynomial(k, 'gue');
      for (let N = 1; N <= 7; N++) expect(gueTraceMoment(N, k), `N = ${N}, k = ${k}`).toBe(evaluatePolynomial(polynomial, N));
    }
    for (let N = 1; N <= 3; N++) for (let k = 1; k <= 3; k++) expect(Number(gueTraceMoment(N, k))).toBe(wickTraceExplicit(N, k, 'gue'));
  });
});

describe('exact GOE moments (THEORY.md polynomials; Ledoux 2009 for a recursion)', () => {
  it('agree with Wick enumeration (Isserlis 1918), symbolic for k ≤ 5 and with explicit indices for N ≤ 3, k ≤ 3 and N = 4, k = 2', () => {
    for (let k = 0; k <= 5; k++) {
      const polynomial = wickTracePolynomial(k, 'goe');
      for (let N = 1; N <= 7; N++) expect(goeTraceMoment(N, k), `N = ${N}, k = ${k}`).toBe(evaluatePolynomial(polynomial, N));
    }
    for (let N = 1; N <= 3; N++) for (let k = 1; k <= 3; k++) expect(Number(goeTraceMoment(N, k))).toBe(wickTraceExplicit(N, k, 'goe'));
    expect(Number(goeTraceMoment(4, 2))).toBe(wickTraceExplicit(4, 2, 'goe'));
  });

  it('agree with the moment method for Gaussian entries of variance 1 off the diagonal and 2 on it (k ≤ 4)', () => {
    const law = LAWS[0][1];
    for (let k = 1; k <= 4; k++) {
      const polynomial = momentMethodPolynomial(k, law);
      for (let N = 1; N <= 6; N++) expect(goeTraceMoment(N, k)).toBe(evaluatePolynomial(polynomial, N));
    }
  });

  it('are undefined beyond k = 5 and reject bad arguments', () => {
    expect(goeTraceMoment(10, 6)).toBeUndefined();
    expect(exactEvenMomentGOE(10, 6)).toBeUndefined();
    expect(() => goeTraceMoment(0, 1)).toThrow(RangeError);
    expect(() => gueTraceMoment(3, -1)).toThrow(RangeError);
  });
});

describe('normalised exact moments E⟨H^{2k}⟩ and their 1/N term', () => {
  it('tend to Catalan(k) with the 1/N coefficient evenMomentCorrection (GOE k ≤ 5, GUE k ≤ 8)', () => {
    // E Tr X^{2k} is a polynomial in N with non-negative coefficients (they count Wick pairings, see
    // the enumeration), so 0 ≤ N(E⟨H^{2k}⟩ − C_k) − e_k ≤ (E Tr X^{2k} at N = 1)/N, and at N = 1 the
    // value is E x^{2k} of one Gaussian: (2k − 1)!! for GUE, (2k − 1)!!·2^k for GOE (variance 2).
    // Rounding of N·(E − C_k) adds about N·C_k·ε.
    const N = 1e8;
    for (let k = 1; k <= 8; k++) {
      const catalan = Number(catalanNumber(k));
      const rounding = 4 * N * catalan * EPS;
      const gueExcess = N * (exactEvenMomentGUE(N, k) - catalan) - evenMomentCorrection(k, GUE);
      expect(gueExcess, `GUE k = ${k}`).toBeGreaterThanOrEqual(-rounding);
      expect(gueExcess, `GUE k = ${k}`).toBeLessThanOrEqual(Number(gaussianMoment(2 * k)) / N + rounding);
      const goe = exactEvenMomentGOE(N, k);
      if (goe === undefined) continue;
      const goeExcess = N * (goe - catalan) - evenMomentCorrection(k, GOE);
      expect(goeExcess, `GOE k = ${k}`).toBeGreaterThanOrEqual(-rounding);
      expect(goeExcess, `GOE k = ${k}`).toBeLessThanOrEqual((Number(gaussianMoment(2 * k)) * 2 ** k) / N + rounding);
    }
  });

  it('have the 1/N coefficient evenMomentCorrection exactly, in the Wick polynomials', () => {
    for (let k = 1; k <= 5; k++) {
      expect(Number(wickTracePolynomial(k, 'goe')[k])).toBe(evenMomentCorrection(k, GOE));
      expect(Number(wickTracePolynomial(k, 'gue')[k])).toBe(evenMomentCorrection(k, GUE));
      expect(Number(wickTracePolynomial(k, 'goe')[k + 1])).toBe(Number(catalanNumber(k)));
    }
  });

  it('are exactly rounded: ratioToNumber agrees with IEEE division where both operands are exact doubles', () => {
    // IEEE 754 division is correctly rounded (IEEE Std 754-2019, §5.4.1), so for |p|, |q| < 2^53 the
    // native quotient is the reference. A fixed linear congruential sequence picks the operands.
    let state = 12345;
    const next = (): number => (state = (state * 1103515245 + 12345) % 2 ** 31);
    for (let i = 0; i < 2000; i++) {
      const p = next() * 2 ** 22 + next();
      const q = (next() % 2 ** 20) + 1;
      expect(ratioToNumber(BigInt(p), BigInt(q))).toBe(p / q);
      expect(ratioToNumber(-BigInt(p) << 200n, BigInt(q) << 200n)).toBe(-p / q); // scale invariance
    }
    expect(exactEvenMomentGOE(7, 2)).toBe((2 * 343 + 5 * 49 + 5 * 7) / 343);
  });
});

describe('evenMomentCorrection and linearStatisticMeanCorrection (Bai and Yao 2005, Bernoulli 11)', () => {
  it('gives E Tr H² − N = σ_d² − 1 for real matrices (THEORY.md: E Tr H² = N − 1 + σ_d² exactly)', () => {
    for (const sd2 of [0, 1, 2, 3.5]) {
      for (const kappa4 of [-2, 0, 1.5]) {
        const c: EnsembleConstants = { field: 'real', beta: 1, diagonalVariance: sd2, kappa4 };
        expectNear(`σ_d² = ${sd2}, κ4 = ${kappa4}`, linearStatisticMeanCorrection((x) => x * x, c), sd2 - 1, 64 * EPS);
        expect(evenMomentCorrection(1, c)).toBe(sd2 - 1);
      }
    }
  });

  it('gives 5 for GOE x⁴ (E Tr X⁴ = 2N³ + 5N² + 5N) and 0 for GUE x⁴ (E Tr X⁴ = 2N³ + N)', () => {
    expectNear('GOE x⁴', linearStatisticMeanCorrection((x) => x ** 4, GOE), 5, 256 * EPS);
    expectNear('GUE x⁴', linearStatisticMeanCorrection((x) => x ** 4, GUE), 0, 256 * EPS);
    expect(evenMomentCorrection(2, GOE)).toBe(5);
    expect(evenMomentCorrection(2, GUE)).toBe(0);
  });

  it('is the N^k coefficient of E Tr X^{2k} for general Wigner laws (moment-method enumeration, k ≤ 4)', () => {
    for (const [name, law, c] of LAWS) {
      for (let k = 1; k <= 4; k++) {
        const polynomial = momentMethodPolynomial(k, law);
        expect(Number(polynomial[k + 1]), `${name}, k = ${k}: leading term`).toBe(Number(catalanNumber(k)));
        expect(evenMomentCorrection(k, c), `${name}, k = ${k}: 1/N term`).toBe(Number(polynomial[k]));
      }
    }
  });

  it('agrees between the closed form for x^{2k} and the Chebyshev quadrature', () => {
    for (const [name, , c] of LAWS) {
      for (let k = 0; k <= 6; k++) {
        expectNear(`${name}, x^${2 * k}`, linearStatisticMeanCorrection((x) => x ** (2 * k), c), evenMomentCorrection(k, c), 64 * EPS * 4 ** k);
      }
      expectNear(`${name}, odd x³`, linearStatisticMeanCorrection((x) => x ** 3, c), 0, 64 * EPS * 8);
    }
  });
});

describe('resolventMeanCorrection', () => {
  const points: readonly Complex[] = [complex(0.5, 1), complex(-1.5, 0.4), complex(3, 0), complex(0, -2), complex(-2.5, 0.2)];

  it('equals linearStatisticMeanCorrection for f(x) = 1/(x − z), real and imaginary parts', () => {
    for (const [name, , c] of LAWS) {
      for (const z of points) {
        const re = (x: number) => div(complex(1, 0), complex(x - z.re, -z.im)).re;
        const im = (x: number) => div(complex(1, 0), complex(x - z.re, -z.im)).im;
        const expected = complex(linearStatisticMeanCorrection(re, c), linearStatisticMeanCorrection(im, c));
        const observed = resolventMeanCorrection(z, c);
        const scale = Math.max(1, abs(expected));
        expect(abs(sub(observed, expected)), `${name}, z = ${z.re}+${z.im}i`).toBeLessThanOrEqual(1e-12 * scale);
      }
    }
  });

  it('matches −Σ_k evenMomentCorrection(k)/z^{2k+1}, the expansion of Tr G(z) = −Σ Tr Hⁿ/z^{n+1}, for large |z|', () => {
    for (const [name, , c] of LAWS) {
      for (const z of [complex(0, 6), complex(7, 2), complex(-5, -4)]) {
        let sum = complex(0, 0);
        const inverse = div(complex(1, 0), z);
        const inverse2 = mul(inverse, inverse);
        let power = inverse; // 1/z^{2k+1}
        for (let k = 0; k <= 60; k++) {
          const term = mul(power, complex(-evenMomentCorrection(k, c), 0));
          sum = complex(sum.re + term.re, sum.im + term.im);
          power = mul(power, inverse2);
        }
        const observed = resolventMeanCorrection(z, c);
        expect(abs(sub(observed, sum)), `${name}, z = ${z.re}+${z.im}i`).toBeLessThanOrEqual(1e-13 * Math.max(1, abs(sum)));
      }
    }
  });

  it('vanishes for GUE', () => {
    for (const z of points) expect(abs(resolventMeanCorrection(z, GUE))).toBe(0);
  });
});
