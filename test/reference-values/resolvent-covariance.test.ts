import { describe, expect, it } from 'vitest';
import { type Complex, abs, add, complex, div, mul, scale, sub } from '../../harness/numeric/complex.js';
import { eigenpairs } from '../../harness/numeric/eigen.js';
import { type EnsembleConstants, type EnsembleSpec, ensembleConstants, ensembleLabel, parseEnsemble } from '../../harness/numeric/ensemble.js';
import { eigenbasisDiagonal, normalisedResolventTrace, weightedResolventTrace } from '../../harness/numeric/resolvent-statistics.js';
import { type SquareMatrix, identityMatrix, zeroMatrix } from '../../harness/numeric/square-matrix.js';
import { complexLinearStatisticCovariance } from '../../reference-values/linear-statistic-variance.js';
import {
  resolventCovariance,
  tracelessResolventCovariance,
  tracialResolventCovariance,
  weightOverlaps,
} from '../../reference-values/resolvent-covariance.js';
import { stieltjesSemicircle } from '../../reference-values/semicircle-law.js';
import { covarianceEstimate, criticalValue, expectAgreement, expectClose, expectRejection, forEachSample } from './fluctuation-estimates.js';

const GOE: EnsembleConstants = { field: 'real', beta: 1, diagonalVariance: 2, kappa4: 0 };
const GUE: EnsembleConstants = { field: 'complex', beta: 2, diagonalVariance: 1, kappa4: 0 };


/** 1/(x − z) as a complex-valued function of real x. */
const resolventFunction =
  (z: Complex) =>
  (x: number): Complex =>
    div(complex(1, 0), complex(x - z.re, -z.im));

describe('tracialResolventCovariance: closed form (Khorunzhy, Khoruzhenko and Pastur 1996; Bai and Silverstein 2010, ch. 9)', () => {
  const points: Complex[] = [complex(0.3, 0.5), complex(-1.1, -0.4), complex(2.5, 0.1), complex(0, 3), complex(-1.9, 0.05)];
  const ensembles: EnsembleConstants[] = [GOE, GUE, { field: 'real', beta: 1, diagonalVariance: 0.7, kappa4: -1.3 }, { field: 'complex', beta: 2, diagonalVariance: 0, kappa4: 2 }];

  it('is the resolvent case of the linear-statistic covariance (Chebyshev form, Bai and Yao 2005)', () => {
    // Independent route: Chebyshev coefficients of 1/(x − z) by quadrature, then
    // (1/(2β))Σ k c_k c_k′ + (σ_d² − 2/β)c_1c_1′/4 + κ4 c_2c_2′/2. Both are double-precision
    // computations of O(1) quantities with O(1/η) condition; 1e-10 relative is ample.
    for (const c of ensembles) {
      for (const [i, j] of [[0, 1], [0, 3], [2, 0], [3, 3], [1, 1]]) {
        const [z1, z2] = [points[i], points[j]];
        const expected = complexLinearStatisticCovariance(resolventFunction(z1), resolventFunction(z2), c);
        expectClose(`z1 = ${z1.re}+${z1.im}i, z2 = ${z2.re}+${z2.im}i, β = ${c.beta}`, tracialResolventCovariance(z1, z2, c), expected, 1e-10 * (1 + abs(expected)));
      }
    }
  });

  it('is the mixed second derivative of −(2/β)log(1 − m1m2) + (σ_d² − 2/β)m1m2 + (κ4/2)m1²m2² (central differences)', () => {
    // Four-point central difference with step h: truncation O(h²·|∂⁴|), rounding O(ε|F|/h²);
    // h = 1e-3 gives about 1e-6 relative at these points (|z ∓ 2| ≥ 0.5).
    const h = 1e-3;
    for (const c of ensembles) {
      const F = (z1: Complex, z2: Complex): Complex => {
        const m1 = stieltjesSemicircle(z1);
        const p = mul(m1, stieltjesSemicircle(z2));
        const one = sub(complex(1, 0), p);
        const log = complex(Math.log(abs(one)), Math.atan2(one.im, one.re));
        return add(add(scale(log, -2 / c.beta), scale(p, c.diagonalVariance - 2 / c.beta)), scale(mul(p, p), c.kappa4 / 2));
      };
      for (const [z1, z2] of [
        [points[0], points[1]],
        [points[0], points[3]],
        [points[2], points[0]],
      ]) {
        const d = complex(h, 0);
        const mixed = scale(sub(sub(add(F(add(z1, d), add(z2, d)), F(sub(z1, d), sub(z2, d))), F(add(z1, d), sub(z2, d))), F(sub(z1, d), add(z2, d))), 1 / (4 * h * h));
        const exact = tracialResolventCovariance(z1, z2, c);
        expectClose(`∂1∂2 F at ${z1.re}+${z1.im}i, ${z2.re}+${z2.im}i`, exact, mixed, 1e-5 * (1 + abs(exact)));
      }
    }
  });

  it('has the conjugation symmetry Cov(Tr G(z̄1), Tr G(z̄2)) = conj Cov(Tr G(z1), Tr G(z2)) and is symmetric', () => {
    for (const c of ensembles) {
      const a = tracialResolventCovariance(points[0], points[4], c);
      expectClose('conjugate', tracialResolventCovariance(complex(0.3, -0.5), complex(-1.9, -0.05), c), complex(a.re, -a.im), 1e-12 * abs(a));
      expectClose('symmetric', tracialResolventCovariance(points[4], points[0], c), a, 1e-12 * abs(a));
    }
  });
});

describe('tracelessResolventCovariance and weightOverlaps: exact relations', () => {
  it('reduce at large |z| to Cov(Tr HÅ1, Tr HÅ2) = S + (σ_d² − 2/β)⟨d(Å1)d(Å2)⟩ (Wick: E h_ij h_kl for the ensemble)', () => {
    // m(z) = −1/z − 1/z³ + …, so z1²z2²·Cov → S + (σ_d² − 2/β)⟨dd⟩ with relative error O(1/|z|²).
    // The right side is the exact covariance of Tr HÅ1 and Tr HÅ2 from the entry covariances
    // E h_ij h_kl = (δ_il δ_jk + [β = 1] δ_ik δ_jl)/N off the diagonal and σ_d²/N on it.
    const N = 7;
    const a = complexWeight(N, (i, j) => complex(Math.cos(i + 2 * j), 0.3 * Math.sin(i * j + 1)));
    const b = complexWeight(N, (i, j) => complex(0.5 * Math.sin(2 * i - j), Math.cos(i + j) / (1 + i)));
    for (const c of [GOE, GUE, { field: 'real' as const, beta: 1 as const, diagonalVariance: 0, kappa4: -2 }]) {
      const o = weightOverlaps(a, b, c.beta);
      const z = complex(0, 1e4);
      const scaled = mul(tracelessResolventCovariance(z, z, o, c), mul(mul(z, z), mul(z, z)));
      const exact = directHCovariance(a, b, c);
      expectClose(`β = ${c.beta}, σ_d² = ${c.diagonalVariance}`, scaled, exact, 1e-6 * (1 + abs(exact)));
    }
  });

  it('weightOverlaps: pairing is bilinear and uses the transpose for β = 1 only; identity weights have zero overlaps', () => {
    const N = 5;
    // E_{01}: ⟨E01 E01⟩ = 0, ⟨E01 E01ᵀ⟩ = 1/N; traceless already.
    const e01 = complexWeight(N, (i, j) => complex(i === 0 && j === 1 ? 1 : 0, 0));
    expectClose('β = 2', weightOverlaps(e01, e01, 2).pairing, complex(0, 0), 0);
    expectClose('β = 1', weightOverlaps(e01, e01, 1).pairing, complex(1 / N, 0), 1e-15);
    const iw = complex(0, 1);
    const ie01 = complexWeight(N, (i, j) => (i === 0 && j === 1 ? iw : complex(0, 0)));
    expectClose('bilinear: (iE01, iE01) gives −1/N', weightOverlaps(ie01, ie01, 1).pairing, complex(-1 / N, 0), 1e-15);
    const o = weightOverlaps(identityMatrix('real', N), e01, 1);
    expectClose('identity', add(o.pairing, o.diagonal), complex(0, 0), 0);
    expect(() => weightOverlaps(identityMatrix('real', 3), identityMatrix('real', 4), 1)).toThrow(RangeError);
  });
});

/** A complex N×N weight from its entries. */
function complexWeight(N: number, entry: (i: number, j: number) => Complex): SquareMatrix {
  const m = zeroMatrix('complex', N);
  for (let i = 0; i < N; i++) {
    for (let j = 0; j < N; j++) {
      const v = entry(i, j);
      m.data[2 * (i * N + j)] = v.re;
      m.data[2 * (i * N + j) + 1] = v.im;
    }
  }
  return m;
}

/** Cov(Tr HÅ1, Tr HÅ2) = Σ E[h_ij h_kl] (Å1)_ji (Å2)_lk from the entry covariances (see the test). */
function directHCovariance(a: SquareMatrix, b: SquareMatrix, c: EnsembleConstants): Complex {
  const N = a.size;
  const centred = (m: SquareMatrix): Complex[][] => {
    let t = complex(0, 0);
    for (let i = 0; i < N; i++) t = add(t, complex(m.data[2 * (i * N + i)], m.data[2 * (i * N + i) + 1]));
    t = scale(t, 1 / N);
    return Array.from({ length: N }, (_, i) =>
      Array.from({ length: N }, (_, j) => sub(complex(m.data[2 * (i * N + j)], m.data[2 * (i * N + j) + 1]), i === j ? t : complex(0, 0))),
    );
  };
  const A = centred(a);
  const B = centred(b);
  let sum = complex(0, 0);
  for (let i = 0; i < N; i++) {
    for (let j = 0; j < N; j++) {
      if (i === j) {
        sum = add(sum, scale(mul(A[i][i], B[i][i]), c.diagonalVariance));
        continue;
      }
      // E h_ij h_ji = 1/N (both fields); E h_ij h_ij = 1/N for β = 1 (real symmetric), 0 for β = 2.
      sum = add(sum, mul(A[j][i], B[i][j]));
      if (c.beta === 1) sum = add(sum, mul(A[j][i], B[j][i]));
    }
  }
  return scale(sum, 1 / N);
}

/**
 * Simulation. Weights (N = 64): D = diag(cos(2πi/N) + 0.3) (real, ⟨D⟩ = 0.3, so the general form
 * mixes tracial and traceless parts); B complex and non-Hermitian, B_{i,i+1 mod N} = e^{2πi·0.37i},
 * B_ii = (0.4 + 0.5i)cos(2πi/N) + 0.2 sin(4πi/N); B* its conjugate transpose. For B, ⟨B̊B̊⟩ is small
 * while ⟨B̊B̊ᵀ⟩ and ⟨B̊B̊*⟩ are about 1, so the pairs (B, B) and (B, B*) separate β = 1 from β = 2.
 *
 * Budget: one eigendecomposition per sample (`eigenpairs`), 1000 samples per ensemble, five
 * ensembles. Standard errors of the covariances are 2–5 % of their size.
 *
 * Allowance: the formulas are limits; finite-N deviations are O(1/N) (THEORY.md: two-resolvent
 * quantities deviate by (0.3–0.6)/N). Pilot runs (numpy, N = 64, 6000–10⁴ samples, all five
 * ensembles, the same weights and points) found every N·(observed − limit) within 1.9 pilot SE of 0,
 * the pilot SE being 0.04–1.9 in these units; the allowance is (0.3 + 2|reference|)/N, which with
 * z·SE covers deviations several times the pilot's resolution.
 *
 * False alarms: 8 covariances × 2 components × 5 ensembles = 80 comparisons at family level 10⁻³
 * (Bonferroni), critical value z_{α/2} with α = 10⁻³/80.
 *
 * Power: for the two real zero-diagonal ensembles the formula without its bracket, and for the
 * Rademacher one also the formula without the κ4 term, must be rejected at the same critical value
 * and allowance, at the pair (0.3 ± 0.5i) where the bracket is large (|m|² = 0.61). References there:
 * zero-diagonal Gaussian 0.71 (1.08 without the bracket); Rademacher 0.45 (1.05 without the bracket,
 * 0.68 without the κ4 term); standard errors 0.015–0.023.
 */
const N = 64;
const SAMPLES = 1000;
const SEED = 20240611;
const Z = criticalValue(1e-3 / 80);
const ALLOWANCE = (reference: Complex): number => (0.3 + 2 * abs(reference)) / N;

function weightD(): SquareMatrix {
  return complexWeight(N, (i, j) => complex(i === j ? Math.cos((2 * Math.PI * i) / N) + 0.3 : 0, 0));
}

function weightB(): SquareMatrix {
  return complexWeight(N, (i, j) => {
    if (j === (i + 1) % N) return complex(Math.cos(2 * Math.PI * 0.37 * i), Math.sin(2 * Math.PI * 0.37 * i));
    if (i === j) return add(scale(complex(0.4, 0.5), Math.cos((2 * Math.PI * i) / N)), complex(0.2 * Math.sin((4 * Math.PI * i) / N), 0));
    return complex(0, 0);
  });
}

function conjugateTranspose(m: SquareMatrix): SquareMatrix {
  return complexWeight(m.size, (i, j) => complex(m.data[2 * (j * m.size + i)], -m.data[2 * (j * m.size + i) + 1]));
}

interface Case {
  readonly label: string;
  readonly z1: Complex;
  readonly a1: SquareMatrix | null;
  readonly z2: Complex;
  readonly a2: SquareMatrix | null;
}

const D = weightD();
const B = weightB();
const BSTAR = conjugateTranspose(B);
const UP = complex(0, 1);
const DOWN = complex(0, -1);
const ZA = complex(0.5, 0.5);
const ZB = complex(-1, 0.3);
const CASES: readonly Case[] = [
  { label: 'Tr G(i), Tr G(−i)', z1: UP, a1: null, z2: DOWN, a2: null },
  { label: 'Tr G(0.5+0.5i), Tr G(−1+0.3i)', z1: ZA, a1: null, z2: ZB, a2: null },
  { label: 'Tr G(i)D, Tr G(−i)D', z1: UP, a1: D, z2: DOWN, a2: D },
  { label: 'Tr G(0.5+0.5i)B, Tr G(−1+0.3i)B*', z1: ZA, a1: B, z2: ZB, a2: BSTAR },
  { label: 'Tr G(i)B, Tr G(−i)B', z1: UP, a1: B, z2: DOWN, a2: B },
  { label: 'Tr G(0.5+0.5i)D, Tr G(−1+0.3i)B', z1: ZA, a1: D, z2: ZB, a2: B },
  { label: 'Tr G(i), Tr G(−i)D', z1: UP, a1: null, z2: DOWN, a2: D },
  { label: 'Tr G(0.3+0.5i)D, Tr G(0.3−0.5i)D', z1: complex(0.3, 0.5), a1: D, z2: complex(0.3, -0.5), a2: D },
];
const BRACKET_CASE = 7;

/** The statistics Tr G(z)A of every case for n samples of an ensemble. */
function simulate(spec: EnsembleSpec): { x: Complex[][]; y: Complex[][] } {
  const x: Complex[][] = CASES.map(() => []);
  const y: Complex[][] = CASES.map(() => []);
  const weights = [D, B, BSTAR];
  forEachSample(spec, N, SAMPLES, SEED, `resolvent-covariance ${ensembleLabel(spec)}`, (h) => {
    const decomp = eigenpairs(h);
    const diagonals = new Map(weights.map((w) => [w, eigenbasisDiagonal(decomp, w)]));
    const trace = (z: Complex, a: SquareMatrix | null): Complex =>
      scale(a === null ? normalisedResolventTrace(decomp.values, z) : weightedResolventTrace(decomp.values, diagonals.get(a)!, z), N);
    CASES.forEach((k, i) => {
      x[i].push(trace(k.z1, k.a1));
      y[i].push(trace(k.z2, k.a2));
    });
  });
  return { x, y };
}

/**
 * The covariance with the bracket's κ4 term only, or the whole bracket, left out: what a formula
 * missing those terms would predict.
 */
function withoutBracketTerms(k: Case, c: EnsembleConstants, dropSigma: boolean): Complex {
  const reduced: EnsembleConstants = { ...c, kappa4: 0, diagonalVariance: dropSigma ? 2 / c.beta : c.diagonalVariance };
  const o = weightOverlaps(k.a1!, k.a2!, c.beta);
  const tracial = resolventCovariance(k.z1, identityTimes(k.a1!), k.z2, identityTimes(k.a2!), c);
  return add(tracial, tracelessResolventCovariance(k.z1, k.z2, o, reduced));
}

/** ⟨A⟩I, so that resolventCovariance gives ⟨A1⟩⟨A2⟩ times the tracial covariance. */
function identityTimes(a: SquareMatrix): SquareMatrix {
  let t = complex(0, 0);
  for (let i = 0; i < a.size; i++) t = add(t, complex(a.data[2 * (i * a.size + i)], a.data[2 * (i * a.size + i) + 1]));
  t = scale(t, 1 / a.size);
  return complexWeight(a.size, (i, j) => (i === j ? t : complex(0, 0)));
}

describe('resolventCovariance against simulation (the project engine: sampleMatrix, eigenpairs, weightedResolventTrace)', () => {
  const ensembles: ReadonlyArray<[string, 'none' | 'bracket' | 'bracket and κ4']> = [
    ['goe', 'none'],
    ['gue', 'none'],
    // σ_d² = 0: the bracket is −2m1²m2²⟨dd⟩ (Gaussian off-diagonal, κ4 = 0).
    ['wigner:real:gaussian:diag=zero', 'bracket'],
    // σ_d² = 0 and κ4 = −2.
    ['wigner:real:rademacher:diag=zero', 'bracket and κ4'],
    // β = 2, σ_d² = 1 = 2/β, κ4 = −1: the bracket is the κ4 term alone, about 24 % of the total at
    // 0.3 ± 0.5i, too little against this sample size for a reliable rejection (power about 0.7).
    ['wigner:complex:rademacher:diag=gaussian:1', 'none'],
  ];
  for (const [label, power] of ensembles) {
    it(`${label}: every covariance within allowance + ${Z.toFixed(2)} SE${power === 'none' ? '' : `; formulas without the ${power} term rejected`}`, () => {
      const spec = parseEnsemble(label);
      const c = ensembleConstants(spec, N);
      const { x, y } = simulate(spec);
      CASES.forEach((k, i) => {
        const reference = resolventCovariance(k.z1, k.a1, k.z2, k.a2, c);
        expectAgreement(`${label}, ${k.label}`, covarianceEstimate(x[i], y[i]), reference, ALLOWANCE(reference), Z);
      });
      const k = CASES[BRACKET_CASE];
      const observed = covarianceEstimate(x[BRACKET_CASE], y[BRACKET_CASE]);
      if (power !== 'none') {
        const wrong = withoutBracketTerms(k, c, true);
        expectRejection(`${label}, ${k.label} without the bracket`, observed, wrong, ALLOWANCE(wrong), Z);
      }
      if (power === 'bracket and κ4') {
        const wrong = withoutBracketTerms(k, c, false);
        expectRejection(`${label}, ${k.label} without the κ4 term`, observed, wrong, ALLOWANCE(wrong), Z);
      }
    });
  }
});
