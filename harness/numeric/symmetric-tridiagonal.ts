/**
 * A real symmetric tridiagonal matrix T of order N: `diagonal` holds T_ii (length N) and
 * `offDiagonal` holds T_{i+1,i} = T_{i,i+1} (length max(N − 1, 0)). Both Householder reductions
 * (tridiagonalise-real.ts, tridiagonalise-hermitian.ts) produce one, and the QL iterations
 * (tridiagonal-ql.ts, tridiagonal-eigenvalues.ts) consume it.
 */
export interface SymmetricTridiagonal {
  readonly diagonal: Float64Array;
  readonly offDiagonal: Float64Array;
}
