import { complex, type Complex } from '../../harness/numeric/complex.js';
import { zeroMatrix, type Field, type SquareMatrix } from '../../harness/numeric/square-matrix.js';

/**
 * The fixed design of the fluctuation checks: spectral parameters, weights and sample counts.
 * Fixed rather than drawn so that every reference value, allowance and power statement is known
 * before the run, and a failure names the same case on every seed.
 *
 * Points: Z_A and Z_B in the bulk at moderate height (the covariance is order one and the 1/N
 * corrections are small there), Z_C beside the edge at 2.5 + 0.5i, where the diagonal-variance and
 * κ4 terms weigh most relative to the Gaussian one (|m| is small, so 1 − m1m2 ≈ 1).
 */
export const Z_A: Complex = complex(-1, 0.5);
export const Z_B: Complex = complex(0.5, 1);
export const Z_C: Complex = complex(2.5, 0.5);
/**
 * Far from the spectrum, for the β-dependent shift-weighted statistic Tr G(z)P: there it is close
 * to −Tr(HP)/z² = −Σ_i h_{i,i−1}/z², whose bilinear variance N·E h² is 1 for β = 1 and 0 for β = 2,
 * so the check's signal-to-noise for a complex matrix with E h² = δ/N ≠ 0 approaches δ per sample
 * (against about δ/3 at Z_A).
 */
export const Z_P: Complex = complex(0, 3);

/** Mesoscopic exponent γ ≤ 1/2, where THEORY.md finds the corrections small (η = N^{−γ}). */
export const MESOSCOPIC_GAMMA = 0.5;
/** Two bulk energies for the mesoscopic statistics and their decorrelation. */
export const MESOSCOPIC_ENERGIES: readonly [number, number] = [-0.5, 0.5];

/**
 * Sample counts at budget 1, sized so that `rmt-assay check --suite fluctuations` on the reference
 * adapter at N = 200 (GOE and GUE) stays within about a minute on two cores: eigenvalue-only
 * statistics on every sample, eigenvectors (weighted chains) on a prefix of them. A complex
 * Hermitian decomposition costs about four times a real one (four real flops per complex one), so
 * complex ensembles get fewer samples and the verdicts say the power that leaves.
 */
const SAMPLES_AT_BUDGET_ONE = {
  real: { spectral: 1000, weighted: 160 },
  complex: { spectral: 600, weighted: 128 },
} as const;
/**
 * Fewest samples behind a weighted covariance, whatever the budget: with 30 the delta-method error
 * of a covariance of heavy-tailed products is too often underestimated (the 100-seed false-alarm
 * test saw 3 failing seeds at α = 10⁻³, all weighted checks); 60 keeps the normal approximation honest
 * (64: the next whole number of batches).
 */
const MINIMUM_WEIGHTED_SAMPLES = 64;
/** Fewest samples behind the other checks (joint cumulants of order 4 need them for their jackknife errors). */
const MINIMUM_SPECTRAL_SAMPLES = 100;
/** From this budget on, the sixth-order Wick check is added (it needs many samples to have power). */
export const SIXTH_ORDER_BUDGET = 2;

/** Samples per sample_statistics request: bounds memory and message size; divides every block of sampled-work.ts. */
export const STATISTICS_BATCH = 16;

/**
 * Spectral and weighted sample counts at a budget. The weighted count is a whole number of
 * sample_statistics batches, so that batch b is always samples [16b, 16b + 16) of one tier and its
 * seed depends on b alone (any block of samples can then be asked for on its own).
 */
export function sampleCounts(field: Field, budget: number): { spectral: number; weighted: number } {
  const base = SAMPLES_AT_BUDGET_ONE[field];
  const spectral = Math.max(MINIMUM_SPECTRAL_SAMPLES, Math.round(base.spectral * budget));
  const weighted = Math.ceil(Math.max(MINIMUM_WEIGHTED_SAMPLES, Math.round(base.weighted * budget)) / STATISTICS_BATCH) * STATISTICS_BATCH;
  return { spectral, weighted: Math.min(spectral, weighted) };
}

/**
 * The weights of the one-resolvent checks (real N×N matrices):
 * - D, traceless diagonal: +1 on the first ⌊N/2⌋ rows, −1 on the rest (⟨D²⟩ = 1, ⟨d(D)d(D)⟩ = 1);
 * - S = P + Pᵀ with P the cyclic shift: symmetric, zero diagonal (⟨S²⟩ = 2, no diagonal overlap);
 * - P, the cyclic shift itself, and its powers P^k, k = 1 … SHIFT_POWERS: ⟨P^kP^k⟩ = 0 but
 *   ⟨P^k(P^k)ᵀ⟩ = 1, so their covariances are β-dependent (0 for β = 2 at leading order,
 *   m1²m2²/(1 − m1m2) for β = 1), which tells a complex matrix with E h² ≠ 0; Tr G(z)P^k for different
 *   k see different entries (h_{i,i−k}), so the sum of their covariances has SHIFT_POWERS times the
 *   signal and about √SHIFT_POWERS times the noise of one;
 * - A = 2I + D: a general weight, ⟨A⟩ = 2 (tracial part) plus the traceless D.
 */
export interface DesignWeights {
  readonly D: SquareMatrix;
  readonly S: SquareMatrix;
  readonly P: SquareMatrix;
  readonly A: SquareMatrix;
  /** P, P², …, P^SHIFT_POWERS (fewer when N is small: k < N/2, so that no two see the same entries). */
  readonly shifts: readonly SquareMatrix[];
}

export const SHIFT_POWERS = 8;

function cyclicShift(size: number, k: number): SquareMatrix {
  const m = zeroMatrix('real', size);
  for (let i = 0; i < size; i++) m.data[i * size + ((i + k) % size)] = 1;
  return m;
}

export function designWeights(size: number): DesignWeights {
  const D = zeroMatrix('real', size);
  const S = zeroMatrix('real', size);
  const P = zeroMatrix('real', size);
  const A = zeroMatrix('real', size);
  const half = Math.floor(size / 2);
  for (let i = 0; i < size; i++) {
    const d = i < half ? 1 : -1;
    D.data[i * size + i] = d;
    A.data[i * size + i] = 2 + d;
    const j = (i + 1) % size;
    P.data[i * size + j] = 1;
    S.data[i * size + j] += 1;
    S.data[j * size + i] += 1;
  }
  const shifts = [P];
  for (let k = 2; k <= SHIFT_POWERS && 2 * k < size; k++) shifts.push(cyclicShift(size, k));
  return { D, S, P, A, shifts };
}
