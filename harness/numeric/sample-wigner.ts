import { sparseProbability, type DiagonalLaw, type EnsembleSpec, type OffDiagonalLaw } from './ensemble.js';
import type { RandomStream } from './random-stream.js';
import { zeroMatrix, type Field, type SquareMatrix } from './square-matrix.js';

/**
 * Draws one matrix of a Wigner ensemble, normalised as in ensemble.ts and THEORY.md
 * ("Conventions"): E|h_ij|² = 1/N off the diagonal, Var h_ii = σ_d²/N, complex entries with
 * E h_ij² = 0.
 *
 * Laws. Write s = 1/√N and let z, z′ be N(0, 1), u, u′ uniform on (0, 1), ε, ε′ independent signs.
 * - real off-diagonal: gaussian s·z; rademacher s·ε; uniform s·√3(2u − 1) (uniform on
 *   [−√3 s, √3 s]); sparse-bernoulli s·ε/√p with probability p = d/N (`sparseProbability`), else 0.
 * - complex off-diagonal: gaussian s(z + iz′)/√2; rademacher s(ε + iε′)/√2; uniform
 *   s√3((2u − 1) + i(2u′ − 1))/√2; sparse-bernoulli s·e^{iθ}/√p, θ = 2πu, with probability p, else 0.
 * - diagonal (real in both fields), scaled to variance σ_d²/N: gaussian, rademacher, uniform as
 *   above; zero gives 0. GOE is real gaussian with σ_d² = 2; GUE complex gaussian with σ_d² = 1.
 * Their fourth moments give the κ4 of `ensembleConstants` (see the derivation there).
 *
 * Draw order (so a matrix depends only on spec, size and stream): rows i = 0 … N − 1; in row i
 * first h_ii, then h_i,i+1 … h_i,N−1; the lower triangle is the (conjugate) mirror. Per entry:
 * gaussian takes one nextNormal (complex: re then im); rademacher one nextUint32 (real: sign from
 * bit 31; complex: re sign from bit 31, im sign from bit 30); uniform one nextUniform (complex:
 * re then im); sparse one nextUniform for the Bernoulli trial and, if non-zero, one nextUint32
 * for the sign (real, bit 31) or one nextUniform for the phase (complex). 'zero' draws nothing.
 */
export function sampleMatrix(spec: EnsembleSpec, size: number, stream: RandomStream): SquareMatrix {
  if (!Number.isInteger(size) || size < 1) throw new RangeError(`matrix size must be a positive integer, got ${size}`);
  const law = resolveLaws(spec, size);
  const matrix = zeroMatrix(law.field, size);
  const data = matrix.data;
  const s = 1 / Math.sqrt(size);
  const diagonalScale = Math.sqrt(law.diagonalVariance / size);
  const p = law.sparseProbability;
  const sparseScale = s / Math.sqrt(p);
  const complex = law.field === 'complex';
  const halfS = s * Math.SQRT1_2;
  const uniformScale = Math.sqrt(3) * (complex ? halfS : s);

  for (let i = 0; i < size; i++) {
    const dii = drawDiagonal(law.diagonal, diagonalScale, stream);
    data[complex ? 2 * (i * size + i) : i * size + i] = dii;
    for (let j = i + 1; j < size; j++) {
      if (!complex) {
        let x = 0;
        switch (law.offDiagonal) {
          case 'gaussian':
            x = s * stream.nextNormal();
            break;
          case 'rademacher':
            x = stream.nextUint32() >>> 31 ? -s : s;
            break;
          case 'uniform':
            x = uniformScale * (2 * stream.nextUniform() - 1);
            break;
          case 'sparse-bernoulli':
            if (stream.nextUniform() < p) x = stream.nextUint32() >>> 31 ? -sparseScale : sparseScale;
            break;
        }
        data[i * size + j] = x;
        data[j * size + i] = x;
      } else {
        let re = 0;
        let im = 0;
        switch (law.offDiagonal) {
          case 'gaussian':
            re = halfS * stream.nextNormal();
            im = halfS * stream.nextNormal();
            break;
          case 'rademacher': {
            const w = stream.nextUint32();
            re = w >>> 31 ? -halfS : halfS;
            im = (w >>> 30) & 1 ? -halfS : halfS;
            break;
          }
          case 'uniform':
            re = uniformScale * (2 * stream.nextUniform() - 1);
            im = uniformScale * (2 * stream.nextUniform() - 1);
            break;
          case 'sparse-bernoulli':
            if (stream.nextUniform() < p) {
              const theta = 2 * Math.PI * stream.nextUniform();
              re = sparseScale * Math.cos(theta);
              im = sparseScale * Math.sin(theta);
            }
            break;
        }
        const upper = 2 * (i * size + j);
        const lower = 2 * (j * size + i);
        data[upper] = re;
        data[upper + 1] = im;
        data[lower] = re;
        data[lower + 1] = -im;
      }
    }
  }
  return matrix;
}

interface ResolvedLaws {
  readonly field: Field;
  readonly offDiagonal: OffDiagonalLaw;
  readonly diagonal: DiagonalLaw;
  readonly diagonalVariance: number;
  /** p = d/N for sparse-bernoulli, 1 otherwise (unused). */
  readonly sparseProbability: number;
}

function resolveLaws(spec: EnsembleSpec, size: number): ResolvedLaws {
  switch (spec.kind) {
    case 'goe':
      return { field: 'real', offDiagonal: 'gaussian', diagonal: 'gaussian', diagonalVariance: 2, sparseProbability: 1 };
    case 'gue':
      return { field: 'complex', offDiagonal: 'gaussian', diagonal: 'gaussian', diagonalVariance: 1, sparseProbability: 1 };
    case 'wigner': {
      if (!(spec.diagonalVariance >= 0) || !Number.isFinite(spec.diagonalVariance)) {
        throw new RangeError(`diagonal variance must be a finite number ≥ 0, got ${spec.diagonalVariance}`);
      }
      return {
        field: spec.field,
        offDiagonal: spec.offDiagonal,
        diagonal: spec.diagonal,
        diagonalVariance: spec.diagonal === 'zero' ? 0 : spec.diagonalVariance,
        sparseProbability: spec.offDiagonal === 'sparse-bernoulli' ? sparseProbability(size, spec.meanDegree) : 1,
      };
    }
  }
}

/** One diagonal entry with standard deviation `scale` (= √(σ_d²/N)); `+ 0` turns −0 (scale 0) into 0. */
function drawDiagonal(law: DiagonalLaw, scale: number, stream: RandomStream): number {
  switch (law) {
    case 'gaussian':
      return scale * stream.nextNormal() + 0;
    case 'rademacher':
      return (stream.nextUint32() >>> 31 ? -scale : scale) + 0;
    case 'uniform':
      return Math.sqrt(3) * scale * (2 * stream.nextUniform() - 1) + 0;
    case 'zero':
      return 0;
  }
}
