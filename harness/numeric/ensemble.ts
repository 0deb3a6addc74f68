import type { Field } from './square-matrix.js';

/**
 * What a Wigner ensemble is, in the terms the theory needs.
 *
 * Conventions (../shared/THEORY.md, "Conventions"): H = H*, N×N; off-diagonal entries independent
 * up to symmetry, centred, E|h_ij|² = 1/N; diagonal entries real, independent, centred,
 * Var h_ii = σ_d²/N. Complex entries also have E h_ij² = 0 (real and imaginary parts independent,
 * each of variance 1/(2N)).
 */
export type OffDiagonalLaw = 'gaussian' | 'rademacher' | 'uniform' | 'sparse-bernoulli';
export type DiagonalLaw = 'gaussian' | 'rademacher' | 'uniform' | 'zero';

export type EnsembleSpec =
  | { readonly kind: 'goe' }
  | { readonly kind: 'gue' }
  | {
      readonly kind: 'wigner';
      readonly field: Field;
      readonly offDiagonal: OffDiagonalLaw;
      /** Expected number of non-zero off-diagonal entries per row, for 'sparse-bernoulli'. */
      readonly meanDegree?: number;
      readonly diagonal: DiagonalLaw;
      /** σ_d² = N·Var h_ii; ignored (0) when the diagonal law is 'zero'. */
      readonly diagonalVariance: number;
    };

/** The numbers the limiting formulas depend on. */
export interface EnsembleConstants {
  readonly field: Field;
  /** 1 for real symmetric, 2 for complex Hermitian. */
  readonly beta: 1 | 2;
  /** σ_d² = N·Var h_ii. */
  readonly diagonalVariance: number;
  /**
   * Normalised fourth cumulant of the off-diagonal entries: real κ4 = N² E h⁴ − 3, complex
   * κ4 = N² E|h|⁴ − 2. Gaussian 0, real Rademacher −2 (THEORY.md, "Conventions").
   */
  readonly kappa4: number;
}

/**
 * κ4 of each off-diagonal law, from its moments (exact arithmetic, common practice):
 * - real: Gaussian E x⁴ = 3 → 0; Rademacher ±1 → 1 − 3 = −2; uniform on [−√3, √3]: E x⁴ = 9/5 →
 *   −6/5; sparse Bernoulli, x = ±1/√p with probability p = d/N, else 0: E x⁴ = 1/p → N/d − 3.
 * - complex (h = (a + ib)/√2, a, b independent with the real law): E|h|⁴ = (E a⁴ + 1)/2, so
 *   Gaussian 0, Rademacher −1, uniform −3/5; sparse, h = e^{iθ}/√p with probability p: N/d − 2.
 */
function offDiagonalKappa4(field: Field, law: OffDiagonalLaw, size: number, meanDegree: number | undefined): number {
  const complex = field === 'complex';
  switch (law) {
    case 'gaussian':
      return 0;
    case 'rademacher':
      return complex ? -1 : -2;
    case 'uniform':
      return complex ? -3 / 5 : -6 / 5;
    case 'sparse-bernoulli': {
      const p = sparseProbability(size, meanDegree);
      return complex ? 1 / p - 2 : 1 / p - 3;
    }
  }
}

/** Probability p = d/N that an off-diagonal entry of a sparse Bernoulli matrix is non-zero. */
export function sparseProbability(size: number, meanDegree: number | undefined): number {
  if (meanDegree === undefined || !(meanDegree > 0)) {
    throw new RangeError('a sparse-bernoulli ensemble needs a positive meanDegree');
  }
  return Math.min(1, meanDegree / size);
}

export function ensembleConstants(spec: EnsembleSpec, size: number): EnsembleConstants {
  switch (spec.kind) {
    case 'goe':
      return { field: 'real', beta: 1, diagonalVariance: 2, kappa4: 0 };
    case 'gue':
      return { field: 'complex', beta: 2, diagonalVariance: 1, kappa4: 0 };
    case 'wigner':
      return {
        field: spec.field,
        beta: spec.field === 'real' ? 1 : 2,
        diagonalVariance: spec.diagonal === 'zero' ? 0 : spec.diagonalVariance,
        kappa4: offDiagonalKappa4(spec.field, spec.offDiagonal, size, spec.meanDegree),
      };
  }
}

/**
 * The ensemble's name in the CLI syntax, which `parseEnsemble` reads back:
 * `goe`, `gue`, or `wigner:FIELD:LAW[:d=DEGREE]:diag=DIAGLAW[:VARIANCE]`.
 */
export function ensembleLabel(spec: EnsembleSpec): string {
  if (spec.kind !== 'wigner') return spec.kind;
  const degree = spec.offDiagonal === 'sparse-bernoulli' ? `:d=${spec.meanDegree}` : '';
  const diagonal = spec.diagonal === 'zero' ? 'diag=zero' : `diag=${spec.diagonal}:${spec.diagonalVariance}`;
  return `wigner:${spec.field}:${spec.offDiagonal}${degree}:${diagonal}`;
}

const OFF_DIAGONAL_LAWS: readonly OffDiagonalLaw[] = ['gaussian', 'rademacher', 'uniform', 'sparse-bernoulli'];
const DIAGONAL_LAWS: readonly DiagonalLaw[] = ['gaussian', 'rademacher', 'uniform', 'zero'];

/** Reads the syntax of `ensembleLabel`; throws a RangeError that says what is wrong. */
export function parseEnsemble(text: string): EnsembleSpec {
  const t = text.trim().toLowerCase();
  if (t === 'goe' || t === 'gue') return { kind: t };
  const parts = t.split(':');
  if (parts[0] !== 'wigner' || parts.length < 4) {
    throw new RangeError(
      `unknown ensemble '${text}': use goe, gue, or wigner:real|complex:gaussian|rademacher|uniform|sparse-bernoulli[:d=DEGREE]:diag=gaussian|rademacher|uniform|zero[:VARIANCE]`,
    );
  }
  const field = parts[1];
  if (field !== 'real' && field !== 'complex') throw new RangeError(`ensemble '${text}': field must be real or complex`);
  const law = parts[2] as OffDiagonalLaw;
  if (!OFF_DIAGONAL_LAWS.includes(law)) throw new RangeError(`ensemble '${text}': unknown off-diagonal law '${parts[2]}'`);
  let rest = parts.slice(3);
  let meanDegree: number | undefined;
  if (law === 'sparse-bernoulli') {
    const d = rest[0]?.startsWith('d=') ? Number(rest[0].slice(2)) : NaN;
    if (!(d > 0)) throw new RangeError(`ensemble '${text}': sparse-bernoulli needs d=DEGREE with DEGREE > 0`);
    meanDegree = d;
    rest = rest.slice(1);
  }
  const diagonal = rest[0]?.startsWith('diag=') ? (rest[0].slice(5) as DiagonalLaw) : undefined;
  if (diagonal === undefined || !DIAGONAL_LAWS.includes(diagonal)) {
    throw new RangeError(`ensemble '${text}': expected diag=gaussian|rademacher|uniform|zero after the off-diagonal law`);
  }
  const variance = diagonal === 'zero' ? 0 : rest[1] === undefined ? 1 : Number(rest[1]);
  if (!(variance >= 0) || !Number.isFinite(variance)) throw new RangeError(`ensemble '${text}': diagonal variance must be a number ≥ 0`);
  return { kind: 'wigner', field, offDiagonal: law, meanDegree, diagonal, diagonalVariance: variance };
}
