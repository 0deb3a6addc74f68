import { add, complex, conj, formatComplex, type Complex } from '../../harness/numeric/complex.js';
import type { EnsembleConstants } from '../../harness/numeric/ensemble.js';
import { identityChainCovariance } from '../../reference-values/chain-covariance.js';
import { resolventCovariance } from '../../reference-values/resolvent-covariance.js';
import { CHAIN_SOURCE, TRACIAL_SOURCE, WEIGHTED_SOURCE } from './covariance-sources.js';
import { CHAIN_COVARIANCE_CONSTANT, RESOLVENT_COVARIANCE_CONSTANT, SHIFT_COVARIANCE_CONSTANT, WEIGHTED_COVARIANCE_CONSTANT } from './fluctuation-allowances.js';
import { covarianceCheck, finiteSizeAllowance, summedCovarianceCheck } from './covariance-check.js';
import type { FluctuationCheck } from './fluctuation-check.js';
import { designWeights, Z_A, Z_B, Z_C, Z_P } from './fluctuation-design.js';
import { conjugated, type Statistic, type StatisticBook } from './statistic-book.js';

const z = formatComplex;

/**
 * Item 1, tracial part: Cov(Tr G(z1), Tr G(z2)) at pairs of the design points, and E|X − EX|² =
 * Cov(X, X̄) at Z_A and Z_C, which a per-sample error of the statistic (a noisy trace estimator)
 * inflates whatever its phase (X̄ = Tr G(z̄) for Hermitian H, so the reference is the z, z̄ pair).
 */
export function tracialChecks(book: StatisticBook, c: EnsembleConstants): FluctuationCheck[] {
  const pairs: Array<[Complex, Complex]> = [
    [Z_A, Z_A],
    [Z_A, Z_B],
    [Z_B, Z_C],
    [Z_C, Z_C],
  ];
  const covariances = pairs.map(([z1, z2]) =>
    covarianceCheck(
      `tracial/${z(z1)},${z(z2)}`,
      `Cov(Tr G(${z(z1)}), Tr G(${z(z2)})) against the Khorunzhy–Khoruzhenko–Pastur limit`,
      book.resolvent(z1),
      book.resolvent(z2),
      resolventCovariance(z1, null, z2, null, c),
      TRACIAL_SOURCE,
      finiteSizeAllowance(RESOLVENT_COVARIANCE_CONSTANT, c, book.size),
    ),
  );
  const variances = [Z_A, Z_C].map((point) =>
    covarianceCheck(
      `tracial/E|X|² ${z(point)}`,
      `E|Tr G(${z(point)}) − E Tr G|² = Cov(X, X̄) against the limit at (z, z̄)`,
      book.resolvent(point),
      conjugated(book.resolvent(point)),
      resolventCovariance(point, null, conj(point), null, c),
      TRACIAL_SOURCE,
      finiteSizeAllowance(RESOLVENT_COVARIANCE_CONSTANT, c, book.size),
    ),
  );
  return [...covariances, ...variances];
}

/** Item 2: chains with identity weights (lengths 2 and 3, coinciding points) against the reduction to item 1. */
export function identityChainChecks(book: StatisticBook, c: EnsembleConstants): FluctuationCheck[] {
  const cases: Array<[Complex[], Complex[]]> = [
    [[Z_A, Z_B], [Z_A, Z_B]],
    [[Z_A, Z_A], [conj(Z_B)]],
    [[Z_A, Z_B, Z_C], [conj(Z_A), Z_C]],
  ];
  const label = (points: Complex[]) => points.map((p) => `G(${z(p)})`).join('');
  return cases.map(([left, right]) =>
    covarianceCheck(
      `identity-chain/${left.map(z).join(',')};${right.map(z).join(',')}`,
      `Cov(Tr ${label(left)}, Tr ${label(right)}) against the divided differences of the tracial covariance`,
      book.identityChain(left),
      book.identityChain(right),
      identityChainCovariance(left, right, c),
      CHAIN_SOURCE,
      finiteSizeAllowance(CHAIN_COVARIANCE_CONSTANT, c, book.size),
    ),
  );
}

/** Item 1, traceless and general weights (eigenvectors: the weighted prefix of the samples). */
export function weightedChecks(book: StatisticBook, c: EnsembleConstants): FluctuationCheck[] {
  const w = designWeights(book.size);
  const D = (p: Complex) => book.weighted(p, 'D', w.D);
  const cases: Array<[string, Statistic, Statistic, Complex, string]> = [
    ['D@Z_A,D@Z_B', D(Z_A), D(Z_B), resolventCovariance(Z_A, w.D, Z_B, w.D, c), 'traceless diagonal weight D (⟨d(D)d(D)⟩ = 1)'],
    // D is real symmetric, so conj Tr G(z)D = Tr G(z̄)D: E|Y − EY|² against the (z, z̄) value.
    ['E|D@Z_A|²', D(Z_A), conjugated(D(Z_A)), resolventCovariance(Z_A, w.D, conj(Z_A), w.D, c), 'E|Tr G(z)D − E|², traceless diagonal weight'],
    ['S@Z_A,S@conj Z_B', book.weighted(Z_A, 'S', w.S), book.weighted(conj(Z_B), 'S', w.S), resolventCovariance(Z_A, w.S, conj(Z_B), w.S, c), 'zero-diagonal symmetric weight S = P + Pᵀ'],
    ['A@Z_A,A@Z_B', book.weighted(Z_A, 'A', w.A), book.weighted(Z_B, 'A', w.A), resolventCovariance(Z_A, w.A, Z_B, w.A, c), 'general weight A = 2I + D: ⟨A⟩² times the tracial part plus the traceless part'],
    ['I@Z_A,D@Z_B', book.resolvent(Z_A), D(Z_B), resolventCovariance(Z_A, null, Z_B, w.D, c), 'tracial against traceless: asymptotically uncorrelated'],
  ];
  const shifted = w.shifts.map((shift, j) => book.weighted(Z_P, `P^${j + 1}`, shift));
  const shiftExpected = w.shifts.reduce((sum, shift) => add(sum, resolventCovariance(Z_P, shift, Z_P, shift, c)), complex(0));
  const shifts = summedCovarianceCheck(
    `weighted/Σ P^k@Z_P`,
    `Σ_{k=1..${w.shifts.length}} Cov(Tr G(${z(Z_P)})P^k, Tr G(${z(Z_P)})P^k), P the cyclic shift: ⟨(P^k)²⟩ = 0, ⟨P^k(P^k)ᵀ⟩ = 1, so the value depends on β (0 for β = 2; it sees E h² ≠ 0)`,
    shifted.map((x) => [x, x] as const),
    shiftExpected,
    WEIGHTED_SOURCE,
    finiteSizeAllowance(SHIFT_COVARIANCE_CONSTANT, c, book.size),
  );
  const single = cases.map(([name, x, y, expected, what]) =>
    covarianceCheck(
      `weighted/${name}`,
      `Cov(${x.label}, ${y.label}): ${what}`,
      x,
      y,
      expected,
      WEIGHTED_SOURCE,
      finiteSizeAllowance(WEIGHTED_COVARIANCE_CONSTANT, c, book.size),
    ),
  );
  return [...single, shifts];
}
