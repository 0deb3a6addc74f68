import { describe, expect, it } from 'vitest';
import { ensembleConstants, ensembleLabel, sparseProbability, type EnsembleSpec } from '../../../harness/numeric/ensemble.js';
import { randomStream } from '../../../harness/numeric/random-stream.js';
import { sampleMatrix } from '../../../harness/numeric/sample-wigner.js';
import { hermitianDefect, type SquareMatrix } from '../../../harness/numeric/square-matrix.js';
import { expectWithinStandardErrors, meanAndStandardError } from './hypothesis-checks.js';

/**
 * Entry-level moments of the sampled ensembles against the conventions of THEORY.md
 * ("Conventions") and the κ4 of ensemble.ts. Entries of one matrix are independent up to symmetry
 * and identically distributed off the diagonal (likewise on it), so the upper-triangle entries of
 * many matrices pool into one i.i.d. sample; the moments are exact at every N (no finite-N
 * allowance is needed), and each mean is z-tested with the standard error estimated from the
 * sample itself (hypothesis-checks.ts: |z| ≤ 4.5, false alarm ≈ 6.8·10⁻⁶ per comparison).
 */
const N = 12;
const MATRICES = 300;

/** E x⁴ / (E x²)² of the unit-variance diagonal laws: gaussian 3, rademacher 1, uniform 9/5 (exact). */
const DIAGONAL_KURTOSIS = { gaussian: 3, rademacher: 1, uniform: 9 / 5, zero: 0 } as const;

const SPECS: EnsembleSpec[] = [
  { kind: 'goe' },
  { kind: 'gue' },
  { kind: 'wigner', field: 'real', offDiagonal: 'gaussian', diagonal: 'zero', diagonalVariance: 0 },
  { kind: 'wigner', field: 'real', offDiagonal: 'rademacher', diagonal: 'rademacher', diagonalVariance: 0.5 },
  { kind: 'wigner', field: 'real', offDiagonal: 'uniform', diagonal: 'uniform', diagonalVariance: 1.5 },
  { kind: 'wigner', field: 'real', offDiagonal: 'sparse-bernoulli', meanDegree: 3, diagonal: 'gaussian', diagonalVariance: 1 },
  { kind: 'wigner', field: 'complex', offDiagonal: 'gaussian', diagonal: 'uniform', diagonalVariance: 2 },
  { kind: 'wigner', field: 'complex', offDiagonal: 'rademacher', diagonal: 'gaussian', diagonalVariance: 1 },
  { kind: 'wigner', field: 'complex', offDiagonal: 'uniform', diagonal: 'zero', diagonalVariance: 0 },
  { kind: 'wigner', field: 'complex', offDiagonal: 'sparse-bernoulli', meanDegree: 3, diagonal: 'rademacher', diagonalVariance: 3 },
];

interface EntrySample {
  readonly offRe: Float64Array;
  readonly offIm: Float64Array;
  readonly diagRe: Float64Array;
  readonly worstDefect: number;
  readonly worstDiagonalIm: number;
}

function collectEntries(spec: EnsembleSpec, seed: number): EntrySample {
  const offCount = (MATRICES * N * (N - 1)) / 2;
  const offRe = new Float64Array(offCount);
  const offIm = new Float64Array(offCount);
  const diagRe = new Float64Array(MATRICES * N);
  let worstDefect = 0;
  let worstDiagonalIm = 0;
  let o = 0;
  for (let m = 0; m < MATRICES; m++) {
    const h: SquareMatrix = sampleMatrix(spec, N, randomStream(seed, ensembleLabel(spec), m));
    worstDefect = Math.max(worstDefect, hermitianDefect(h));
    const stride = h.field === 'complex' ? 2 : 1;
    for (let i = 0; i < N; i++) {
      diagRe[m * N + i] = h.data[stride * (i * N + i)];
      if (stride === 2) worstDiagonalIm = Math.max(worstDiagonalIm, Math.abs(h.data[2 * (i * N + i) + 1]));
      for (let j = i + 1; j < N; j++) {
        offRe[o] = h.data[stride * (i * N + j)];
        offIm[o] = stride === 2 ? h.data[2 * (i * N + j) + 1] : 0;
        o++;
      }
    }
  }
  return { offRe, offIm, diagRe, worstDefect, worstDiagonalIm };
}

function mapped(n: number, f: (k: number) => number): Float64Array {
  const out = new Float64Array(n);
  for (let k = 0; k < n; k++) out[k] = f(k);
  return out;
}

function expectMean(label: string, values: Float64Array, expected: number): void {
  const { mean, standardError } = meanAndStandardError(values);
  if (standardError < 1e-12 * Math.max(1, Math.abs(mean))) {
    // The statistic is constant under this law (e.g. |h|² for Rademacher entries): no sampling
    // error, so the mean must equal the expectation up to rounding (a few ulps per term).
    expect(Math.abs(mean - expected), `${label}: observed ${mean}, expected ${expected}`).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(expected)));
    return;
  }
  expectWithinStandardErrors(label, mean, expected, standardError);
}

describe('sampleMatrix: moments of the entries per law', () => {
  SPECS.forEach((spec, s) => {
    const name = ensembleLabel(spec);
    it(`${name}: Hermitian, centred, E|h|² = 1/N, κ4 as in ensemble.ts, Var h_ii = σ_d²/N`, () => {
      const e = collectEntries(spec, 1000 + s);
      const constants = ensembleConstants(spec, N);
      const complex = constants.field === 'complex';
      const n = e.offRe.length;
      expect(e.worstDefect, 'max |h_ij − conj h_ji|').toBe(0);
      expect(e.worstDiagonalIm, 'max |Im h_ii|').toBe(0);

      // Off-diagonal: mean, variance 1/N and the fourth moment N²E|h|⁴ = κ4 + 3 (real) or + 2 (complex).
      const sqrtN = Math.sqrt(N);
      const modulus2 = mapped(n, (k) => N * (e.offRe[k] ** 2 + e.offIm[k] ** 2));
      expectMean(`${name}: √N E Re h_ij`, mapped(n, (k) => sqrtN * e.offRe[k]), 0);
      expectMean(`${name}: N E|h_ij|²`, modulus2, 1);
      expectMean(`${name}: N² E|h_ij|⁴ − ${complex ? 2 : 3} (κ4)`, mapped(n, (k) => modulus2[k] ** 2 - (complex ? 2 : 3)), constants.kappa4);
      if (complex) {
        // E h² = 0: the pseudo-variance N E h_ij² = N E(a² − b²) + 2i N E ab vanishes.
        expectMean(`${name}: √N E Im h_ij`, mapped(n, (k) => sqrtN * e.offIm[k]), 0);
        expectMean(`${name}: N E Re h_ij²`, mapped(n, (k) => N * (e.offRe[k] ** 2 - e.offIm[k] ** 2)), 0);
        expectMean(`${name}: N E Im h_ij²`, mapped(n, (k) => 2 * N * e.offRe[k] * e.offIm[k]), 0);
      }

      // Diagonal: centred, N E h_ii² = σ_d², N² E h_ii⁴ = σ_d⁴ · kurtosis of the diagonal law.
      const d = e.diagRe.length;
      const sigma2 = constants.diagonalVariance;
      const law = spec.kind === 'wigner' ? spec.diagonal : 'gaussian';
      if (law === 'zero') {
        expect(e.diagRe.every((x) => Object.is(x, 0))).toBe(true);
      } else {
        const diag2 = mapped(d, (k) => N * e.diagRe[k] ** 2);
        expectMean(`${name}: √N E h_ii`, mapped(d, (k) => sqrtN * e.diagRe[k]), 0);
        expectMean(`${name}: N E h_ii² (σ_d²)`, diag2, sigma2);
        expectMean(`${name}: N² E h_ii⁴`, mapped(d, (k) => diag2[k] ** 2), sigma2 ** 2 * DIAGONAL_KURTOSIS[law]);
      }
    });
  });
});

describe('sampleMatrix: supports of the bounded laws (exact)', () => {
  const s = 1 / Math.sqrt(N);
  const tol = 1e-15;

  it('real Rademacher entries are ±1/√N and the diagonal ±σ_d/√N', () => {
    const e = collectEntries(SPECS[3], 7);
    expect(e.offRe.every((x) => Math.abs(Math.abs(x) - s) <= tol)).toBe(true);
    expect(e.diagRe.every((x) => Math.abs(Math.abs(x) - Math.sqrt(0.5 / N)) <= tol)).toBe(true);
  });

  it('complex Rademacher entries are (±1 ± i)/√(2N) with all four phases present', () => {
    const e = collectEntries(SPECS[7], 8);
    const quadrants = new Set<string>();
    let offSupport = 0;
    for (let k = 0; k < e.offRe.length; k++) {
      const a = s * Math.SQRT1_2;
      if (Math.abs(Math.abs(e.offRe[k]) - a) > tol || Math.abs(Math.abs(e.offIm[k]) - a) > tol) offSupport++;
      quadrants.add(`${Math.sign(e.offRe[k])}${Math.sign(e.offIm[k])}`);
    }
    expect(offSupport, 'entries off the support').toBe(0);
    expect(quadrants.size).toBe(4);
  });

  it('uniform entries stay inside [−√3, √3]/√N (real) and the square [−√(3/2), √(3/2)]²/√N (complex)', () => {
    const real = collectEntries(SPECS[4], 9);
    expect(real.offRe.every((x) => Math.abs(x) <= Math.sqrt(3) * s)).toBe(true);
    const cplx = collectEntries(SPECS[8], 10);
    const edge = Math.sqrt(1.5) * s;
    expect(cplx.offRe.every((x, k) => Math.abs(x) <= edge && Math.abs(cplx.offIm[k]) <= edge)).toBe(true);
  });

  it('sparse entries are 0 or of modulus 1/√(pN), non-zero with probability p = d/N (binomial z-test)', () => {
    for (const spec of [SPECS[5], SPECS[9]]) {
      const p = sparseProbability(N, 3);
      const e = collectEntries(spec, 11);
      const n = e.offRe.length;
      let nonZero = 0;
      for (let k = 0; k < n; k++) {
        const r2 = e.offRe[k] ** 2 + e.offIm[k] ** 2;
        if (r2 === 0) continue;
        nonZero++;
        expect(Math.abs(r2 * p * N - 1)).toBeLessThanOrEqual(1e-14);
      }
      expectWithinStandardErrors(`${ensembleLabel(spec)}: fraction non-zero`, nonZero / n, p, Math.sqrt((p * (1 - p)) / n));
    }
  });
});

describe('sampleMatrix: determinism and draw order', () => {
  it('gives the same matrix for the same spec, size and stream, and a different one for another index', () => {
    for (const spec of SPECS) {
      const a = sampleMatrix(spec, 9, randomStream(5, 'det', 3));
      const b = sampleMatrix(spec, 9, randomStream(5, 'det', 3));
      const c = sampleMatrix(spec, 9, randomStream(5, 'det', 4));
      expect(Array.from(a.data)).toEqual(Array.from(b.data));
      expect(Array.from(a.data)).not.toEqual(Array.from(c.data));
    }
  });

  it('fills the upper triangle row by row, diagonal first (GOE: h_00 = √(2/N) z₁, h_01 = z₂/√N, h_02 = z₃/√N, h_11 = √(2/N) z_N+1)', () => {
    const size = 5;
    const h = sampleMatrix({ kind: 'goe' }, size, randomStream(1, 'order', 0));
    const s = randomStream(1, 'order', 0);
    const z = Array.from({ length: size + 1 }, () => s.nextNormal());
    expect(h.data[0]).toBe(Math.sqrt(2 / size) * z[0]);
    expect(h.data[1]).toBe((1 / Math.sqrt(size)) * z[1]);
    expect(h.data[2]).toBe((1 / Math.sqrt(size)) * z[2]);
    expect(h.data[size + 1]).toBe(Math.sqrt(2 / size) * z[size]);
    expect(h.data[size]).toBe(h.data[1]);
  });

  it('samples GOE as the real Gaussian Wigner ensemble with σ_d² = 2 and GUE as the complex one with σ_d² = 1', () => {
    const goe = sampleMatrix({ kind: 'goe' }, 6, randomStream(2, 'same', 0));
    const wr = sampleMatrix({ kind: 'wigner', field: 'real', offDiagonal: 'gaussian', diagonal: 'gaussian', diagonalVariance: 2 }, 6, randomStream(2, 'same', 0));
    expect(Array.from(goe.data)).toEqual(Array.from(wr.data));
    const gue = sampleMatrix({ kind: 'gue' }, 6, randomStream(2, 'same', 0));
    const wc = sampleMatrix({ kind: 'wigner', field: 'complex', offDiagonal: 'gaussian', diagonal: 'gaussian', diagonalVariance: 1 }, 6, randomStream(2, 'same', 0));
    expect(Array.from(gue.data)).toEqual(Array.from(wc.data));
  });

  it('rejects sizes that are not positive integers and sparse ensembles without a degree', () => {
    expect(() => sampleMatrix({ kind: 'goe' }, 0, randomStream(0, 'bad', 0))).toThrow(RangeError);
    expect(() => sampleMatrix({ kind: 'goe' }, 2.5, randomStream(0, 'bad', 0))).toThrow(RangeError);
    expect(() =>
      sampleMatrix({ kind: 'wigner', field: 'real', offDiagonal: 'sparse-bernoulli', diagonal: 'zero', diagonalVariance: 0 }, 4, randomStream(0, 'bad', 0)),
    ).toThrow(RangeError);
  });
});
