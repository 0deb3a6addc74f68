import type { SquareMatrix } from '../../harness/numeric/square-matrix.js';

/** A sample mean with its standard error (sample standard deviation / √count). */
export interface MeanEstimate {
  readonly mean: number;
  readonly standardError: number;
  readonly count: number;
}

function estimate(values: readonly number[]): MeanEstimate {
  const count = values.length;
  const mean = values.reduce((s, v) => s + v, 0) / count;
  const variance = values.reduce((s, v) => s + (v - mean) ** 2, 0) / (count - 1);
  return { mean, standardError: Math.sqrt(variance / count), count };
}

/**
 * The entry statistics that define a Wigner ensemble (shared/THEORY.md, "Conventions"), from
 * sampled matrices, with x = √N h_ij for i < j and d = √N h_ii:
 * - offDiagonalVariance: E|x|², 1 for every ensemble;
 * - pseudoVariance: E x² (real part), 0 for complex ensembles (E h_ij² = 0), 1 for real ones;
 * - kappa4: E x⁴ − 3 (real) or E|x|⁴ − 2 (complex), the normalised fourth cumulant;
 * - diagonalVariance: E d², which is σ_d²;
 * - largest imaginary part on the diagonal (0 for a Hermitian matrix).
 */
export function sampledEntryMoments(matrices: readonly SquareMatrix[]) {
  const complex = matrices[0].field === 'complex';
  const squares: number[] = [];
  const pseudo: number[] = [];
  const fourths: number[] = [];
  const diagonal: number[] = [];
  let diagonalImaginary = 0;
  for (const m of matrices) {
    const n = m.size;
    const scale = Math.sqrt(n);
    for (let i = 0; i < n; i++) {
      const re = (complex ? m.data[2 * (i * n + i)] : m.data[i * n + i]) * scale;
      diagonal.push(re * re);
      if (complex) diagonalImaginary = Math.max(diagonalImaginary, Math.abs(m.data[2 * (i * n + i) + 1]));
      for (let j = i + 1; j < n; j++) {
        const a = (complex ? m.data[2 * (i * n + j)] : m.data[i * n + j]) * scale;
        const b = complex ? m.data[2 * (i * n + j) + 1] * scale : 0;
        const modulus2 = a * a + b * b;
        squares.push(modulus2);
        pseudo.push(a * a - b * b);
        fourths.push(modulus2 * modulus2 - (complex ? 2 : 3));
      }
    }
  }
  return {
    offDiagonalVariance: estimate(squares),
    pseudoVariance: estimate(pseudo),
    kappa4: estimate(fourths),
    diagonalVariance: estimate(diagonal),
    diagonalImaginary,
  };
}
