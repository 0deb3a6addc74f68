import { describe, expect, it } from 'vitest';
import { type Complex, abs, complex } from '../../harness/numeric/complex.js';
import { eigenvalues } from '../../harness/numeric/eigen.js';
import { type EnsembleConstants, ensembleConstants, parseEnsemble } from '../../harness/numeric/ensemble.js';
import { linearStatistic } from '../../harness/numeric/resolvent-statistics.js';
import {
  complexLinearStatisticCovariance,
  exactLinearStatisticVariance,
  exactPowerVarianceCoefficients,
  linearStatisticCovariance,
  linearStatisticVariance,
} from '../../reference-values/linear-statistic-variance.js';
import { type IntegerMomentLaw, evaluatePolynomial, gaussianMoment } from './exact-moment-enumeration.js';
import { covarianceEstimate, criticalValue, expectAgreement, expectNear, forEachSample, varianceEstimate } from './fluctuation-estimates.js';
import {
  momentMethodTraceProductPolynomial,
  traceVariancePolynomial,
  wickTraceProductExplicit,
  wickTraceProductPolynomial,
} from './trace-product-enumeration.js';

const GOE: EnsembleConstants = { field: 'real', beta: 1, diagonalVariance: 2, kappa4: 0 };
const GUE: EnsembleConstants = { field: 'complex', beta: 2, diagonalVariance: 1, kappa4: 0 };


/**
 * Entry laws with integer moments, with their constants (κ4 = E x⁴ − 3 real, E|x|⁴ − 2 complex;
 * σ_d² = E d²; THEORY.md, "Conventions").
 */
const scaledGaussian = (variance: number) => (p: number) => (p % 2 === 1 ? 0n : gaussianMoment(p) * BigInt(variance) ** BigInt(p / 2));
const rademacher = (p: number) => (p % 2 === 0 ? 1n : 0n);
const zero = (p: number) => (p === 0 ? 1n : 0n);
/** x = ±2 with probability 1/8 each, else 0: E x² = 1, E x^p = 2^p/4 for even p ≥ 2, κ4 = 1. */
const sparseTwo = (p: number) => (p === 0 ? 1n : p % 2 === 1 ? 0n : 2n ** BigInt(p) / 4n);
const complexGaussian = (q: number) => [1n, 1n, 2n, 6n, 24n, 120n][q]; // |x|² ~ Exp(1): E|x|^{2q} = q!
const LAWS: ReadonlyArray<[string, IntegerMomentLaw, EnsembleConstants]> = [
  ['GOE', { field: 'real', offDiagonal: gaussianMoment, diagonal: scaledGaussian(2) }, GOE],
  ['GUE', { field: 'complex', offDiagonal: complexGaussian, diagonal: gaussianMoment }, GUE],
  ['real Rademacher, zero diagonal', { field: 'real', offDiagonal: rademacher, diagonal: zero }, { field: 'real', beta: 1, diagonalVariance: 0, kappa4: -2 }],
  ['real Rademacher, Rademacher diagonal', { field: 'real', offDiagonal: rademacher, diagonal: rademacher }, { field: 'real', beta: 1, diagonalVariance: 1, kappa4: -2 }],
  ['real sparse ±2, Gaussian diagonal of variance 3', { field: 'real', offDiagonal: sparseTwo, diagonal: scaledGaussian(3) }, { field: 'real', beta: 1, diagonalVariance: 3, kappa4: 1 }],
  ['complex uniform phase, zero diagonal', { field: 'complex', offDiagonal: () => 1n, diagonal: zero }, { field: 'complex', beta: 2, diagonalVariance: 0, kappa4: -1 }],
  ['complex uniform phase, Gaussian diagonal of variance 2', { field: 'complex', offDiagonal: () => 1n, diagonal: scaledGaussian(2) }, { field: 'complex', beta: 2, diagonalVariance: 2, kappa4: -1 }],
];

const power = (p: number) => (x: number) => x ** p;

describe('linearStatisticVariance: closed-form checks (Johansson 1998; Bai and Yao 2005; Lytova and Pastur 2009)', () => {
  it('gives σ_d² for f = x and 4/β + 2κ4 for f = x² (THEORY.md)', () => {
    for (const [label, , c] of LAWS) {
      expectNear(`${label}, x`, linearStatisticVariance(power(1), c), c.diagonalVariance, 1e-13);
      expectNear(`${label}, x²`, linearStatisticVariance(power(2), c), 4 / c.beta + 2 * c.kappa4, 1e-13);
    }
  });

  it('is a symmetric bilinear form: polarisation, symmetry and complex splitting agree', () => {
    const f = (x: number) => Math.cos(1.3 * x) + x / 5;
    const g = (x: number) => 1 / (3 - x) + x * x;
    for (const [label, , c] of LAWS.slice(0, 4)) {
      const polarised = (linearStatisticVariance((x) => f(x) + g(x), c) - linearStatisticVariance((x) => f(x) - g(x), c)) / 4;
      const direct = linearStatisticCovariance(f, g, c);
      expectNear(`${label}, polarisation`, direct, polarised, 1e-12 * (1 + Math.abs(direct)));
      expectNear(`${label}, symmetry`, linearStatisticCovariance(g, f, c), direct, 1e-13 * (1 + Math.abs(direct)));
      // e^{ix}: Cov(Tr e^{iH}, Tr e^{−iH}) = Var Tr cos H + Var Tr sin H, real.
      const e = complexLinearStatisticCovariance((x) => complex(Math.cos(x), Math.sin(x)), (x) => complex(Math.cos(x), -Math.sin(x)), c);
      const expected = linearStatisticVariance(Math.cos, c) + linearStatisticVariance(Math.sin, c);
      expectNear(`${label}, e^{ix}: real part`, e.re, expected, 1e-13);
      expectNear(`${label}, e^{ix}: imaginary part`, e.im, 0, 1e-13);
    }
  });

  it('rejects functions whose Chebyshev series does not converge', () => {
    expect(() => linearStatisticVariance((x) => Math.abs(x), GOE)).toThrow(RangeError);
  });
});

describe('exact finite-N variances of Tr H³ and Tr H⁴, reproduced by exact enumeration', () => {
  it('the Wick enumeration over two traces agrees with explicit index sums (N ≤ 3) and with the moment method', () => {
    for (const ensemble of ['goe', 'gue'] as const) {
      for (const lengths of [[3, 3], [4, 4], [2, 4], [3], [4]]) {
        const polynomial = wickTraceProductPolynomial(lengths, ensemble);
        for (let N = 1; N <= 3; N++) {
          if (lengths.length === 2 && lengths[0] + lengths[1] === 8 && N === 3) continue; // 3^8·105 terms: covered at N ≤ 2
          expect(Number(evaluatePolynomial(polynomial, N)), `${ensemble} ${lengths} N = ${N}`).toBe(wickTraceProductExplicit(lengths, ensemble, N));
        }
        const law = LAWS[ensemble === 'goe' ? 0 : 1][1];
        expect(momentMethodTraceProductPolynomial(lengths, law), `${ensemble} ${lengths}`).toEqual(polynomial);
      }
    }
  });

  it('reproduce THEORY.md: GOE 24 + 54/N + 42/N², 72 + 304/N + 664/N² + 496/N³; GUE 12 + 3/N², 36 + 60/N²', () => {
    for (const ensemble of ['goe', 'gue'] as const) {
      for (const p of [3, 4] as const) {
        // Var Tr H^p = N^{−p} Var Tr X^p, so coefficient j of the 1/N expansion is that of N^{p−j}.
        const variance = traceVariancePolynomial(p, (lengths) => wickTraceProductPolynomial(lengths, ensemble));
        const expected = exactPowerVarianceCoefficients(ensemble, p);
        variance.forEach((coefficient, r) => {
          const j = p - r;
          expect(Number(coefficient), `${ensemble} p = ${p}, N^${r}`).toBe(j >= 0 && j < expected.length ? expected[j] : 0);
        });
        for (const N of [1, 2, 7, 200]) {
          const exact = Number(evaluatePolynomial(variance, N)) / N ** p;
          expectNear(`${ensemble} p = ${p} N = ${N}`, exactLinearStatisticVariance(ensemble, p, N), exact, 1e-14 * exact);
        }
      }
    }
  });

  it('have as N^p coefficient the limit formula, for every law and p ≤ 4 (exact test of the σ_d² and κ4 terms)', () => {
    for (const [label, law, c] of LAWS) {
      for (const p of [1, 2, 3, 4]) {
        const variance = traceVariancePolynomial(p, (lengths) => momentMethodTraceProductPolynomial(lengths, law));
        expect(variance.slice(p + 1).every((v) => v === 0n), `${label}, p = ${p}: degree ≤ p`).toBe(true);
        expectNear(`${label}, p = ${p}`, Number(variance[p] ?? 0n), linearStatisticVariance(power(p), c), 1e-11);
      }
    }
  });
});

/**
 * Simulation with the project's engine (sampleMatrix, eigenvalues, linearStatistic), 1500 samples per
 * ensemble (eigenvalues only); N = 100 for the real ensembles, N = 64 for GUE (its finite-N
 * corrections are O(1/N²), and the complex eigensolver costs about three times as much).
 * - Tr H³ and Tr H⁴ against their exact variances at that N: THEORY.md's polynomials for GOE and GUE,
 *   and the moment-method polynomial (this file) for real Rademacher with zero diagonal. Exact
 *   values, so no allowance.
 * - Tr e^{iH} (Cov with Tr e^{−iH}, and the bilinear Cov with itself) against the limit. Allowance:
 *   O(1/N); a pilot run (numpy, N = 100, 2·10⁴ samples per ensemble) found N·|observed − limit| ≤ 0.3
 *   for both and all three ensembles (within 1.7 pilot SE), so the allowance is (0.5 + 2|limit|)/N.
 *   The same pilot agreed with the exact variances of Tr H³ and Tr H⁴ (within 1 pilot SE), including
 *   the Rademacher ones from the moment method.
 * False alarms: 3 ensembles × (2 variances + 2 covariances × 2 components) = 18 comparisons at family
 * level 10⁻³ (Bonferroni).
 */
const SAMPLES = 1500;
const SEED = 77001;
const Z = criticalValue(1e-3 / 18);

describe('linearStatisticVariance against simulation', () => {
  const rademacherVariance = (p: 3 | 4, N: number): number =>
    Number(evaluatePolynomial(traceVariancePolynomial(p, (lengths) => momentMethodTraceProductPolynomial(lengths, LAWS[2][1])), N)) / N ** p;
  const cases: ReadonlyArray<[string, number, (p: 3 | 4, N: number) => number]> = [
    ['goe', 100, (p, N) => exactLinearStatisticVariance('goe', p, N)],
    ['gue', 64, (p, N) => exactLinearStatisticVariance('gue', p, N)],
    ['wigner:real:rademacher:diag=zero', 100, rademacherVariance],
  ];
  for (const [label, N, exactAt] of cases) {
    const exact = (p: 3 | 4): number => exactAt(p, N);
    it(`${label}: Var Tr H³, Var Tr H⁴ (exact at N = ${N}) and Cov of Tr e^{±iH} (limit) within allowance + ${Z.toFixed(2)} SE`, () => {
      const spec = parseEnsemble(label);
      const c = ensembleConstants(spec, N);
      const cubes: number[] = [];
      const quartics: number[] = [];
      const waves: Complex[] = [];
      const conjugates: Complex[] = [];
      forEachSample(spec, N, SAMPLES, SEED, `linear-statistic-variance ${label}`, (h) => {
        const values = eigenvalues(h);
        cubes.push(linearStatistic(values, power(3)));
        quartics.push(linearStatistic(values, power(4)));
        const cos = linearStatistic(values, Math.cos);
        const sin = linearStatistic(values, Math.sin);
        waves.push(complex(cos, sin));
        conjugates.push(complex(cos, -sin));
      });
      expectAgreement(`${label}, Var Tr H³`, varianceEstimate(cubes), complex(exact(3), 0), 0, Z);
      expectAgreement(`${label}, Var Tr H⁴`, varianceEstimate(quartics), complex(exact(4), 0), 0, Z);
      const wave = (x: number): Complex => complex(Math.cos(x), Math.sin(x));
      const conjugateWave = (x: number): Complex => complex(Math.cos(x), -Math.sin(x));
      const hermitian = complexLinearStatisticCovariance(wave, conjugateWave, c);
      const bilinear = complexLinearStatisticCovariance(wave, wave, c);
      expectAgreement(`${label}, Cov(Tr e^{iH}, Tr e^{−iH})`, covarianceEstimate(waves, conjugates), hermitian, (0.5 + 2 * abs(hermitian)) / N, Z);
      expectAgreement(`${label}, Cov(Tr e^{iH}, Tr e^{iH})`, covarianceEstimate(waves, waves), bilinear, (0.5 + 2 * abs(bilinear)) / N, Z);
      expect(abs(bilinear)).toBeGreaterThan(0.05); // the bilinear covariance is not trivially 0 here
    });
  }
});
