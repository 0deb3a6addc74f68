import { AdapterFault } from '../../adapters/adapter.js';
import type { CheckContext } from '../../harness/check-group.js';
import type { Complex } from '../../harness/numeric/complex.js';
import type { SquareMatrix } from '../../harness/numeric/square-matrix.js';

/**
 * The implementation's ⟨G(z)A⟩ at the given points, one value per point: a different count is a
 * malformed answer, reported as a fault of resolventTrace (as the module and process adapters do),
 * not compared.
 */
export async function checkedResolventTraces(
  context: CheckContext,
  matrix: SquareMatrix,
  points: readonly Complex[],
  weight?: SquareMatrix,
): Promise<Complex[]> {
  const values = await context.adapter.resolventTrace(matrix, points, weight);
  if (values.length !== points.length) {
    throw new AdapterFault('resolventTrace', 'invalid-value', `expected ${points.length} values, got ${values.length}`);
  }
  return values;
}
