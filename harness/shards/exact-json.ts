/**
 * JSON that gives back exactly what went in, for shard files: numbers are written by JavaScript's
 * shortest round-trip form (exact for every finite double), and what plain JSON cannot hold is
 * tagged: a Float64Array as {"$f64": base64 of its little-endian bytes}, a non-finite number or −0
 * as {"$number": "NaN" | "Infinity" | "-Infinity" | "-0"}. `undefined` object members are left out,
 * as JSON.stringify does. Reading is as strict as writing: a damaged tag (text that is not base64,
 * a '$' member beside others, an unknown one) is an error, never a different value.
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
  // Array.from visits holes, which then fail as undefined does (JSON would write them as null).
  if (Array.isArray(value)) return Array.from(value, (v, i) => toExactJson(v, `${at}[${i}]`));
  if (typeof value === 'object' && Object.getPrototypeOf(value) === Object.prototype) {
    const members: Array<[string, ExactJson]> = [];
    for (const [key, v] of Object.entries(value)) {
      if (key.startsWith('$')) throw new ExactJsonError(`${at}.${key}: member names starting with '$' are reserved`);
      if (v !== undefined) members.push([key, toExactJson(v, `${at}.${key}`)]);
    }
    // fromEntries defines the members, so one named __proto__ stays a member (assignment would set the prototype).
    return Object.fromEntries(members);
  }
  const kind = typeof value !== 'object' ? typeof value : ((value as object).constructor?.name ?? 'object without a prototype');
  throw new ExactJsonError(`${at}: cannot write a ${kind} exactly`);
}

/** Standard base64 with its padding, as Buffer writes it: Buffer.from would skip any other character. */
const BASE64 = /^(?:[A-Za-z0-9+/]{4})*(?:[A-Za-z0-9+/]{2}==|[A-Za-z0-9+/]{3}=)?$/;

/** The one member of a tagged value, or undefined for an untagged object; a '$' member beside others is damage. */
function tagOf(json: { [key: string]: ExactJson }, at: string): '$f64' | '$number' | undefined {
  const keys = Object.keys(json);
  const tagged = keys.filter((k) => k.startsWith('$'));
  if (tagged.length === 0) return undefined;
  const [tag] = tagged;
  if (keys.length !== 1 || (tag !== '$f64' && tag !== '$number')) {
    throw new ExactJsonError(`${at}: a tagged value is one member, $f64 or $number; found ${keys.map((k) => `'${k}'`).join(', ')}`);
  }
  return tag;
}

export function fromExactJson(json: ExactJson, at = '$'): unknown {
  if (json === null || typeof json !== 'object') return json;
  if (Array.isArray(json)) return json.map((v, i) => fromExactJson(v, `${at}[${i}]`));
  const tag = tagOf(json, at);
  if (tag === '$f64') {
    if (typeof json.$f64 !== 'string' || !BASE64.test(json.$f64)) throw new ExactJsonError(`${at}: $f64 must hold base64 text`);
    const bytes = Buffer.from(json.$f64, 'base64');
    if (bytes.length % 8 !== 0) throw new ExactJsonError(`${at}: $f64 holds ${bytes.length} bytes, not a whole number of doubles`);
    if (!LITTLE_ENDIAN) bytes.swap64();
    const out = new Float64Array(bytes.length / 8);
    new Uint8Array(out.buffer).set(bytes);
    return out;
  }
  if (tag === '$number') {
    const special: Record<string, number> = { NaN: NaN, Infinity: Infinity, '-Infinity': -Infinity, '-0': -0 };
    const text = json.$number;
    if (typeof text !== 'string' || !Object.hasOwn(special, text)) throw new ExactJsonError(`${at}: unknown $number '${String(text)}'`);
    return special[text];
  }
  return Object.fromEntries(Object.entries(json).map(([key, v]) => [key, fromExactJson(v, `${at}.${key}`)]));
}
