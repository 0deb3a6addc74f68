import { AdapterFault } from '../adapter.js';
import type { Complex } from '../../harness/numeric/complex.js';
import { formatNumber } from '../../harness/numeric/complex.js';
import type { SquareMatrix } from '../../harness/numeric/square-matrix.js';

/**
 * Checks of a decoded result that its schema cannot express: how many values there are, and that
 * every number is finite. A wrong count is a malformed response; a NaN or an infinity is an
 * invalid value. Each throws an AdapterFault naming the method and the JSON path.
 */
export const resultChecks = {
  count(method: string, path: string, actual: number, expected: number, what: string): void {
    if (actual !== expected) {
      throw new AdapterFault(method, 'malformed-response', `${method}: ${path} holds ${actual} values; expected ${expected} (${what})`);
    }
  },

  finiteReals(method: string, path: string, values: ArrayLike<number>): void {
    const bad: string[] = [];
    let count = 0;
    for (let k = 0; k < values.length; k++) {
      if (Number.isFinite(values[k])) continue;
      count++;
      if (bad.length < 3) bad.push(`${path}/${k} is ${formatNumber(values[k])}`);
    }
    if (count > 0) throw invalid(method, bad, count);
  },

  finiteComplexes(method: string, path: string, values: readonly Complex[]): void {
    const bad: string[] = [];
    let count = 0;
    values.forEach((z, k) => {
      if (Number.isFinite(z.re) && Number.isFinite(z.im)) return;
      count++;
      if (bad.length < 3) bad.push(`${path}/${k} is [${formatNumber(z.re)}, ${formatNumber(z.im)}]`);
    });
    if (count > 0) throw invalid(method, bad, count);
  },

  finiteMatrix(method: string, path: string, matrix: SquareMatrix): void {
    const stride = matrix.field === 'complex' ? 2 : 1;
    const bad: string[] = [];
    let count = 0;
    for (let k = 0; k < matrix.data.length; k++) {
      if (Number.isFinite(matrix.data[k])) continue;
      count++;
      if (bad.length < 3) {
        const entry = Math.floor(k / stride);
        const part = stride === 2 ? (k % 2 === 0 ? ' (real part)' : ' (imaginary part)') : '';
        bad.push(`${path} entry (${Math.floor(entry / matrix.size)}, ${entry % matrix.size})${part} is ${formatNumber(matrix.data[k])}`);
      }
    }
    if (count > 0) throw invalid(method, bad, count);
  },
};

function invalid(method: string, examples: string[], count: number): AdapterFault {
  const more = count > examples.length ? ` (${count} non-finite numbers in all)` : '';
  return new AdapterFault(method, 'invalid-value', `${method}: non-finite result: ${examples.join(', ')}${more}`);
}
