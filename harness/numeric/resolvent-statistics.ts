/**
 * Resolvent and linear statistics from one eigendecomposition H = V Λ V* (eigen.ts): the
 * spectrum gives ⟨G(z)⟩ and Tr f(H) in O(N); the eigenvectors give ⟨G(z)A⟩ (one O(N²)–O(N³)
 * diagonal per weight, then O(N) per z) and the chains ⟨G(z1)A1 ⋯ G(zk)Ak⟩ (O(kN³)).
 * One concept per file; this module gathers them.
 */
export { chainTrace } from './chain-trace.js';
export { eigenbasisDiagonal } from './eigenbasis-diagonal.js';
export { eigenbasisMatrix } from './eigenbasis-matrix.js';
export { linearStatistic } from './linear-statistic.js';
export { normalisedResolventTrace, resolventDiagonal, weightedResolventTrace } from './resolvent-trace.js';
