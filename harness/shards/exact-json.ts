/**
 * JSON that gives back exactly what went in, for shard files: numbers are written by JavaScript's
 * shortest round-trip form (exact for every finite double), and what plain JSON cannot hold is
 * tagged: a Float64Array as {"$f64": base64 of its little-endian bytes}, a non-finite number or −0
 * as {"$number": "NaN" | "Infinity" | "-Infinity" | "-0"}. `undefined` object members are left out,
 * as JSON.stringify does.
 */
export type ExactJson = null | boolean | number | string | ExactJson[] | { [key: string]: ExactJson };

/** Thrown for a value the encoding does not cover, or a file that is not this encoding. */
export class ExactJsonError extends Error {}

const LITTLE_ENDIAN = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1;

function bytesOf(values: Float64Array): Buffer {
  const copy = Buffer.from(values.buffer.slice(values.byteOffset, values.byteOffset + values.byteLength));
  if (!LITTLE_ENDIAN) copy.swap64();
  return copy;
}

export function toExactJson(value: unknown, at = '$'): ExactJson {
  if (value === null || typeof value === 'boolean' || typeof value === 'string') return value;
  if (typeof value === 'number') {
    if (Number.isFinite(value) && !Object.is(value, -0)) return value;
    return { $number: Object.is(value, -0) ? '-0' : String(value) };
  }
  if (value instanceof Float64Array) return { $f64: bytesOf(value).toString('base64') };
  if (Array.isArray(value)) return value.map((v, i) => toExactJson(v, `${at}[${i}]`));
  if (typeof value === 'object' && Object.getPrototypeOf(value) === Object.prototype) {
    const out: { [key: string]: ExactJson } = {};
    for (const [key, v] of Object.entries(value)) {
      if (key.startsWith('$')) throw new ExactJsonError(`${at}.${key}: member names starting with '$' are reserved`);
      if (v !== undefined) out[key] = toExactJson(v, `${at}.${key}`);
    }
    return out;
  }
  throw new ExactJsonError(`${at}: cannot write a ${typeof value === 'object' ? (value as object).constructor?.name : typeof value} exactly`);
}

export function fromExactJson(json: ExactJson, at = '$'): unknown {
  if (json === null || typeof json !== 'object') return json;
  if (Array.isArray(json)) return json.map((v, i) => fromExactJson(v, `${at}[${i}]`));
  if ('$f64' in json) {
    if (typeof json.$f64 !== 'string') throw new ExactJsonError(`${at}: $f64 must hold base64 text`);
    const bytes = Buffer.from(json.$f64, 'base64');
    if (bytes.length % 8 !== 0) throw new ExactJsonError(`${at}: $f64 holds ${bytes.length} bytes, not a whole number of doubles`);
    if (!LITTLE_ENDIAN) bytes.swap64();
    const out = new Float64Array(bytes.length / 8);
    new Uint8Array(out.buffer).set(bytes);
    return out;
  }
  if ('$number' in json) {
    const special: Record<string, number> = { NaN: NaN, Infinity: Infinity, '-Infinity': -Infinity, '-0': -0 };
    const text = json.$number;
    if (typeof text !== 'string' || !Object.hasOwn(special, text)) throw new ExactJsonError(`${at}: unknown $number '${String(text)}'`);
    return special[text];
  }
  const out: Record<string, unknown> = {};
  for (const [key, v] of Object.entries(json)) out[key] = fromExactJson(v, `${at}.${key}`);
  return out;
}
