import { chiVariate } from './chi-variate.js';
import type { RandomStream } from './random-stream.js';
import type { SymmetricTridiagonal } from './symmetric-tridiagonal.js';

/**
 * One draw of the β-Hermite ensemble of order N as a symmetric tridiagonal matrix (Dumitriu and
 * Edelman's model), scaled to the project's convention: the spectrum fills [−2, 2] (semicircle),
 * and for β = 1 and β = 2 the eigenvalues have exactly the law of the GOE and GUE eigenvalues of
 * ensemble.ts and THEORY.md ("Conventions").
 *
 *   H = (1/√(βN)) · tridiag( diagonal √2 z₁, …, √2 z_N;  off-diagonal χ_{β(N−1)}, χ_{β(N−2)}, …, χ_β )
 *
 * with z_i ~ N(0, 1) and all entries independent; T_{i+1,i} = χ_{β(N−1−i)}/√(βN).
 *
 * The scaling. Dumitriu and Edelman's model is H_β = (1/√2)·tridiag(N(0, 2); χ_{β(N−1)}, …, χ_β),
 * whose eigenvalues have the joint density ∝ |Δ(λ)|^β e^{−Σλ²/2}. For β = 1 that is the law of
 * the eigenvalues of a real symmetric A with density ∝ e^{−Tr A²/2}: Var a_ii = 1,
 * Var a_ij = 1/2 (Householder tridiagonalisation of that A gives their model: the first
 * off-diagonal entry is the norm of N − 1 entries of variance 1/2, χ_{N−1}/√2, and so on). The
 * project's GOE has Var h_ii = 2/N, Var h_ij = 1/N, i.e. h = √(2/N)·a. For β = 2 their law is that
 * of a complex Hermitian A with density ∝ e^{−Tr A²/2}: Var a_ii = 1, E|a_ij|² = 1; the project's
 * GUE (Var h_ii = 1/N, E|h_ij|² = 1/N) is h = √(1/N)·a. Both are H = √(2/(βN))·H_β, which for
 * general β puts the edge of the semicircle at 2 (the β-Hermite spectrum has radius √(2βN) in
 * their scaling). Multiplying out: diagonal √(2/(βN))·z (variance 2/(βN): 2/N for β = 1, 1/N for
 * β = 2, as in ensemble.ts) and off-diagonal χ_{βk}/√(βN). Check: E⟨H²⟩ = (N − 1 + 2/β)/N exactly,
 * which is the GOE value (N² + N)/N² at β = 1 and the GUE value 1 at β = 2.
 *
 * Draw order (so a matrix depends only on β, N and the stream): the N diagonal entries first (one
 * nextNormal each), then the off-diagonal entries T_{1,0}, T_{2,1}, … (one chi draw each:
 * chi-variate.ts, Marsaglia–Tsang gamma from the same stream). Cost O(N).
 *
 * Note: the matrix drawn here from a stream is not the dense sampler's matrix for the same stream
 * (sample-wigner.ts); only the law of the eigenvalues is the same.
 *
 * Reference: I. Dumitriu and A. Edelman, "Matrix models for beta ensembles", J. Math. Phys. 43(11)
 * (2002) 5830–5847, doi:10.1063/1.1507823, the β-Hermite model of §2 (theorem number not quoted:
 * from memory). The β = 1 case goes back to H. F. Trotter, Adv. Math. 54 (1984) 67–82 (citation
 * from memory).
 */
export function sampleBetaHermiteTridiagonal(beta: number, size: number, stream: RandomStream): SymmetricTridiagonal {
  if (!(beta > 0) || !Number.isFinite(beta)) throw new RangeError(`β-Hermite: β must be a finite number > 0, got ${beta}`);
  if (!Number.isInteger(size) || size < 1) throw new RangeError(`β-Hermite: matrix size must be a positive integer, got ${size}`);
  const diagonal = new Float64Array(size);
  const offDiagonal = new Float64Array(size - 1);
  const diagonalScale = Math.sqrt(2 / (beta * size));
  const offScale = 1 / Math.sqrt(beta * size);
  for (let i = 0; i < size; i++) diagonal[i] = diagonalScale * stream.nextNormal();
  for (let i = 0; i < size - 1; i++) offDiagonal[i] = offScale * chiVariate(stream, beta * (size - 1 - i));
  return { diagonal, offDiagonal };
}
