import { describe, expect, it } from 'vitest';
import { requestProblem, responseEnvelopeProblem, resultProblem } from '../../../adapters/process/protocol-schemas.js';
import { requestParams } from '../../../adapters/process/request-params.js';
import { identityMatrix } from '../../../harness/numeric/square-matrix.js';
import { tridiagonal } from './process-test-support.js';

const request = (id: number, method: string, params?: object) => (params === undefined ? { jsonrpc: '2.0', id, method } : { jsonrpc: '2.0', id, method, params });
const z = [{ re: 0.5, im: 1 }, { re: -1, im: 0.25 }];

describe('protocol schemas: what the adapter sends', () => {
  it('accepts every request the adapter builds', () => {
    const H = tridiagonal(3);
    const A = identityMatrix('complex', 3);
    const sent = [
      request(1, 'describe'),
      request(2, 'eigenvalues', requestParams.eigenvalues(H)),
      request(3, 'resolvent_trace', requestParams.resolventTrace(H, z)),
      request(4, 'resolvent_trace', requestParams.resolventTrace(H, z, A)),
      request(5, 'chain_trace', requestParams.chainTrace(H, z, [A, H])),
      request(6, 'sample', requestParams.sample({ kind: 'goe' }, 4, 7, 2)),
      request(7, 'sample', requestParams.sample({ kind: 'wigner', field: 'complex', offDiagonal: 'sparse-bernoulli', meanDegree: 3, diagonal: 'zero', diagonalVariance: 0 }, 4, 7, 2)),
    ];
    // The wire form is what JSON.stringify makes of it (an undefined member disappears).
    for (const message of sent) expect(requestProblem(JSON.parse(JSON.stringify(message)))).toBeUndefined();
  });

  it('rejects a sparse ensemble without its mean degree and an unknown law', () => {
    const sparse = { kind: 'wigner', field: 'real', offDiagonal: 'sparse-bernoulli', diagonal: 'zero', diagonalVariance: 0 };
    expect(requestProblem(request(1, 'sample', { ensemble: sparse, size: 4, seed: 1, count: 1 }))).toMatch(/\/params\/ensemble/);
    const cauchy = { ...sparse, offDiagonal: 'cauchy', meanDegree: 2 };
    expect(requestProblem(request(1, 'sample', { ensemble: cauchy, size: 4, seed: 1, count: 1 }))).toMatch(/\/params\/ensemble/);
  });

  it('refuses to build params from non-finite points or a negative seed', () => {
    expect(() => requestParams.resolventTrace(tridiagonal(2), [{ re: NaN, im: 1 }])).toThrow(/must be finite/);
    expect(() => requestParams.sample({ kind: 'gue' }, 4, -1, 1)).toThrow(/seed must be an integer ≥ 0/);
    expect(() => requestParams.chainTrace(tridiagonal(2), z, [tridiagonal(2)])).toThrow(/as many weights as points/);
  });
});

describe('protocol schemas: what the program answers', () => {
  it('accepts results with numbers and the non-finite strings', () => {
    expect(resultProblem('eigenvalues', { values: [-1, 0.5, 'NaN', 'Infinity', '-Infinity'] })).toBeUndefined();
    expect(resultProblem('resolvent_trace', { values: [[0, 1], ['NaN', 2]] })).toBeUndefined();
    expect(resultProblem('chain_trace', { value: [0.25, -0.5], seconds: 0.1 })).toBeUndefined();
    expect(resultProblem('describe', { name: 'lab', version: '1', capabilities: ['eigenvalues', 'covariance'] })).toBeUndefined();
  });

  it('names the JSON path of each problem', () => {
    expect(resultProblem('eigenvalues', { values: [1, 'nan'] })).toBe('at /result/values/1: must be number or must be one of "NaN", "Infinity", "-Infinity"');
    expect(resultProblem('chain_trace', { value: [1] })).toBe('at /result/value: must NOT have fewer than 2 items');
    expect(resultProblem('resolvent_trace', { vals: [] })).toBe("at /result: must have required property 'values'");
    expect(resultProblem('sample', { matrices: [{ size: 2, field: 'real', data: 'not base64!' }] })).toMatch(/^at \/result\/matrices\/0\/data: must match pattern/);
  });

  it('checks the response envelope: version, id, exactly one of result and error', () => {
    expect(responseEnvelopeProblem({ jsonrpc: '2.0', id: 3, result: {} })).toBeUndefined();
    expect(responseEnvelopeProblem({ jsonrpc: '2.0', id: null, error: { code: -32700, message: 'parse error' } })).toBeUndefined();
    expect(responseEnvelopeProblem({ jsonrpc: '1.0', id: 3, result: {} })).toBe('at /jsonrpc: must be "2.0"');
    expect(responseEnvelopeProblem({ jsonrpc: '2.0', id: 3, result: {}, error: { code: 1, message: 'x' } })).toBe(
      'at (top level): does not match: JSON-RPC 2.0 response: exactly one of result and error',
    );
    expect(responseEnvelopeProblem({ jsonrpc: '2.0', id: 3 })).toBe("at (top level): must have required property 'result' or must have required property 'error'");
    expect(responseEnvelopeProblem({ jsonrpc: '2.0', id: 3, error: { code: 'E1', message: 'x' } })).toBe('at /error/code: must be integer');
  });
});
