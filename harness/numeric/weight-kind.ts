import type { SquareMatrix } from './square-matrix.js';

/**
 * What a chain weight is, for choosing the cheapest exact way to evaluate a trace: the identity
 * (a resolvent without weight, which needs only the spectrum), a diagonal matrix (its eigenbasis
 * diagonal costs O(N²)), or general. Exact comparisons: a weight that is the identity up to
 * rounding is general, and is evaluated as such.
 */
export type WeightKind = 'identity' | 'diagonal' | 'general';

export function weightKind(weight: SquareMatrix): WeightKind {
  const n = weight.size;
  const stride = weight.field === 'complex' ? 2 : 1;
  const data = weight.data;
  let identity = true;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const k = stride * (i * n + j);
      const im = stride === 2 ? data[k + 1] : 0;
      if (i === j) {
        if (data[k] !== 1 || im !== 0) identity = false;
      } else if (data[k] !== 0 || im !== 0) {
        return 'general';
      }
    }
  }
  return identity ? 'identity' : 'diagonal';
}
