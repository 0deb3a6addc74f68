// The rmt-assay process protocol for a Node program: copy this file next to your code and leave it
// as it is. Your entry point calls `serve` with the functions you have; rmt-assay starts it with
// `--exec "node your-entry.mjs"` and talks JSON-RPC 2.0 over stdin/stdout, one message per line
// (adapters/process/PROTOCOL.md). Plain JavaScript, no dependencies, no build step.
//
//   serve({ name, version, eigenvalues, resolventTrace, chainTrace, sample })
//
// A matrix reaches your functions as { size, field: 'real' | 'complex', data: Float64Array }:
// row-major, a complex entry as (re, im). A complex number is { re, im }.
//   eigenvalues(H)                          -> N numbers, ascending
//   resolventTrace(H, points, weight?)      -> one complex per point: Tr((H − z)⁻¹A)/N
//   chainTrace(H, points, weights)          -> complex: Tr(G(z1)A1 ⋯ G(zk)Ak)/N
//   sample(ensemble, size, seed, count)     -> count matrices; throw new EnsembleNotOffered(ensemble)
//                                              for an ensemble you do not sample
// Any of them may throw new NotAvailable('why') for a request it cannot answer: those checks are skipped.
import { createInterface } from 'node:readline';

// JSON-RPC 2.0 error codes (JSON-RPC 2.0 Specification, 2010, §5.1) and the protocol's own.
export const ERROR_CODES = {
  parseError: -32700,
  invalidRequest: -32600,
  methodNotFound: -32601,
  invalidParams: -32602,
  computationFailed: -32000,
  ensembleNotOffered: 1001,
  notAvailable: 1002,
};

export class EnsembleNotOffered extends Error {
  constructor(ensemble) {
    super(`ensemble not offered: ${JSON.stringify(ensemble)}`);
  }
}

/** Throw from any function for a request you cannot answer: rmt-assay skips the checks that need it. */
export class NotAvailable extends Error {}

class ProtocolError extends Error {
  constructor(code, message) {
    super(message);
    this.code = code;
  }
}

/** Wire matrix → { size, field, data: Float64Array }; the copy also fixes alignment. */
export function decodeMatrix(wire) {
  const { size, field, data } = wire ?? {};
  if (!Number.isInteger(size) || size < 1 || (field !== 'real' && field !== 'complex') || typeof data !== 'string') {
    throw new ProtocolError(ERROR_CODES.invalidParams, 'malformed matrix');
  }
  const bytes = Buffer.from(data, 'base64');
  const count = (field === 'complex' ? 2 : 1) * size * size;
  if (bytes.byteLength !== 8 * count) throw new ProtocolError(ERROR_CODES.invalidParams, `matrix data holds ${bytes.byteLength} bytes, expected ${8 * count}`);
  const out = new Float64Array(count);
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  for (let k = 0; k < count; k++) out[k] = view.getFloat64(8 * k, true);
  return { size, field, data: out };
}

export function encodeMatrix({ size, field, data }) {
  const bytes = Buffer.alloc(8 * data.length);
  for (let k = 0; k < data.length; k++) bytes.writeDoubleLE(data[k], 8 * k);
  return { size, field, data: bytes.toString('base64') };
}

// JSON has no NaN or infinities: the protocol sends them as strings, and the harness flags them.
function wireReal(x) {
  if (Number.isNaN(x)) return 'NaN';
  if (x === Infinity) return 'Infinity';
  if (x === -Infinity) return '-Infinity';
  return x;
}

const wireComplex = (z) => [wireReal(z.re), wireReal(z.im)];

function pointFromWire(pair) {
  if (!Array.isArray(pair) || pair.length !== 2) throw new ProtocolError(ERROR_CODES.invalidParams, 'a point must be [re, im]');
  return { re: pair[0], im: pair[1] };
}

function dispatchers(functions) {
  const table = {};
  const { eigenvalues, resolventTrace, chainTrace, sample } = functions;
  if (eigenvalues) table.eigenvalues = (p) => ({ values: Array.from(eigenvalues(decodeMatrix(p.matrix)), wireReal) });
  if (resolventTrace) {
    table.resolvent_trace = (p) => {
      const weight = p.weight === undefined ? undefined : decodeMatrix(p.weight);
      return { values: resolventTrace(decodeMatrix(p.matrix), p.points.map(pointFromWire), weight).map(wireComplex) };
    };
  }
  if (chainTrace) {
    table.chain_trace = (p) => ({ value: wireComplex(chainTrace(decodeMatrix(p.matrix), p.points.map(pointFromWire), p.weights.map(decodeMatrix))) });
  }
  if (sample) table.sample = (p) => ({ matrices: sample(p.ensemble, p.size, p.seed, p.count).map(encodeMatrix) });
  return table;
}

/** Answers requests on stdin until it closes, then exits. */
export function serve({ name, version, ...functions }) {
  const table = dispatchers(functions);
  const description = { name: String(name), version: String(version), capabilities: Object.keys(table) };
  const out = process.stdout;
  // Anything your code logs goes to stderr, which rmt-assay keeps; stdout carries only answers.
  console.log = console.info = console.debug = console.error;
  const send = (message) => out.write(`${JSON.stringify(message)}\n`);

  const answer = (request) => {
    if (request === null || typeof request !== 'object' || request.jsonrpc !== '2.0' || typeof request.method !== 'string') {
      throw new ProtocolError(ERROR_CODES.invalidRequest, 'not a JSON-RPC 2.0 request');
    }
    if (request.method === 'describe') return description;
    const method = table[request.method];
    if (method === undefined) throw new ProtocolError(ERROR_CODES.methodNotFound, `method not found: ${request.method}`);
    if (request.params === null || typeof request.params !== 'object') throw new ProtocolError(ERROR_CODES.invalidParams, `${request.method} needs params`);
    return method(request.params);
  };

  const lines = createInterface({ input: process.stdin, crlfDelay: Infinity });
  lines.on('line', (line) => {
    if (line.trim() === '') return;
    let request;
    try {
      request = JSON.parse(line);
    } catch (error) {
      send({ jsonrpc: '2.0', id: null, error: { code: ERROR_CODES.parseError, message: `parse error: ${error.message}` } });
      return;
    }
    const id = request?.id ?? null;
    try {
      send({ jsonrpc: '2.0', id, result: answer(request) });
    } catch (error) {
      const code =
        error instanceof EnsembleNotOffered ? ERROR_CODES.ensembleNotOffered
        : error instanceof NotAvailable ? ERROR_CODES.notAvailable
        : error instanceof ProtocolError ? error.code
        : ERROR_CODES.computationFailed;
      if (code === ERROR_CODES.computationFailed) console.error(error);
      send({ jsonrpc: '2.0', id, error: { code, message: `${error.message}` } });
    }
  });
  lines.on('close', () => process.exit(0));
}
