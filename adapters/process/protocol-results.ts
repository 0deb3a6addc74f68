import { AdapterFault, EnsembleNotOffered, NotAvailable } from '../adapter.js';
import type { Complex } from '../../harness/numeric/complex.js';
import { ensembleConstants, ensembleLabel, type EnsembleSpec } from '../../harness/numeric/ensemble.js';
import type { SquareMatrix } from '../../harness/numeric/square-matrix.js';
import { decodeMatrix, encodeMatrix, type WireMatrix } from './matrix-codec.js';
import { PROTOCOL_ERROR_CODES } from './protocol-error-codes.js';
import { resultProblem, type ProtocolMethod } from './protocol-schemas.js';
import { resultChecks } from './result-checks.js';
import { complexFromWire, complexToWire, realFromWire, realToWire, type WireComplex, type WireReal } from './wire-numbers.js';

/**
 * Protocol results (METHOD.result.json) to harness values and back. Reading checks the schema and
 * then what a schema cannot say (counts, finite numbers, matrix sizes), so every adapter that
 * speaks the protocol (a live program, a recording) reports a lying implementation the same way.
 */
export const protocolResults = {
  eigenvalues(result: unknown, matrix: SquareMatrix): Float64Array {
    const method = 'eigenvalues';
    const { values } = schemaChecked(method, result) as { values: WireReal[] };
    resultChecks.count(method, '/result/values', values.length, matrix.size, `one per row of the ${matrix.size}×${matrix.size} matrix`);
    const decoded = Float64Array.from(values, realFromWire);
    resultChecks.finiteReals(method, '/result/values', decoded);
    return decoded;
  },

  resolventTrace(result: unknown, points: readonly Complex[]): Complex[] {
    const method = 'resolvent_trace';
    const { values } = schemaChecked(method, result) as { values: WireComplex[] };
    resultChecks.count(method, '/result/values', values.length, points.length, 'one per point');
    const decoded = values.map(complexFromWire);
    resultChecks.finiteComplexes(method, '/result/values', decoded);
    return decoded;
  },

  chainTrace(result: unknown): Complex {
    const method = 'chain_trace';
    const { value } = schemaChecked(method, result) as { value: WireComplex };
    const decoded = complexFromWire(value);
    resultChecks.finiteComplexes(method, '/result', [decoded]);
    return decoded;
  },

  covariance(result: unknown): Complex {
    const method = 'covariance';
    const { value } = schemaChecked(method, result) as { value: WireComplex };
    const decoded = complexFromWire(value);
    resultChecks.finiteComplexes(method, '/result', [decoded]);
    return decoded;
  },

  sampleStatistics(result: unknown, count: number, chains: number): Complex[][] {
    const method = 'sample_statistics';
    const { values } = schemaChecked(method, result) as { values: WireComplex[][] };
    resultChecks.count(method, '/result/values', values.length, count, 'one row per sample');
    return values.map((row, k) => {
      const path = `/result/values/${k}`;
      resultChecks.count(method, path, row.length, chains, 'one value per requested chain');
      const decoded = row.map(complexFromWire);
      resultChecks.finiteComplexes(method, path, decoded);
      return decoded;
    });
  },

  sample(result: unknown, ensemble: EnsembleSpec, size: number, count: number): SquareMatrix[] {
    const method = 'sample';
    const { matrices } = schemaChecked(method, result) as { matrices: WireMatrix[] };
    resultChecks.count(method, '/result/matrices', matrices.length, count, 'the requested count');
    const field = ensembleConstants(ensemble, size).field;
    return matrices.map((wire, k) => {
      const path = `/result/matrices/${k}`;
      const matrix = decodeMatrix(wire, method, path);
      if (matrix.size !== size || matrix.field !== field) {
        throw new AdapterFault(method, 'malformed-response', `${method}: ${path} is a ${matrix.size}×${matrix.size} ${matrix.field} matrix; ${ensembleLabel(ensemble)} at size ${size} needs ${size}×${size} ${field}`);
      }
      resultChecks.finiteMatrix(method, path, matrix);
      return matrix;
    });
  },
};

/** Harness values in the protocol's result form, for writing recordings. */
export const protocolResultOf = {
  eigenvalues: (values: ArrayLike<number>) => ({ values: Array.from(values, realToWire) }),
  resolventTrace: (values: readonly Complex[]) => ({ values: values.map(complexToWire) }),
  chainTrace: (value: Complex) => ({ value: complexToWire(value) }),
  sample: (matrices: readonly SquareMatrix[]) => ({ matrices: matrices.map(encodeMatrix) }),
  covariance: (value: Complex) => ({ value: complexToWire(value) }),
  sampleStatistics: (rows: readonly (readonly Complex[])[]) => ({ values: rows.map((row) => row.map(complexToWire)) }),
};

function schemaChecked(method: ProtocolMethod, result: unknown): unknown {
  const problem = resultProblem(method, result);
  if (problem !== undefined) throw new AdapterFault(method, 'malformed-response', `${method}: the result does not have the protocol's shape: ${problem}`);
  return result;
}

/**
 * A JSON-RPC error answer as the harness sees it: 1001 (ensemble not offered) and 1002 (not
 * available) skip the checks that need the answer; any other code is a fault of the implementation.
 */
export function protocolErrorAsException(method: ProtocolMethod, code: number, message: string, ensemble?: EnsembleSpec): Error {
  if (code === PROTOCOL_ERROR_CODES.ensembleNotOffered && ensemble !== undefined) return new EnsembleNotOffered(ensembleLabel(ensemble));
  if (code === PROTOCOL_ERROR_CODES.notAvailable || code === PROTOCOL_ERROR_CODES.ensembleNotOffered) {
    return new NotAvailable(`${method}: the implementation cannot answer this request: ${message}`);
  }
  return new AdapterFault(method, 'implementation-error', `${method}: the implementation answered error ${code}: ${message}`);
}
