import { describe, it } from 'vitest';
import { type Complex, ONE, abs, add, complex, div, mul, scale, sub } from '../../harness/numeric/complex.js';
import { eigenpairs, eigenvalues } from '../../harness/numeric/eigen.js';
import { type EnsembleConstants, ensembleConstants, parseEnsemble } from '../../harness/numeric/ensemble.js';
import { chainTrace } from '../../harness/numeric/resolvent-statistics.js';
import { identityMatrix } from '../../harness/numeric/square-matrix.js';
import { identityChainCovariance, identityChainMean } from '../../reference-values/chain-covariance.js';
import { chebyshevCoefficients } from '../../reference-values/chebyshev.js';
import { complexLinearStatisticCovariance } from '../../reference-values/linear-statistic-variance.js';
import { tracialResolventCovariance } from '../../reference-values/resolvent-covariance.js';
import { stieltjesSemicircle } from '../../reference-values/semicircle-law.js';
import { covarianceEstimate, criticalValue, expectAgreement, expectClose, forEachSample } from './fluctuation-estimates.js';

const GOE: EnsembleConstants = { field: 'real', beta: 1, diagonalVariance: 2, kappa4: 0 };
const GUE: EnsembleConstants = { field: 'complex', beta: 2, diagonalVariance: 1, kappa4: 0 };
const RADEMACHER: EnsembleConstants = { field: 'real', beta: 1, diagonalVariance: 0, kappa4: -2 };


/** Π_i 1/(x − z_i), the function whose trace is the chain's. */
const chainFunction =
  (points: readonly Complex[]) =>
  (x: number): Complex => {
    let p = ONE;
    for (const z of points) p = mul(p, complex(x - z.re, -z.im));
    return div(ONE, p);
  };

const z = (re: number, im: number): Complex => complex(re, im);

describe('identityChainCovariance and identityChainMean: exact relations', () => {
  it('reduce to the one-resolvent formulas for k = 1 and give 0 (covariance) and 1 (mean) for the empty chain', () => {
    for (const c of [GOE, GUE, RADEMACHER]) {
      const a = z(0.3, 0.4);
      const b = z(-1, -0.2);
      const exact = tracialResolventCovariance(a, b, c);
      expectClose('k = 1', identityChainCovariance([a], [b], c), exact, 1e-13 * abs(exact));
      expectClose('empty left', identityChainCovariance([], [b, b], c), complex(0, 0), 0);
      expectClose('empty right', identityChainCovariance([a], [], c), complex(0, 0), 0);
    }
    expectClose('mean of the empty chain', identityChainMean([]), ONE, 0);
    expectClose('mean, k = 1', identityChainMean([z(0.3, 0.4)]), stieltjesSemicircle(z(0.3, 0.4)), 1e-15);
  });

  it('agrees with central finite differences of the tracial covariance at coincident points (G(z)² = ∂z G(z))', () => {
    // Central differences with step h: error O(h²·|∂³|) + O(ε/h); h = 1e-4 gives about 1e-7 relative.
    const h = 1e-4;
    const d = complex(h, 0);
    for (const c of [GOE, GUE, RADEMACHER]) {
      const a = z(0.3, 0.4);
      const b = z(-0.6, -0.5);
      const first = scale(sub(tracialResolventCovariance(add(a, d), b, c), tracialResolventCovariance(sub(a, d), b, c)), 1 / (2 * h));
      expectClose('[a, a] × [b]', identityChainCovariance([a, a], [b], c), first, 1e-6 * abs(first));
      const mixed = scale(
        sub(
          sub(add(tracialResolventCovariance(add(a, d), add(b, d), c), tracialResolventCovariance(sub(a, d), sub(b, d), c)), tracialResolventCovariance(add(a, d), sub(b, d), c)),
          tracialResolventCovariance(sub(a, d), add(b, d), c),
        ),
        1 / (4 * h * h),
      );
      expectClose('[a, a] × [b, b]', identityChainCovariance([a, a], [b, b], c), mixed, 1e-5 * abs(mixed));
    }
  });

  it('agrees with explicit partial fractions for distinct points', () => {
    const a1 = z(0.5, 0.5);
    const a2 = z(-0.5, 0.6);
    const b = z(0, 0.8);
    for (const c of [GOE, GUE, RADEMACHER]) {
      const expected = div(sub(tracialResolventCovariance(a1, b, c), tracialResolventCovariance(a2, b, c)), sub(a1, a2));
      expectClose('[a1, a2] × [b]', identityChainCovariance([a1, a2], [b], c), expected, 1e-12 * abs(expected));
    }
  });

  it('agrees with the linear-statistic covariance of Π 1/(x − z_i) (Chebyshev route, Bai and Yao 2005), points in both half-planes', () => {
    const chains: ReadonlyArray<[Complex[], Complex[]]> = [
      [[z(0.5, 0.5), z(-0.5, 0.6)], [z(0, 0.8)]],
      [[z(0.3, 0.4), z(0.3, 0.4)], [z(0.3, -0.4), z(0.3, -0.4)]],
      [[z(0, 1), z(0, -1), z(0.5, 0.5)], [z(-1, 0.3)]],
      [[z(1.5, 0.3), z(1.5, -0.3), z(2.5, 0)], [z(-1.2, 0.4), z(-1.2, 0.4), z(-1.2, 0.4)]],
    ];
    for (const c of [GOE, GUE, RADEMACHER]) {
      for (const [left, right] of chains) {
        const expected = complexLinearStatisticCovariance(chainFunction(left), chainFunction(right), c);
        expectClose(`${left.length} × ${right.length}`, identityChainCovariance(left, right, c), expected, 1e-9 * (abs(expected) + 1e-3));
      }
    }
  });

  it('identityChainMean: m[z1, z2] = m1m2/(1 − m1m2) and ∫ Π 1/(x − z_i) ρ(x) dx = c_0 − c_2/2 (Chebyshev)', () => {
    const a = z(0.5, 0.5);
    const b = z(-0.5, -0.6);
    const p = mul(stieltjesSemicircle(a), stieltjesSemicircle(b));
    expectClose('k = 2', identityChainMean([a, b]), div(p, sub(ONE, p)), 1e-13);
    // ∫ T_k(x/2) ρ(x) dx = δ_k0 − δ_k2/2 (x = 2cos θ, ρ dx = (2/π) sin²θ dθ).
    for (const points of [[a, b, a], [a, a, a, z(1, -0.3)]]) {
      const f = chainFunction(points);
      const re = chebyshevCoefficients((x) => f(x).re, 2);
      const im = chebyshevCoefficients((x) => f(x).im, 2);
      expectClose(`k = ${points.length}`, identityChainMean(points), complex(re[0] - re[2] / 2, im[0] - im[2] / 2), 1e-11);
    }
  });
});

/**
 * Simulation. The chain traces with identity weights are eigenvalue statistics,
 * Tr Π_i G(z_i) = Σ_λ Π_i 1/(λ − z_i), computed from `eigenvalues` (the engine's chainTrace gives the
 * same numbers, checked on a few matrices below). 1500 samples per ensemble; N = 100 for the real
 * ensembles, N = 64 for GUE (finite-N corrections O(1/N²); the complex eigensolver costs about
 * three times as much).
 *
 * Allowance: O(1/N) (THEORY.md: GOE chains have O(1/N) corrections). A pilot run (numpy, N = 100,
 * 2·10⁴ samples, the same chains) found N·|observed − limit| up to 2.8|limit| + 1: the largest is the
 * doubly coincident pair, −2.1 % for GOE and −2.8 % for zero-diagonal Rademacher (3–4 pilot standard
 * errors), GUE within its error bars. The allowance is (1 + 4|reference|)/N.
 * False alarms: 3 ensembles × 4 pairs × 2 components = 24 comparisons at family level 10⁻³.
 */
const SAMPLES = 1500;
const SEED = 4242;
const Z = criticalValue(1e-3 / 24);
const SIMULATED_CHAINS: ReadonlyArray<[Complex[], Complex[]]> = [
  [[z(0.5, 0.5), z(-0.5, 0.6)], [z(0, 0.8)]],
  [[z(0.3, 0.4), z(0.3, 0.4)], [z(0.3, -0.4), z(0.3, -0.4)]],
  [[z(0, 1), z(0, -1), z(0.5, 0.5)], [z(-1, 0.3)]],
  [[z(0.3, 0.4), z(0.3, -0.4)], [z(0.3, 0.4), z(0.3, -0.4)]],
];

function chainStatistic(values: Float64Array, points: readonly Complex[]): Complex {
  const f = chainFunction(points);
  let sum = complex(0, 0);
  for (const x of values) sum = add(sum, f(x));
  return sum;
}

describe('identityChainCovariance against simulation', () => {
  it('the eigenvalue form of the chain trace equals the engine chainTrace with identity weights', () => {
    for (const spec of [parseEnsemble('goe'), parseEnsemble('gue')]) {
      forEachSample(spec, 24, 3, SEED, 'chain-covariance engine check', (h) => {
        const decomp = eigenpairs(h);
        for (const [left] of SIMULATED_CHAINS) {
          const engine = scale(chainTrace(decomp, left, left.map(() => identityMatrix(h.field, 24))), 24);
          const direct = chainStatistic(decomp.values, left);
          expectClose('chain trace', direct, engine, 1e-10 * abs(engine));
        }
      });
    }
  });

  for (const [label, N] of [['goe', 100], ['gue', 64], ['wigner:real:rademacher:diag=zero', 100]] as const) {
    it(`${label}: four chain pairs within allowance + ${Z.toFixed(2)} SE`, () => {
      const spec = parseEnsemble(label);
      const c = ensembleConstants(spec, N);
      const x: Complex[][] = SIMULATED_CHAINS.map(() => []);
      const y: Complex[][] = SIMULATED_CHAINS.map(() => []);
      forEachSample(spec, N, SAMPLES, SEED, `chain-covariance ${label}`, (h) => {
        const values = eigenvalues(h);
        SIMULATED_CHAINS.forEach(([left, right], i) => {
          x[i].push(chainStatistic(values, left));
          y[i].push(chainStatistic(values, right));
        });
      });
      SIMULATED_CHAINS.forEach(([left, right], i) => {
        const reference = identityChainCovariance(left, right, c);
        const allowance = (1 + 4 * abs(reference)) / N;
        expectAgreement(`${label}, chain pair ${i}`, covarianceEstimate(x[i], y[i]), reference, allowance, Z);
      });
    });
  }
});
