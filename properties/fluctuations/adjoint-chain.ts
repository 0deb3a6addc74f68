import type { ChainSpec } from '../../adapters/adapter.js';
import { conj } from '../../harness/numeric/complex.js';
import type { SquareMatrix } from '../../harness/numeric/square-matrix.js';

/** A*, the conjugate transpose of a weight. */
function adjointWeight(a: SquareMatrix): SquareMatrix {
  const n = a.size;
  const complexField = a.field === 'complex';
  const out = new Float64Array(a.data.length);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      if (complexField) {
        out[2 * (j * n + i)] = a.data[2 * (i * n + j)];
        out[2 * (j * n + i) + 1] = -a.data[2 * (i * n + j) + 1];
      } else {
        out[j * n + i] = a.data[i * n + j];
      }
    }
  }
  return { field: a.field, size: n, data: out };
}

/**
 * The chain whose trace is the complex conjugate of this one's for Hermitian H:
 * conj Tr(G(z1)A1 ⋯ G(zk)Ak) = Tr(Ak* G(z̄k) ⋯ A1* G(z̄1)) = Tr(G(z̄k)A_{k−1}* ⋯ G(z̄1)Ak*) by
 * cyclicity, so Cov(X, adjoint X) = E|X − EX|² (bilinear covariance with the conjugate).
 */
export function adjointChain(chain: ChainSpec): ChainSpec {
  const k = chain.points.length;
  if (k === 0) return chain;
  const points = [...chain.points].reverse().map(conj);
  const weights = Array.from({ length: k }, (_, j) => adjointWeight(chain.weights[j === k - 1 ? k - 1 : k - 2 - j]));
  return { points, weights };
}
