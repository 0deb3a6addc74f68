import { describe, expect, it } from 'vitest';
import { AdapterFault } from '../../../adapters/adapter.js';
import { decodeMatrix, encodeMatrix } from '../../../adapters/process/matrix-codec.js';
import type { SquareMatrix } from '../../../harness/numeric/square-matrix.js';

describe('matrix codec', () => {
  it('writes little-endian float64, row-major, complex as (re, im)', () => {
    const m: SquareMatrix = { field: 'complex', size: 1, data: new Float64Array([1.5, -2]) };
    const bytes = Buffer.from(encodeMatrix(m).data, 'base64');
    // IEEE-754 binary64: 1.5 = 0x3FF8000000000000, −2 = 0xC000000000000000 (IEEE 754-2019, §3.4).
    expect([...bytes]).toEqual([0, 0, 0, 0, 0, 0, 0xf8, 0x3f, 0, 0, 0, 0, 0, 0, 0, 0xc0]);
  });

  it('round-trips every bit pattern, including −0, NaN, infinities and subnormals', () => {
    const special = [0, -0, NaN, Infinity, -Infinity, Number.MIN_VALUE, -Number.MAX_VALUE, Math.PI, 1 / 3];
    for (const field of ['real', 'complex'] as const) {
      const size = 3;
      const data = new Float64Array((field === 'complex' ? 2 : 1) * size * size).map((_, k) => special[k % special.length]);
      const back = decodeMatrix(encodeMatrix({ field, size, data }), 'sample', '/result/matrices/0');
      expect(back.field).toBe(field);
      expect(back.size).toBe(size);
      expect(Buffer.from(back.data.buffer).equals(Buffer.from(data.buffer))).toBe(true);
    }
  });

  it('encodes a Float64Array view that starts at an offset inside its buffer', () => {
    const backing = new Float64Array([9, 1, 2, 3, 4, 9]);
    const view = backing.subarray(1, 5);
    const back = decodeMatrix(encodeMatrix({ field: 'real', size: 2, data: view }), 'eigenvalues', '/params/matrix');
    expect([...back.data]).toEqual([1, 2, 3, 4]);
  });

  it('decodes small payloads, which Node may place at unaligned offsets of its buffer pool', () => {
    // Several decodes in a row land at different pool offsets; each must still be exact.
    for (let size = 1; size <= 6; size++) {
      const data = Float64Array.from({ length: size * size }, (_, k) => k + 0.25);
      expect([...decodeMatrix(encodeMatrix({ field: 'real', size, data }), 'm', '/p').data]).toEqual([...data]);
    }
  });

  it('rejects a payload of the wrong length with the path and the expected size', () => {
    const wire = { ...encodeMatrix({ field: 'real', size: 2, data: new Float64Array(4) }), size: 3 };
    const error = (() => {
      try {
        decodeMatrix(wire, 'sample', '/result/matrices/2');
      } catch (e) {
        return e;
      }
    })();
    expect(error).toBeInstanceOf(AdapterFault);
    expect(error).toMatchObject({ kind: 'malformed-response', method: 'sample' });
    expect((error as Error).message).toMatch(/\/result\/matrices\/2 holds about 32 bytes .* 3×3 real matrix needs 72 \(9 float64\)/);
  });

  it('rejects characters outside the base64 alphabet', () => {
    const wire = encodeMatrix({ field: 'real', size: 1, data: new Float64Array([1]) });
    const corrupt = { ...wire, data: `!${wire.data.slice(1)}` };
    expect(() => decodeMatrix(corrupt, 'eigenvalues', '/x')).toThrow(/not valid base64/);
  });

  it('rejects a size that is not a positive integer and an unknown field', () => {
    expect(() => decodeMatrix({ size: 0, field: 'real', data: '' }, 'm', '/x')).toThrow(/size 0, not a positive integer/);
    expect(() => decodeMatrix({ size: 1, field: 'quaternion' as 'real', data: 'AAAAAAAA8D8=' }, 'm', '/x')).toThrow(/field "quaternion"/);
  });

  it('refuses to encode a matrix whose data has the wrong length', () => {
    expect(() => encodeMatrix({ field: 'complex', size: 2, data: new Float64Array(4) })).toThrow(RangeError);
  });
});
