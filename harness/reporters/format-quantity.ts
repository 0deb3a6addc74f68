import { formatComplex, formatNumber } from '../numeric/complex.js';
import type { Quantity } from '../evidence.js';

/** A quantity at full precision, for machine-readable output (−0, NaN, Infinity kept). */
export function exactQuantity(q: Quantity): string {
  return typeof q === 'number' ? formatNumber(q) : formatComplex(q);
}

/** A quantity at a readable precision (significant digits), for people. */
export function shortQuantity(q: Quantity, digits = 6): string {
  const short = (x: number) => (Number.isFinite(x) ? Number(x.toPrecision(digits)).toString() : String(x));
  if (typeof q === 'number') return short(q);
  return `${short(q.re)}${q.im < 0 || Object.is(q.im, -0) ? '-' : '+'}${short(Math.abs(q.im))}i`;
}

export function shortNumber(x: number, digits = 3): string {
  if (!Number.isFinite(x)) return String(x);
  if (x !== 0 && (Math.abs(x) < 1e-3 || Math.abs(x) >= 1e5)) return x.toExponential(digits - 1);
  return Number(x.toPrecision(digits)).toString();
}
