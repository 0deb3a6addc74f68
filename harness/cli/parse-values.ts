import type { Complex } from '../numeric/complex.js';
import { parseEnsemble, type EnsembleSpec } from '../numeric/ensemble.js';
import { UsageError } from './usage-error.js';

function words(text: string | number | readonly (string | number)[]): string[] {
  const list = Array.isArray(text) ? text : [text];
  return list.flatMap((t) => String(t).split(',')).map((w) => w.trim()).filter((w) => w.length > 0);
}

/** A whole number in [min, max]; the option's name goes into the error. */
export function parseWholeNumber(option: string, text: string | number, min: number, max = Number.MAX_SAFE_INTEGER): number {
  const value = typeof text === 'number' ? text : /^[+]?\d+$/.test(String(text).trim()) ? Number(text) : NaN;
  if (!Number.isInteger(value) || value < min || value > max) {
    throw new UsageError(`--${option} must be a whole number from ${min} to ${max}, got '${text}'`);
  }
  return value;
}

export function parseSizeList(text: string | number | readonly (string | number)[]): number[] {
  const list = words(text);
  if (list.length === 0) throw new UsageError('--size needs at least one matrix size');
  return list.map((w) => parseWholeNumber('size', w, 2, 20000));
}

/** At least three distinct sizes, ascending: a rate fit needs two degrees of freedom and one to spare. */
export function parseLadder(text: string | number | readonly (string | number)[]): number[] {
  const sizes = [...new Set(words(text).map((w) => parseWholeNumber('ladder', w, 16, 20000)))].sort((a, b) => a - b);
  if (sizes.length < 3) throw new UsageError(`--ladder needs at least three distinct sizes, got '${String(text)}'`);
  return sizes;
}

/** The fluctuation suite's budget: a positive number up to 1000 (sample counts scale with it). */
export function parseBudget(text: string | number): number {
  const budget = Number(text);
  if (!(budget > 0 && budget <= 1000)) throw new UsageError(`--budget must be a number above 0 and at most 1000, got '${text}'`);
  return budget;
}

export function parseAlpha(text: string | number): number {
  const alpha = Number(text);
  if (!(alpha > 0 && alpha < 1)) throw new UsageError(`--alpha must lie strictly between 0 and 1, got '${text}'`);
  return alpha;
}

export function parseEnsembleList(text: string | readonly string[]): EnsembleSpec[] {
  const raw = Array.isArray(text) ? text : [text as string];
  // Commas separate ensembles, but wigner specs use colons only, so a plain split is safe.
  const list = words(raw);
  if (list.length === 0) throw new UsageError('--ensemble needs at least one ensemble');
  return list.map((w) => {
    try {
      return parseEnsemble(w);
    } catch (error) {
      throw new UsageError(`--ensemble: ${(error as Error).message}`);
    }
  });
}

export function parseNameList(option: string, text: string | readonly string[], allowed: readonly string[]): string[] {
  const list = words(Array.isArray(text) ? text : [text as string]);
  for (const w of list) {
    if (!allowed.includes(w)) throw new UsageError(`--${option}: unknown name '${w}' (choose from ${allowed.join(', ')})`);
  }
  if (list.length === 0) throw new UsageError(`--${option} needs at least one name`);
  return [...new Set(list)];
}

/** A complex number as people type it: 0.5, -1.2e-3, 0.5+0.1i, 0.5-0.1i, 2i, -i. */
export function parseComplex(text: string): Complex {
  const t = text.replace(/\s+/g, '');
  const num = '[+-]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][+-]?\\d+)?';
  const full = new RegExp(`^(${num})([+-](?:\\d+\\.?\\d*|\\.\\d+)?(?:[eE][+-]?\\d+)?)[ij]$`);
  const imagOnly = new RegExp(`^([+-]?(?:\\d+\\.?\\d*|\\.\\d+)?(?:[eE][+-]?\\d+)?)[ij]$`);
  const realOnly = new RegExp(`^${num}$`);
  const imagValue = (s: string) => (s === '' || s === '+' ? 1 : s === '-' ? -1 : Number(s));
  let m = full.exec(t);
  if (m) return { re: Number(m[1]), im: imagValue(m[2]) };
  m = imagOnly.exec(t);
  if (m) return { re: 0, im: imagValue(m[1]) };
  if (realOnly.test(t)) return { re: Number(t), im: 0 };
  throw new UsageError(`'${text}' is not a complex number (write it like 0.5+0.1i)`);
}

/** fast-check's replay path: colon-separated whole numbers; it needs exactly one --only check. */
export function parseReplayCase(text: string | undefined, only: readonly string[] | undefined): string {
  if (text === undefined) return '';
  if (!/^\d+(:\d+)*$/.test(text.trim())) throw new UsageError(`--case must look like 3:0:1 (a replay path), got '${text}'`);
  if ((only ?? []).length !== 1) throw new UsageError('--case replays one check: name it with exactly one --only');
  return text.trim();
}
