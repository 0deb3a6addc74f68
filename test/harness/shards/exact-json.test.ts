import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ExactJsonError, fromExactJson, toExactJson, type ExactJson } from '../../../harness/shards/exact-json.js';

/** What a shard file does with a value: encode, write as JSON text, read the text back, decode. */
function throughText(value: unknown): unknown {
  return fromExactJson(JSON.parse(JSON.stringify(toExactJson(value))) as ExactJson);
}

/** The bytes of a Float64Array's view, so that NaN payloads and the sign of zero are compared too. */
function bytesOf(values: Float64Array): number[] {
  return Array.from(new Uint8Array(values.buffer, values.byteOffset, values.byteLength));
}

/** Doubles that plain JSON loses or that are easy to get wrong: signed zeros, non-finite values, subnormals, extremes. */
const AWKWARD_DOUBLES = [0, -0, NaN, Infinity, -Infinity, Number.MIN_VALUE, -Number.MIN_VALUE, 2.2250738585072009e-308, Number.MAX_VALUE, -Number.MAX_VALUE, Number.EPSILON, 0.1, 1 / 3];

describe('exact JSON for shard files: numbers', () => {
  it('gives back every awkward double exactly, −0 and NaN included (Object.is)', () => {
    for (const x of AWKWARD_DOUBLES) expect(Object.is(throughText(x), x), `round trip of ${Object.is(x, -0) ? '-0' : x}`).toBe(true);
  });

  it('gives back any double drawn by fast-check, which favours extremes, −0, NaN and subnormals', () => {
    fc.assert(fc.property(fc.double(), (x) => Object.is(throughText(x), x)));
  });

  it('writes finite non-zero-signed numbers as plain JSON numbers, and tags only what JSON cannot hold', () => {
    expect(toExactJson(0.1)).toBe(0.1);
    expect(toExactJson(-0)).toEqual({ $number: '-0' });
    expect(toExactJson(NaN)).toEqual({ $number: 'NaN' });
    expect(toExactJson(-Infinity)).toEqual({ $number: '-Infinity' });
  });
});

describe('exact JSON for shard files: Float64Arrays', () => {
  it('gives back the awkward doubles in one array, byte for byte', () => {
    const values = Float64Array.from(AWKWARD_DOUBLES);
    const back = throughText(values);
    expect(back).toBeInstanceOf(Float64Array);
    expect(bytesOf(back as Float64Array)).toEqual(bytesOf(values));
  });

  it('gives back arrays of random bit patterns byte for byte, NaN payloads included', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.integer({ min: 0, max: 0xffffffff }), fc.integer({ min: 0, max: 0xffffffff })), { maxLength: 40 }), (words) => {
        const values = new Float64Array(new Uint32Array(words.flat()).buffer);
        const back = throughText(values) as Float64Array;
        return back instanceof Float64Array && back.length === values.length && bytesOf(back).join() === bytesOf(values).join();
      }),
    );
  });

  it('writes only the elements of a view into a larger buffer', () => {
    const buffer = Float64Array.from([1, 2, 3, 4, 5]).buffer;
    const view = new Float64Array(buffer, 8, 3);
    expect(Array.from(throughText(view) as Float64Array)).toEqual([2, 3, 4]);
  });

  it('gives back an empty array as an empty Float64Array', () => {
    const back = throughText(new Float64Array(0));
    expect(back).toBeInstanceOf(Float64Array);
    expect((back as Float64Array).length).toBe(0);
  });
});

/** Plain data as unit outcomes hold it: nested objects and arrays of numbers, strings, booleans, null and Float64Arrays. */
const plainData = fc.letrec<{ value: unknown }>((tie) => ({
  value: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    fc.double(),
    fc.string(),
    fc.boolean(),
    fc.constant(null),
    fc.float64Array({ maxLength: 6 }),
    fc.array(tie('value'), { maxLength: 4 }),
    fc.dictionary(
      fc.string().filter((k) => !k.startsWith('$')),
      tie('value'),
      { maxKeys: 4, noNullPrototype: true },
    ),
  ),
})).value;

describe('exact JSON for shard files: nested data', () => {
  it('gives back nested objects and arrays with their numbers and typed arrays unchanged (toStrictEqual compares numbers by Object.is)', () => {
    fc.assert(
      fc.property(plainData, (value) => {
        expect(throughText(value)).toStrictEqual(value);
      }),
    );
  });

  it('keeps a member named __proto__ as a member, on both sides', () => {
    const value = JSON.parse('{"__proto__": {"x": -0.5}, "y": [1]}') as unknown;
    const back = throughText(value) as Record<string, unknown>;
    expect(Object.getPrototypeOf(back)).toBe(Object.prototype);
    expect(Object.keys(back)).toEqual(['__proto__', 'y']);
    expect(Object.getOwnPropertyDescriptor(back, '__proto__')?.value).toEqual({ x: -0.5 });
  });

  it('leaves out undefined members, as JSON does', () => {
    expect(throughText({ a: 1, b: undefined })).toStrictEqual({ a: 1 });
  });
});

describe('exact JSON for shard files: what it refuses to write', () => {
  const refused: Array<[string, unknown, RegExp]> = [
    ["a member name starting with '$'", { part: { $f64: 'AAAAAAAAAAA=' } }, /^\$\.part\.\$f64: member names starting with '\$' are reserved$/],
    ['a class instance', { at: [new (class Accumulator {})()] }, /^\$\.at\[0\]: cannot write a Accumulator exactly$/],
    ['a Map', new Map([[1, 2]]), /cannot write a Map exactly/],
    ['a Float32Array (it would come back as something else)', new Float32Array(2), /cannot write a Float32Array exactly/],
    ['an object without a prototype', Object.create(null) as object, /cannot write a object without a prototype exactly/],
    ['undefined in an array (JSON would write null)', [1, undefined], /^\$\[1\]: cannot write a undefined exactly$/],
    ['a hole in an array', [1, , 3], /^\$\[1\]: cannot write a undefined exactly$/],
    ['a bigint', 1n, /cannot write a bigint exactly/],
    ['a function', () => 1, /cannot write a function exactly/],
  ];
  for (const [what, value, message] of refused) {
    it(`refuses ${what}, naming where it is`, () => {
      expect(() => toExactJson(value)).toThrow(ExactJsonError);
      expect(() => toExactJson(value)).toThrow(message);
    });
  }
});

describe('exact JSON for shard files: what it refuses to read', () => {
  const damaged: Array<[string, unknown, RegExp]> = [
    ['$f64 holding a number', { $f64: 5 }, /^\$: \$f64 must hold base64 text$/],
    ['$f64 holding text that is not base64 (Buffer would skip the characters)', { $f64: '!!!!!!!!!!!!' }, /\$f64 must hold base64 text/],
    ['$f64 with one character changed to a space', { $f64: 'AAAAAAAA AAA' }, /\$f64 must hold base64 text/],
    ['$f64 holding bytes that are not whole doubles', { $f64: 'AAAA' }, /^\$: \$f64 holds 3 bytes, not a whole number of doubles$/],
    ['$f64 beside another member', { $f64: 'AAAAAAAAAAA=', extra: 1 }, /a tagged value is one member, \$f64 or \$number; found '\$f64', 'extra'/],
    ['$number beside another member', { x: [{ $number: 'NaN', y: 2 }] }, /^\$\.x\[0\]: a tagged value is one member/],
    ['an unknown $number', { $number: 'nan' }, /^\$: unknown \$number 'nan'$/],
    ['$number holding a number', { $number: 0 }, /unknown \$number '0'/],
    ['an unknown tag', { outcome: { $other: 1 } }, /^\$\.outcome: a tagged value is one member, \$f64 or \$number; found '\$other'$/],
  ];
  for (const [what, json, message] of damaged) {
    it(`refuses ${what}`, () => {
      expect(() => fromExactJson(json as ExactJson)).toThrow(ExactJsonError);
      expect(() => fromExactJson(json as ExactJson)).toThrow(message);
    });
  }
});
