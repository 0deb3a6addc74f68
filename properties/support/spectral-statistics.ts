import type { CheckContext, ConcludeContext } from '../../harness/check-group.js';
import type { Complex } from '../../harness/numeric/complex.js';
import { eigenvalues } from '../../harness/numeric/eigen.js';
import { normalisedResolventTrace } from '../../harness/numeric/resolvent-statistics.js';
import type { SquareMatrix } from '../../harness/numeric/square-matrix.js';

/**
 * Per-matrix statistics, from the implementation's routine when it offers one, else from the
 * harness's reference engine (then only the matrices, i.e. the sampler, are under test).
 */
export function eigenvalueOrigin(context: ConcludeContext): 'implementation' | 'harness' {
  return context.capabilities.has('eigenvalues') ? 'implementation' : 'harness';
}

export function resolventOrigin(context: ConcludeContext): 'implementation' | 'harness' {
  return context.capabilities.has('resolvent_trace') ? 'implementation' : 'harness';
}

export async function spectrumOf(context: CheckContext, matrix: SquareMatrix): Promise<Float64Array> {
  return eigenvalueOrigin(context) === 'implementation' ? context.adapter.eigenvalues(matrix) : eigenvalues(matrix);
}

export async function normalisedResolventTracesOf(
  context: CheckContext,
  matrix: SquareMatrix,
  points: readonly Complex[],
): Promise<Complex[]> {
  if (resolventOrigin(context) === 'implementation') return context.adapter.resolventTrace(matrix, points);
  const values = eigenvalues(matrix);
  return points.map((z) => normalisedResolventTrace(values, z));
}

/** The sentence a verdict's `path` carries. */
export function pathDescription(matrices: string, statistic: string, origin: 'implementation' | 'harness'): string {
  return `matrices: ${matrices}; statistic: ${origin === 'implementation' ? `implementation's ${statistic}` : `reference engine's ${statistic}`}`;
}

/** Why a statistical check cannot exercise the implementation at all, or null when it can. */
export function nothingToExercise(capabilities: ReadonlySet<string>, routine: string): string | null {
  return capabilities.has('sample') || capabilities.has(routine)
    ? null
    : `the implementation offers neither a sampler nor ${routine}: nothing of it would be exercised`;
}
