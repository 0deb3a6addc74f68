import { chainTrace } from './chain-trace.js';
import type { Complex } from './complex.js';
import { eigenpairs, eigenvalues } from './eigen.js';
import { eigenbasisDiagonal } from './eigenbasis-diagonal.js';
import { eigenbasisMatrix } from './eigenbasis-matrix.js';
import { resolventDiagonal } from './resolvent-trace.js';
import { sparseEigenbasisDiagonal, sparseEntries } from './sparse-eigenbasis-diagonal.js';
import type { SpectralDecomposition } from './spectral-decomposition.js';
import type { SquareMatrix } from './square-matrix.js';
import { weightKind, type WeightKind } from './weight-kind.js';

/** A chain G(z1)A1 ⋯ G(zk)Ak as the adapters' ChainSpec describes it (no points: the empty chain). */
export interface ChainOfResolvents {
  readonly points: readonly Complex[];
  readonly weights: readonly SquareMatrix[];
}

interface WeightSeen {
  readonly kind: WeightKind;
  diagonal?: Float64Array;
  full?: Float64Array;
}

/** Up to this many non-zeros per row on average, a weight's eigenbasis diagonal is summed sparsely. */
const SPARSE_ROW_LIMIT = 4;

/**
 * The normalised traces ⟨G(z1)A1 ⋯ G(zk)Ak⟩ of several chains of one matrix, from one
 * eigendecomposition shared by all of them (THEORY.md, "Conventions"; the empty chain gives ⟨I⟩ = 1).
 *
 * Method: the spectrum alone when every weight is the identity, since then the chain is
 * (1/N) Σ_i Π_j 1/(λ_i − z_j); otherwise eigenpairs (eigen.ts) once, and per distinct weight at
 * most one eigenbasis diagonal (k = 1, or k = 2 with an identity partner; summed over the non-zeros
 * for a sparse weight, sparse-eigenbasis-diagonal.ts, else eigenbasis-diagonal.ts) and one eigenbasis matrix B = V*AV (k = 2 with two general weights, then
 * Tr(D1B1D2B2)/N = (1/N) Σ_{r,s} (D1)_r (B1)_rs (D2)_s (B2)_sr in O(N²)). Longer chains with
 * general weights go to `chainTrace` (O(kN³)). Accuracy as in chain-trace.ts and resolvent-trace.ts.
 */
export function chainStatistics(matrix: SquareMatrix, chains: readonly ChainOfResolvents[]): Complex[] {
  for (const chain of chains) {
    if (chain.weights.length !== chain.points.length) {
      throw new RangeError(`chainStatistics: ${chain.points.length} spectral parameters but ${chain.weights.length} weights`);
    }
  }
  const seen = new Map<SquareMatrix, WeightSeen>();
  const kindOf = (w: SquareMatrix): WeightSeen => {
    let s = seen.get(w);
    if (s === undefined) {
      s = { kind: weightKind(w) };
      seen.set(w, s);
    }
    return s;
  };
  const needsVectors = chains.some((c) => c.weights.some((w) => kindOf(w).kind !== 'identity'));
  const decomposition: SpectralDecomposition | null = needsVectors ? eigenpairs(matrix) : null;
  const values = decomposition?.values ?? eigenvalues(matrix);
  const diagonalOf = (w: SquareMatrix) => {
    const seen = kindOf(w);
    if (seen.diagonal === undefined) {
      const sparse = sparseEntries(w, SPARSE_ROW_LIMIT * w.size);
      seen.diagonal = sparse === null ? eigenbasisDiagonal(decomposition!, w) : sparseEigenbasisDiagonal(decomposition!, sparse);
    }
    return seen.diagonal;
  };
  const fullOf = (w: SquareMatrix) => (kindOf(w).full ??= eigenbasisMatrix(decomposition!, w));

  return chains.map((chain) => {
    const k = chain.points.length;
    if (k === 0) return { re: 1, im: 0 };
    const general = chain.weights.map((w) => kindOf(w).kind !== 'identity');
    if (!general.some(Boolean)) return identityChainTrace(values, chain.points);
    if (k === 1) return weightedTrace(values, chain.points, diagonalOf(chain.weights[0]));
    if (k === 2 && !(general[0] && general[1])) {
      return weightedTrace(values, chain.points, diagonalOf(chain.weights[general[0] ? 0 : 1]));
    }
    if (k === 2) return twoWeightTrace(values, chain.points, fullOf(chain.weights[0]), fullOf(chain.weights[1]));
    return chainTrace(decomposition!, chain.points, chain.weights);
  });
}

/** (1/N) Σ_i Π_j 1/(λ_i − z_j). */
function identityChainTrace(values: Float64Array, points: readonly Complex[]): Complex {
  let re = 0;
  let im = 0;
  for (let i = 0; i < values.length; i++) {
    let pr = 1;
    let pi = 0;
    for (const z of points) {
      const a = values[i] - z.re;
      const b = -z.im;
      const d = a * a + b * b;
      const qr = (pr * a + pi * b) / d;
      const qi = (pi * a - pr * b) / d;
      pr = qr;
      pi = qi;
    }
    re += pr;
    im += pi;
  }
  return { re: re / values.length, im: im / values.length };
}

/**
 * (1/N) Σ_i diag_i Π_j 1/(λ_i − z_j): a one-weight chain, whose weight enters only through the
 * diagonal of V*AV, since the other factors are diagonal in the eigenbasis (where it sits in the
 * chain does not matter, by cyclicity).
 */
function weightedTrace(values: Float64Array, points: readonly Complex[], diagonal: Float64Array): Complex {
  const n = values.length;
  const d = resolventProducts(values, points);
  let re = 0;
  let im = 0;
  for (let i = 0; i < n; i++) {
    re += d[2 * i] * diagonal[2 * i] - d[2 * i + 1] * diagonal[2 * i + 1];
    im += d[2 * i] * diagonal[2 * i + 1] + d[2 * i + 1] * diagonal[2 * i];
  }
  return { re: re / n, im: im / n };
}

function resolventProducts(values: Float64Array, points: readonly Complex[]): Float64Array {
  let d = resolventDiagonal(values, points[0]);
  for (let j = 1; j < points.length; j++) {
    const e = resolventDiagonal(values, points[j]);
    const next = new Float64Array(d.length);
    for (let i = 0; i < d.length; i += 2) {
      next[i] = d[i] * e[i] - d[i + 1] * e[i + 1];
      next[i + 1] = d[i] * e[i + 1] + d[i + 1] * e[i];
    }
    d = next;
  }
  return d;
}

/** (1/N) Σ_{r,s} (D1)_r (B1)_rs (D2)_s (B2)_sr. */
function twoWeightTrace(values: Float64Array, points: readonly Complex[], b1: Float64Array, b2: Float64Array): Complex {
  const n = values.length;
  const d1 = resolventDiagonal(values, points[0]);
  const d2 = resolventDiagonal(values, points[1]);
  let re = 0;
  let im = 0;
  for (let r = 0; r < n; r++) {
    let sr = 0;
    let si = 0;
    for (let s = 0; s < n; s++) {
      // (B1)_rs (D2)_s (B2)_sr
      const ar = b1[2 * (r * n + s)];
      const ai = b1[2 * (r * n + s) + 1];
      const cr = b2[2 * (s * n + r)];
      const ci = b2[2 * (s * n + r) + 1];
      const pr = ar * cr - ai * ci;
      const pi = ar * ci + ai * cr;
      sr += pr * d2[2 * s] - pi * d2[2 * s + 1];
      si += pr * d2[2 * s + 1] + pi * d2[2 * s];
    }
    re += d1[2 * r] * sr - d1[2 * r + 1] * si;
    im += d1[2 * r] * si + d1[2 * r + 1] * sr;
  }
  return { re: re / n, im: im / n };
}
