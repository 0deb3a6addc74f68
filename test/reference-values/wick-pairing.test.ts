import { describe, expect, it } from 'vitest';
import { type Complex, ONE, abs, add, complex, mul, scale, sub } from '../../harness/numeric/complex.js';
import { eigenvalues } from '../../harness/numeric/eigen.js';
import { ensembleConstants, parseEnsemble } from '../../harness/numeric/ensemble.js';
import { randomStream } from '../../harness/numeric/random-stream.js';
import { normalisedResolventTrace } from '../../harness/numeric/resolvent-statistics.js';
import { tracialResolventCovariance } from '../../reference-values/resolvent-covariance.js';
import { centredJointCumulant4, jointCumulant, pairingSum, sampleJointCumulant4 } from '../../reference-values/wick-pairing.js';
import { gaussianMoment, pairings } from './exact-moment-enumeration.js';
import { criticalValue, expectAgreement, expectClose, forEachSample } from './fluctuation-estimates.js';


/** A fixed pseudo-random complex covariance table (linear congruential; any numbers will do). */
function table(size: number): Complex[][] {
  let state = 20240611;
  const next = (): number => ((state = (state * 1103515245 + 12345) % 2 ** 31) / 2 ** 31) * 2 - 1;
  const t: Complex[][] = Array.from({ length: size }, () => new Array<Complex>(size));
  for (let i = 0; i < size; i++) for (let j = i; j < size; j++) t[i][j] = t[j][i] = complex(next(), next());
  return t;
}

describe('pairingSum (Isserlis 1918, Biometrika 12)', () => {
  it('gives the Gaussian moments (2k − 1)!!, 0 for odd order, 1 for no indices', () => {
    const unit = (): Complex => ONE;
    for (let k = 0; k <= 8; k++) {
      expectClose(`E x^${2 * k}`, pairingSum(unit, new Array(2 * k).fill(0)), complex(Number(gaussianMoment(2 * k)), 0), 0);
      expectClose(`E x^${2 * k + 1}`, pairingSum(unit, new Array(2 * k + 1).fill(0)), complex(0, 0), 0);
    }
  });

  it('equals the brute-force sum over the perfect matchings (enumerated independently) with complex covariances', () => {
    const t = table(6);
    const cov = (i: number, j: number): Complex => t[i][j];
    for (const indices of [[0, 1, 2, 3], [0, 1, 2, 3, 4, 5], [2, 2, 5, 1, 0, 5], [3, 1, 4, 1, 5, 2, 0, 4]]) {
      let expected = complex(0, 0);
      for (const matching of pairings(indices.length)) {
        let p = ONE;
        for (const [a, b] of matching) p = mul(p, cov(indices[a], indices[b]));
        expected = add(expected, p);
      }
      expectClose(`indices ${indices}`, pairingSum(cov, indices), expected, 1e-12 * (1 + abs(expected)));
    }
    // The three pairings of four, written out.
    const four = add(add(mul(t[0][1], t[2][3]), mul(t[0][2], t[1][3])), mul(t[0][3], t[1][2]));
    expectClose('three pairings', pairingSum(cov, [0, 1, 2, 3]), four, 1e-15);
  });
});

describe('jointCumulant and the fourth cumulant (McCullagh 1987, ch. 2)', () => {
  it('gives every cumulant λ for a Poisson variable (moments: Touchard polynomials Σ_k S(n, k) λ^k)', () => {
    // Stirling numbers of the second kind by S(n, k) = k S(n − 1, k) + S(n − 1, k − 1) (common practice).
    const lambda = 1.7;
    const stirling: number[][] = [[1]];
    for (let n = 1; n <= 8; n++) {
      stirling.push(Array.from({ length: n + 1 }, (_, k) => (k === 0 ? 0 : k * (stirling[n - 1][k] ?? 0) + (stirling[n - 1][k - 1] ?? 0))));
    }
    const moment = (block: readonly number[]): Complex => complex(stirling[block.length].reduce((s, v, k) => s + v * lambda ** k, 0), 0);
    for (let n = 1; n <= 8; n++) expectClose(`κ_${n}`, jointCumulant(moment, n), complex(lambda, 0), 1e-11 * lambda ** n * 10);
  });

  it('vanishes for Gaussian moments of order ≥ 3 and reduces to the covariance at order 2', () => {
    const t = table(5);
    const means = [complex(0.3, -0.1), complex(-1, 0.2), complex(0.5, 0.5), complex(0, 1), complex(2, 0)];
    // Moments of a Gaussian vector with means μ: E Π_{i∈B} X_i = Σ over subsets S ⊆ B of Π_{B∖S} μ · pairingSum over S.
    const moment = (block: readonly number[]): Complex => {
      let total = complex(0, 0);
      for (let mask = 0; mask < 1 << block.length; mask++) {
        const paired = block.filter((_, i) => (mask >> i) & 1);
        let term = pairingSum((i, j) => t[i][j], paired);
        block.forEach((v, i) => {
          if (((mask >> i) & 1) === 0) term = mul(term, means[v]);
        });
        total = add(total, term);
      }
      return total;
    };
    expectClose('order 2', jointCumulant((b) => moment(b.map((i) => [1, 3][i])), 2), t[1][3], 1e-13);
    for (const variables of [[0, 1, 2], [0, 1, 2, 3], [4, 4, 1, 2], [0, 1, 2, 3, 4]]) {
      expectClose(`order ${variables.length}`, jointCumulant((b) => moment(b.map((i) => variables[i])), variables.length), complex(0, 0), 1e-11);
    }
    // Centred: the short form agrees with the general one, for Gaussian moments (0) and for a
    // non-Gaussian fourth moment (the excess itself).
    const cov = (i: number, j: number): Complex => t[i][j];
    const centredMoment = (b: readonly number[]): Complex => (b.length === 4 ? add(pairingSum(cov, b), complex(0.25, -0.5)) : pairingSum(cov, b));
    expectClose('centred Gaussian', centredJointCumulant4(pairingSum(cov, [0, 1, 2, 3]), cov), complex(0, 0), 1e-15);
    expectClose('centred, excess 0.25 − 0.5i', centredJointCumulant4(centredMoment([0, 1, 2, 3]), cov), jointCumulant(centredMoment, 4), 1e-13);
  });

  it('sampleJointCumulant4 estimates κ4 = −6/5 of a uniform law (batch-means standard error, 4.5 SE)', () => {
    // Uniform on [−√3, √3]: variance 1, E x⁴ = 9/5, κ4 = −6/5. 20 batches of 2000; the batch means
    // give the standard error (common practice); the plug-in bias O(1/n) is negligible at n = 2000.
    const batches: number[] = [];
    for (let b = 0; b < 20; b++) {
      const stream = randomStream(5, 'wick-pairing uniform', b);
      const x = Array.from({ length: 2000 }, () => complex(Math.sqrt(3) * (2 * stream.nextUniform() - 1), 0));
      batches.push(sampleJointCumulant4([x, x, x, x]).re);
    }
    const mean = batches.reduce((s, v) => s + v, 0) / batches.length;
    const se = Math.sqrt(batches.reduce((s, v) => s + (v - mean) ** 2, 0) / (batches.length - 1) / batches.length);
    expect(Math.abs(mean + 6 / 5), `mean ${mean}, SE ${se}`).toBeLessThanOrEqual(4.5 * se);
  });
});

/**
 * The Wick rule for trace statistics (THEORY.md, "Wick rule"): for X_j = Tr G(z_j) − E Tr G(z_j),
 * E[X1X2X3X4] → pairingSum of the limiting covariances (tracialResolventCovariance), the joint
 * fourth cumulant being O(1/N). GOE, N = 80, 2000 samples (eigenvalues only); z = i, −i, 0.5 + 0.5i,
 * 0.5 − 0.5i.
 * Allowance: THEORY.md reports the fourth cumulant at a few per cent of the pairing sum for
 * N = 200–800; it is O(1/N), so at N = 80 up to about 2.5 times that, and the covariances themselves
 * deviate by O(1/N) (resolvent-covariance.test.ts): allowance 15 % of |pairing sum|.
 * SE: the sample standard deviation of the products of the centred statistics over √n (centring
 * by the sample means changes the estimate by O(1/n)). Family level 10⁻³ over 2 components.
 */
describe('the Wick rule for resolvent trace statistics (simulation)', () => {
  it('GOE: E[X1X2X3X4] agrees with the pairing sum of the limiting covariances', () => {
    const N = 80;
    const n = 2000;
    const spec = parseEnsemble('goe');
    const c = ensembleConstants(spec, N);
    const points = [complex(0, 1), complex(0, -1), complex(0.5, 0.5), complex(0.5, -0.5)];
    const samples: Complex[][] = points.map(() => []);
    forEachSample(spec, N, n, 31337, 'wick-pairing goe', (h) => {
      const values = eigenvalues(h);
      points.forEach((z, j) => samples[j].push(scale(normalisedResolventTrace(values, z), N)));
    });
    const centred = samples.map((s) => {
      const m = scale(s.reduce((a, b) => add(a, b), complex(0, 0)), 1 / n);
      return s.map((x) => sub(x, m));
    });
    const products = centred[0].map((_, s) => mul(mul(centred[0][s], centred[1][s]), mul(centred[2][s], centred[3][s])));
    const mean = scale(products.reduce((a, b) => add(a, b), complex(0, 0)), 1 / n);
    const sd = (part: (x: Complex) => number): number => Math.sqrt(products.reduce((s, x) => s + (part(x) - part(mean)) ** 2, 0) / (n - 1) / n);
    const reference = pairingSum((i, j) => tracialResolventCovariance(points[i], points[j], c), [0, 1, 2, 3]);
    expectAgreement('E[X1X2X3X4]', { value: mean, standardError: complex(sd((x) => x.re), sd((x) => x.im)) }, reference, 0.15 * abs(reference), criticalValue(1e-3 / 2));
  });
});
