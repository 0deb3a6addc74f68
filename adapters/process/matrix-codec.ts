import { endianness } from 'node:os';
import { AdapterFault } from '../adapter.js';
import { expectedDataLength, type Field, type SquareMatrix } from '../../harness/numeric/square-matrix.js';

/**
 * A matrix as the process protocol carries it (schemas/matrix.json): the entries row-major as
 * little-endian IEEE-754 float64, complex entries as (re, im), base64-encoded. That is the byte
 * image of SquareMatrix.data on a little-endian machine, so both directions are a byte copy there;
 * a big-endian machine swaps through a DataView.
 */
export interface WireMatrix {
  readonly size: number;
  readonly field: Field;
  readonly data: string;
}

const HOST_IS_LITTLE_ENDIAN = endianness() === 'LE';
const BYTES_PER_FLOAT64 = 8;

export function encodeMatrix(matrix: SquareMatrix): WireMatrix {
  const expected = expectedDataLength(matrix.field, matrix.size);
  if (matrix.data.length !== expected) {
    throw new RangeError(`a ${matrix.size}×${matrix.size} ${matrix.field} matrix needs ${expected} numbers, not ${matrix.data.length}`);
  }
  let bytes: Buffer;
  if (HOST_IS_LITTLE_ENDIAN) {
    bytes = Buffer.from(matrix.data.buffer, matrix.data.byteOffset, matrix.data.byteLength);
  } else {
    bytes = Buffer.alloc(matrix.data.byteLength);
    const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
    for (let k = 0; k < matrix.data.length; k++) view.setFloat64(k * BYTES_PER_FLOAT64, matrix.data[k], true);
  }
  return { size: matrix.size, field: matrix.field, data: bytes.toString('base64') };
}

/**
 * Reads a wire matrix back. `wire` should already have passed schemas/matrix.json; this checks what
 * a schema cannot: that the payload is base64 of exactly 8·N² (real) or 16·N² (complex) bytes.
 * Non-finite entries are decoded as they are: whether they are allowed is the caller's decision.
 * Throws AdapterFault 'malformed-response' naming `method` and the JSON path `path`.
 */
export function decodeMatrix(wire: WireMatrix, method: string, path: string): SquareMatrix {
  const fail = (why: string): never => {
    throw new AdapterFault(method, 'malformed-response', `${method}: the matrix at ${path} ${why}`);
  };
  const { size, field, data } = wire;
  if (!Number.isSafeInteger(size) || size < 1) fail(`has size ${String(size)}, not a positive integer`);
  if (field !== 'real' && field !== 'complex') fail(`has field ${JSON.stringify(field)}, not "real" or "complex"`);
  if (typeof data !== 'string') fail('has no base64 string in data');
  const count = expectedDataLength(field, size);
  const byteLength = count * BYTES_PER_FLOAT64;
  // Base64 with padding: 4 characters per 3 bytes, rounded up. Node's decoder skips characters
  // outside the alphabet, so checking the length before and after decoding catches corrupt text.
  const textLength = 4 * Math.ceil(byteLength / 3);
  if (data.length !== textLength) {
    const bytes = Math.floor((data.replace(/=+$/, '').length * 3) / 4);
    fail(`holds about ${bytes} bytes of base64 data; a ${size}×${size} ${field} matrix needs ${byteLength} (${count} float64)`);
  }
  const bytes = Buffer.from(data, 'base64');
  if (bytes.byteLength !== byteLength) {
    fail(`has data that is not valid base64 (decoded ${bytes.byteLength} bytes, expected ${byteLength})`);
  }
  // Copy into a fresh, 8-byte-aligned buffer: a decoded Buffer may be a slice of Node's shared
  // pool at an offset a Float64Array cannot start at.
  const out = new Float64Array(count);
  if (HOST_IS_LITTLE_ENDIAN) {
    new Uint8Array(out.buffer).set(bytes);
  } else {
    const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
    for (let k = 0; k < count; k++) out[k] = view.getFloat64(k * BYTES_PER_FLOAT64, true);
  }
  return { field, size, data: out };
}
