import type { Complex } from '../../harness/numeric/complex.js';

/**
 * Numbers of a result as they travel (schemas/real-value.json, complex-value.json): a JSON number,
 * or "NaN", "Infinity", "-Infinity" for what JSON cannot hold. Reading keeps non-finite values as
 * such, so that the adapter can report them as invalid values with their position.
 */
export type WireReal = number | 'NaN' | 'Infinity' | '-Infinity';
export type WireComplex = readonly [WireReal, WireReal];

export function realFromWire(value: WireReal): number {
  switch (value) {
    case 'NaN':
      return NaN;
    case 'Infinity':
      return Infinity;
    case '-Infinity':
      return -Infinity;
    default:
      return value;
  }
}

export function complexFromWire(value: WireComplex): Complex {
  return { re: realFromWire(value[0]), im: realFromWire(value[1]) };
}

/** The wire form of a number: non-finite values as the strings the protocol allows. */
export function realToWire(x: number): WireReal {
  if (Number.isNaN(x)) return 'NaN';
  if (x === Infinity) return 'Infinity';
  if (x === -Infinity) return '-Infinity';
  return x;
}

export function complexToWire(z: Complex): [WireReal, WireReal] {
  return [realToWire(z.re), realToWire(z.im)];
}
