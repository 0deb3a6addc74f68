import type { SquareMatrix } from '../numeric/square-matrix.js';
import type { ComplexPair } from './baseline-file.js';

/**
 * [Re Tr H, ‖H‖_F²]: two sums that any change in how the harness draws a matrix moves at order
 * one, while the last-bit differences of Math.log and Math.cos between JavaScript engines move
 * them by about 1e-16 relative (random-stream.ts).
 */
export function inputFingerprint(matrix: SquareMatrix): ComplexPair {
  const n = matrix.size;
  const stride = matrix.field === 'complex' ? 2 : 1;
  let trace = 0;
  let frobenius = 0;
  for (let i = 0; i < n; i++) trace += matrix.data[stride * (i * n + i)];
  for (const x of matrix.data) frobenius += x * x;
  return [trace, frobenius];
}

/**
 * Whether two fingerprints name the same matrix up to rounding: relative 1e-9 of ‖H‖_F² on both
 * parts (|Re Tr H| ≤ √N‖H‖_F, so the trace's scale is at most that; far above engine noise, far
 * below the order-one change of another matrix; common practice).
 */
export function sameInput(a: ComplexPair, b: ComplexPair): boolean {
  const scale = Math.max(Math.abs(a[1]), Math.abs(b[1]), Number.MIN_VALUE);
  return Math.abs(a[0] - b[0]) <= 1e-9 * scale && Math.abs(a[1] - b[1]) <= 1e-9 * scale;
}
