import { gaussianMoment } from './exact-moment-enumeration.js';

/**
 * E Tr T^{2k} for the tridiagonal models of the Gaussian ensembles (Dumitriu and Edelman 2002,
 * J. Math. Phys. 43): T is symmetric tridiagonal with independent entries, whose eigenvalues have
 * the same joint law as those of the full matrix, so every trace moment agrees:
 *   GOE (off-diagonal variance 1, diagonal 2): diagonal N(0, 2), off-diagonal b_i ~ χ_{N−i};
 *   GUE (E|x_ij|² = 1, diagonal 1):            diagonal N(0, 1), off-diagonal b_i ~ χ_{2(N−i)}/√2.
 * An independent exact route to the moment tables: it shares nothing with Wick pairings or the
 * loop equations.
 *
 * Method: Tr T^{2k} is the sum over closed walks of length 2k on the path 1 … N (a loop at i
 * contributes a_i, a step across edge i contributes b_i). A dynamic programme over the walk keeps,
 * for each current vertex, the count of walks per exponent vector; the expectation then factors
 * over the independent entries, with exact integer moments:
 *   E a^{2p} = (2p − 1)!!·v^p (variance v), E b^{2q} = ν(ν + 2)⋯(ν + 2q − 2) for b ~ χ_ν, and for
 *   b ~ χ_{2m}/√2, E b^{2q} = m(m + 1)⋯(m + q − 1).
 */
export function tridiagonalTraceMoment(ensemble: 'goe' | 'gue', N: number, k: number): bigint {
  const variables = 2 * N - 1; // a_1..a_N, then b_1..b_{N−1}
  const bits = 5;
  if (2 * k >= 1 << bits || variables * bits > 52) throw new RangeError('tridiagonalTraceMoment: N or k too large for the exponent packing');
  const unit = (v: number): number => 2 ** (v * bits);
  let total = 0n;
  for (let start = 0; start < N; start++) {
    let layer: Map<number, bigint>[] = Array.from({ length: N }, () => new Map());
    layer[start].set(0, 1n);
    for (let step = 0; step < 2 * k; step++) {
      const next: Map<number, bigint>[] = Array.from({ length: N }, () => new Map());
      const bump = (vertex: number, key: number, count: bigint): void => {
        next[vertex].set(key, (next[vertex].get(key) ?? 0n) + count);
      };
      layer.forEach((states, i) => {
        for (const [key, count] of states) {
          bump(i, key + unit(i), count);
          if (i > 0) bump(i - 1, key + unit(N + i - 1), count);
          if (i < N - 1) bump(i + 1, key + unit(N + i), count);
        }
      });
      layer = next;
    }
    for (const [key, count] of layer[start]) total += count * expectation(ensemble, N, key, bits);
  }
  return total;
}

function expectation(ensemble: 'goe' | 'gue', N: number, key: number, bits: number): bigint {
  let product = 1n;
  for (let v = 0; v < 2 * N - 1; v++) {
    const power = Math.floor(key / 2 ** (v * bits)) % 2 ** bits;
    if (power % 2 === 1) return 0n;
    if (v < N) {
      product *= gaussianMoment(power) * (ensemble === 'goe' ? 2n ** BigInt(power / 2) : 1n);
    } else {
      const i = v - N + 1; // edge i joins vertices i and i + 1 (1-based)
      const q = power / 2;
      for (let j = 0; j < q; j++) {
        product *= ensemble === 'goe' ? BigInt(N - i + 2 * j) : BigInt(N - i + j);
      }
    }
  }
  return product;
}
