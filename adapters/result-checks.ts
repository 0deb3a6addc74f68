import type { Complex } from '../harness/numeric/complex.js';
import { AdapterFault } from './adapter.js';

/**
 * Shape and value checks on what an implementation returns, shared by the adapters: a lying
 * implementation (NaN, the wrong count, the wrong shape) is reported as a fault naming the method,
 * never passed on as a number.
 */

export function checkedRealList(method: string, value: unknown, expectedCount: number): Float64Array {
  if (!(value instanceof Float64Array) && !(Array.isArray(value) || ArrayBuffer.isView(value))) {
    throw new AdapterFault(method, 'malformed-response', `expected a list of ${expectedCount} numbers, got ${describeValue(value)}`);
  }
  const list = value as ArrayLike<unknown>;
  if (list.length !== expectedCount) {
    throw new AdapterFault(method, 'invalid-value', `expected ${expectedCount} values, got ${list.length}`);
  }
  const out = new Float64Array(expectedCount);
  for (let i = 0; i < expectedCount; i++) {
    const x = list[i];
    if (typeof x !== 'number') throw new AdapterFault(method, 'malformed-response', `value ${i} is ${describeValue(x)}, not a number`);
    if (!Number.isFinite(x)) throw new AdapterFault(method, 'invalid-value', `value ${i} is ${x}`);
    out[i] = x;
  }
  return out;
}

/** A complex number as the protocols carry it: `[re, im]`, both finite. */
export function checkedComplex(method: string, value: unknown, where = 'value'): Complex {
  if (!Array.isArray(value) || value.length !== 2 || typeof value[0] !== 'number' || typeof value[1] !== 'number') {
    throw new AdapterFault(method, 'malformed-response', `${where} should be a complex number [re, im], got ${describeValue(value)}`);
  }
  if (!Number.isFinite(value[0]) || !Number.isFinite(value[1])) {
    throw new AdapterFault(method, 'invalid-value', `${where} is [${value[0]}, ${value[1]}]`);
  }
  return { re: value[0], im: value[1] };
}

export function checkedComplexList(method: string, value: unknown, expectedCount: number): Complex[] {
  if (!Array.isArray(value)) {
    throw new AdapterFault(method, 'malformed-response', `expected a list of ${expectedCount} complex numbers, got ${describeValue(value)}`);
  }
  if (value.length !== expectedCount) {
    throw new AdapterFault(method, 'invalid-value', `expected ${expectedCount} values, got ${value.length}`);
  }
  return value.map((v, i) => checkedComplex(method, v, `value ${i}`));
}

/** A table of complex numbers: `rows` lists of `columns` values each (sample_statistics: per sample, per statistic). */
export function checkedComplexRows(method: string, value: unknown, rows: number, columns: number): Complex[][] {
  if (!Array.isArray(value)) {
    throw new AdapterFault(method, 'malformed-response', `expected ${rows} lists of ${columns} complex numbers, got ${describeValue(value)}`);
  }
  if (value.length !== rows) throw new AdapterFault(method, 'invalid-value', `expected ${rows} rows, got ${value.length}`);
  return value.map((row, i) => {
    if (!Array.isArray(row) || row.length !== columns) {
      throw new AdapterFault(method, 'malformed-response', `row ${i} should hold ${columns} complex numbers, got ${describeValue(row)}`);
    }
    return row.map((v, j) => checkedComplex(method, v, `row ${i}, value ${j}`));
  });
}

export function describeValue(value: unknown): string {
  if (value === null) return 'null';
  if (Array.isArray(value)) return `an array of length ${value.length}`;
  if (ArrayBuffer.isView(value)) return `a ${value.constructor.name}`;
  return typeof value === 'object' ? 'an object' : `${typeof value} ${String(value).slice(0, 40)}`;
}
