import { describe, expect, it } from 'vitest';
import { twoSampleKolmogorovSmirnov } from '../../../harness/estimators/two-sample-kolmogorov-smirnov.js';
import { sampleBetaHermiteTridiagonal } from '../../../harness/numeric/beta-hermite-tridiagonal.js';
import { eigenvalues } from '../../../harness/numeric/eigen.js';
import { randomStream } from '../../../harness/numeric/random-stream.js';
import { sampleMatrix } from '../../../harness/numeric/sample-wigner.js';
import { largestEigenvalueOfEnsemble, spectrumOfEnsemble, tridiagonalModelBeta, type SpectrumSpec } from '../../../harness/numeric/spectrum-of-ensemble.js';
import type { SymmetricTridiagonal } from '../../../harness/numeric/symmetric-tridiagonal.js';
import { exactEvenMomentGOE, exactEvenMomentGUE } from '../../../reference-values/finite-n-corrections.js';
import { expectWithinStandardErrors, meanAndStandardError } from './hypothesis-checks.js';

/**
 * The β-Hermite tridiagonal model (Dumitriu and Edelman 2002, J. Math. Phys. 43) in the project's
 * scaling, against exact moments and against the dense GOE/GUE sampler.
 *
 * Exact moments. For T = tridiag(d; e) with independent entries, d_i ~ N(0, 2s), e_k² ~ s·χ²_{βm_k},
 * s = 1/(βN), m_k = N − 1 − k, expanding Tr T⁴ over closed walks of length 4 on the path graph gives
 *   Tr T⁴ = Σ d_i⁴ + 4 Σ e_k²(d_k² + d_k d_{k+1} + d_{k+1}²) + 2 Σ e_k⁴ + 4 Σ e_k² e_{k+1}²
 * (checked below against T⁴ computed by matrix products), hence with E d⁴ = 12s², E e_k² = sβm_k,
 * E e_k⁴ = s²βm_k(βm_k + 2) (chi moments, Johnson, Kotz and Balakrishnan 1994, ch. 18) the exact
 * E⟨T⁴⟩ of `expectedFourthMoment`, and E⟨T²⟩ = (N − 1 + 2/β)/N. At β = 1 and β = 2 these must
 * equal the GOE and GUE values of finite-n-corrections.ts (Wick enumeration; Harer and Zagier 1986)
 * for every N: that identity, checked exactly, is what confirms the scaling of the model.
 * Monte Carlo checks are z-tests with the sample's own standard error (|z| ≤ 4.5,
 * hypothesis-checks.ts); two-sample comparisons with the dense sampler are two-sample
 * Kolmogorov–Smirnov tests of per-matrix statistics (independent across matrices), each at level
 * 10⁻⁴ (Bonferroni over the 8 of them: family level below 10⁻³).
 */
function expectedSecondMoment(beta: number, n: number): number {
  return (n - 1 + 2 / beta) / n;
}

/** E⟨T⁴⟩ = E Tr T⁴ / N for the model, from the walk expansion above. */
function expectedFourthMoment(beta: number, n: number): number {
  const s = 1 / (beta * n);
  const m = (k: number): number => n - 1 - k;
  let trace = 12 * s * s * n;
  for (let k = 0; k < n - 1; k++) {
    trace += 4 * s * beta * m(k) * (2 * s + 2 * s);
    trace += 2 * s * s * beta * m(k) * (beta * m(k) + 2);
    if (k < n - 2) trace += 4 * s * s * beta * beta * m(k) * m(k + 1);
  }
  return trace / n;
}

function walkExpansionTraceFourth(t: SymmetricTridiagonal): number {
  const d = t.diagonal;
  const e = t.offDiagonal;
  let trace = 0;
  for (let i = 0; i < d.length; i++) trace += d[i] ** 4;
  for (let k = 0; k < e.length; k++) {
    trace += 4 * e[k] ** 2 * (d[k] ** 2 + d[k] * d[k + 1] + d[k + 1] ** 2) + 2 * e[k] ** 4;
    if (k + 1 < e.length) trace += 4 * e[k] ** 2 * e[k + 1] ** 2;
  }
  return trace;
}

function denseTraceFourth(t: SymmetricTridiagonal): number {
  const n = t.diagonal.length;
  const a = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    a[i * n + i] = t.diagonal[i];
    if (i < n - 1) a[i * n + i + 1] = a[(i + 1) * n + i] = t.offDiagonal[i];
  }
  // Tr T⁴ = ‖T²‖_F² for symmetric T.
  let trace = 0;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      let x = 0;
      for (let k = 0; k < n; k++) x += a[i * n + k] * a[k * n + j];
      trace += x * x;
    }
  }
  return trace;
}

function powerMean(values: Float64Array, power: number): number {
  let sum = 0;
  for (const x of values) sum += x ** power;
  return sum / values.length;
}

describe('β-Hermite tridiagonal model: exact moments', () => {
  it('the walk expansion of Tr T⁴ agrees with T⁴ formed by products', () => {
    for (const [beta, n] of [[1, 1], [2, 2], [0.7, 5], [4, 9]]) {
      const t = sampleBetaHermiteTridiagonal(beta, n, randomStream(1, 'walk', n));
      const direct = denseTraceFourth(t);
      expect(Math.abs(walkExpansionTraceFourth(t) - direct), `β=${beta} N=${n}`).toBeLessThanOrEqual(64 * n * Number.EPSILON * direct);
    }
  });

  it('at β = 1 and 2 the exact E⟨T²⟩ and E⟨T⁴⟩ are the GOE and GUE moments, for N = 1 … 40', () => {
    for (let n = 1; n <= 40; n++) {
      for (const [beta, exact] of [[1, exactEvenMomentGOE], [2, exactEvenMomentGUE]] as const) {
        for (const [k, model] of [[1, expectedSecondMoment(beta, n)], [2, expectedFourthMoment(beta, n)]] as const) {
          const reference = exact(n, k) ?? NaN;
          expect(Math.abs(model - reference), `β=${beta} N=${n} k=${k}: model ${model}, exact ${reference}`).toBeLessThanOrEqual(8 * Number.EPSILON * reference);
        }
      }
    }
  });

  it('sampled moments: β = 1, 2 against the exact GOE/GUE E⟨H^{2k}⟩ (k = 1, 2, 3), other β against the exact model moments', () => {
    const samples = 4000;
    for (const [beta, n] of [[1, 12], [2, 12], [1, 3], [4, 10], [0.5, 15], [2.7, 7]]) {
      const second = new Float64Array(samples);
      const fourth = new Float64Array(samples);
      const sixth = new Float64Array(samples);
      for (let r = 0; r < samples; r++) {
        const values = spectrumOfEnsemble({ kind: 'beta-hermite', beta }, n, randomStream(20250603, `moments-${beta}-${n}`, r));
        second[r] = powerMean(values, 2);
        fourth[r] = powerMean(values, 4);
        sixth[r] = powerMean(values, 6);
      }
      const expected: [string, Float64Array, number][] = [
        ['E⟨H²⟩', second, expectedSecondMoment(beta, n)],
        ['E⟨H⁴⟩', fourth, expectedFourthMoment(beta, n)],
      ];
      if (beta === 1) expected.push(['E⟨H⁶⟩', sixth, exactEvenMomentGOE(n, 3) ?? NaN]);
      if (beta === 2) expected.push(['E⟨H⁶⟩', sixth, exactEvenMomentGUE(n, 3)]);
      for (const [label, values, value] of expected) {
        const { mean, standardError } = meanAndStandardError(values);
        expectWithinStandardErrors(`β=${beta} N=${n} ${label}`, mean, value, standardError);
      }
    }
  });

  it('rejects β ≤ 0 and sizes below 1', () => {
    const stream = randomStream(1, 'bad', 0);
    expect(() => sampleBetaHermiteTridiagonal(0, 3, stream)).toThrow(RangeError);
    expect(() => sampleBetaHermiteTridiagonal(1, 0, stream)).toThrow(RangeError);
    expect(() => spectrumOfEnsemble({ kind: 'beta-hermite', beta: Number.NaN }, 3, stream)).toThrow(RangeError);
  });
});

describe('β-Hermite tridiagonal model against the dense sampler (two-sample Kolmogorov–Smirnov)', () => {
  const LEVEL = 1e-4;
  const N = 16;
  const SAMPLES = 1500;

  for (const spec of [{ kind: 'goe' }, { kind: 'gue' }] as const) {
    it(`${spec.kind}: largest, smallest and middle eigenvalue and Tr H⁴ have the dense sampler's law`, () => {
      const statistics = (values: Float64Array): number[] => [values[N - 1], values[0], values[N / 2], powerMean(values, 4) * N];
      const tridiagonal = Array.from({ length: SAMPLES }, (_, r) => statistics(spectrumOfEnsemble(spec, N, randomStream(20250604, `tri-${spec.kind}`, r))));
      const dense = Array.from({ length: SAMPLES }, (_, r) => statistics(eigenvalues(sampleMatrix(spec, N, randomStream(20250604, `dense-${spec.kind}`, r)))));
      ['λ_max', 'λ_min', 'λ_N/2', 'Tr H⁴'].forEach((name, c) => {
        const test = twoSampleKolmogorovSmirnov(tridiagonal.map((s) => s[c]), dense.map((s) => s[c]));
        expect(test.pValue, `${spec.kind} ${name}: D = ${test.distance}, p = ${test.pValue}, level ${LEVEL}`).toBeGreaterThan(LEVEL);
      });
    });
  }

  it('power check: β = 1 and β = 2 are told apart by the same test on λ_max', () => {
    const top = (beta: number): number[] =>
      Array.from({ length: SAMPLES }, (_, r) => largestEigenvalueOfEnsemble({ kind: 'beta-hermite', beta }, N, randomStream(20250605, `power-${beta}`, r)));
    const test = twoSampleKolmogorovSmirnov(top(1), top(2));
    expect(test.pValue, `β = 1 vs β = 2 on λ_max: p = ${test.pValue}`).toBeLessThan(LEVEL);
  });
});

describe('largest eigenvalue by Sturm bisection: Tracy–Widom at N = 200', () => {
  // s = N^{2/3}(λ_max − c_N) → TW_β (Tracy and Widom 1994, 1996); c_N = 2√(1 − 1/(2N)) for β = 1 (the
  // centring 2√(N − 1/2) in unnormalised units, THEORY.md "Tracy–Widom reference digits") and 2 for
  // β = 2. TW means and variances: Bornemann 2010 (Markov Process. Related Fields 16), as quoted in
  // THEORY.md. The finite-N error is O(N^{−2/3}) (THEORY.md, "Edge"); the allowance 2·N^{−2/3} is set
  // from our own simulation of this model at N = 200 (20 000 samples per β: largest deviation, in
  // the GUE variance, 0.022 ≈ 0.76·N^{−2/3}). z-tests at |z| ≤ 4.5 beyond the allowance.
  const N = 200;
  const SAMPLES = 4000;
  const allowance = 2 * N ** (-2 / 3);
  const cases = [
    { spec: { kind: 'goe' } as const, centre: 2 * Math.sqrt(1 - 1 / (2 * N)), mean: -1.206533574582, variance: 1.607781034581 },
    { spec: { kind: 'gue' } as const, centre: 2, mean: -1.771086807411, variance: 0.8131947928329 },
  ];
  for (const c of cases) {
    it(`${c.spec.kind}: mean and variance of N^{2/3}(λ_max − c_N)`, () => {
      const s = Float64Array.from({ length: SAMPLES }, (_, r) => N ** (2 / 3) * (largestEigenvalueOfEnsemble(c.spec, N, randomStream(20250606, `tw-${c.spec.kind}`, r), 1e-9) - c.centre));
      const { mean, standardError } = meanAndStandardError(s);
      const squares = s.map((x) => (x - mean) ** 2);
      const variance = meanAndStandardError(squares);
      for (const [label, observed, expected, se] of [['mean', mean, c.mean, standardError], ['variance', variance.mean, c.variance, variance.standardError]] as const) {
        const excess = Math.max(0, Math.abs(observed - expected) - allowance);
        expect(excess / se, `${c.spec.kind} ${label}: observed ${observed}, TW ${expected}, allowance ${allowance}, SE ${se}`).toBeLessThanOrEqual(4.5);
      }
    });
  }
});

describe('spectrumOfEnsemble routing', () => {
  it('takes the tridiagonal model for GOE, GUE and their wigner spellings only', () => {
    const cases: [SpectrumSpec, number | null][] = [
      [{ kind: 'goe' }, 1],
      [{ kind: 'gue' }, 2],
      [{ kind: 'beta-hermite', beta: 4 }, 4],
      [{ kind: 'wigner', field: 'real', offDiagonal: 'gaussian', diagonal: 'gaussian', diagonalVariance: 2 }, 1],
      [{ kind: 'wigner', field: 'complex', offDiagonal: 'gaussian', diagonal: 'gaussian', diagonalVariance: 1 }, 2],
      [{ kind: 'wigner', field: 'real', offDiagonal: 'gaussian', diagonal: 'gaussian', diagonalVariance: 1 }, null],
      [{ kind: 'wigner', field: 'real', offDiagonal: 'rademacher', diagonal: 'gaussian', diagonalVariance: 2 }, null],
      [{ kind: 'wigner', field: 'complex', offDiagonal: 'gaussian', diagonal: 'zero', diagonalVariance: 0 }, null],
    ];
    for (const [spec, beta] of cases) expect(tridiagonalModelBeta(spec), JSON.stringify(spec)).toBe(beta);
  });

  it('the dense route returns the dense eigenvalues of the same stream, and λ_max by bisection is the top QL eigenvalue', () => {
    const spec: SpectrumSpec = { kind: 'wigner', field: 'real', offDiagonal: 'rademacher', diagonal: 'zero', diagonalVariance: 0 };
    const values = spectrumOfEnsemble(spec, 9, randomStream(3, 'route', 0));
    expect(Array.from(values)).toEqual(Array.from(eigenvalues(sampleMatrix(spec, 9, randomStream(3, 'route', 0)))));
    expect(largestEigenvalueOfEnsemble(spec, 9, randomStream(3, 'route', 0))).toBe(values[8]);
    const top = largestEigenvalueOfEnsemble({ kind: 'goe' }, 50, randomStream(3, 'route', 1));
    const all = spectrumOfEnsemble({ kind: 'goe' }, 50, randomStream(3, 'route', 1));
    expect(Math.abs(top - all[49])).toBeLessThanOrEqual(50 * 50 * Number.EPSILON * 4);
  });
});
