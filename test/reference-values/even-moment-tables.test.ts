import { describe, expect, it } from 'vitest';
import { harerZagierPolynomial } from '../../reference-values/exact-moments/harer-zagier-polynomial.js';
import { evaluateIntegerPolynomial } from '../../reference-values/exact-moments/integer-polynomial.js';
import { evenTraceMomentPolynomial, mixedTraceMomentPolynomial } from '../../reference-values/exact-moments/loop-equation-moments.js';
import { builtInTable } from '../../reference-values/reference-table-catalog.js';
import { EVEN_MOMENT_RANGE } from '../../reference-values/tables/even-moment-tables.js';
import { evaluatePolynomial, gaussianMoment, momentMethodPolynomial, wickTraceExplicit, wickTracePolynomial } from './exact-moment-enumeration.js';
import { tridiagonalTraceMoment } from './tridiagonal-walk-moments.js';

const gue = builtInTable('gue-even-moments');
const goe = builtInTable('goe-even-moments');
const guePolynomials = builtInTable('gue-even-moment-polynomials');
const goePolynomials = builtInTable('goe-even-moment-polynomials');

const tableMoment = (table: typeof gue, N: number, k: number): bigint => {
  const value = table.bigint({ N, k }, 'moment');
  if (value === undefined) throw new Error(`${table.name} has no row N = ${N}, k = ${k}`);
  return value;
};

/** A polynomial with its zero coefficients up to N^{k+1} written out, as in the tables. */
const padded = (p: readonly bigint[], k: number): bigint[] => Array.from({ length: k + 2 }, (_, r) => p[r] ?? 0n);

const tablePolynomial = (table: typeof gue, k: number): bigint[] => {
  const p = [0n];
  for (let r = 1; r <= k + 1; r++) {
    const c = table.bigint({ k, r }, 'coefficient');
    if (c === undefined) throw new Error(`${table.name} has no row k = ${k}, r = ${r}`);
    p.push(c);
  }
  return p;
};

/** Catalan numbers C_0 … C_12 as listed in OEIS A000108. */
const OEIS_A000108 = [1n, 1n, 2n, 5n, 14n, 42n, 132n, 429n, 1430n, 4862n, 16796n, 58786n, 208012n];

describe('the exact moment tables cover N = 1 … 64, k = 0 … 12 and agree with their polynomial tables', () => {
  it('has every (N, k) and each value is its polynomial at N', () => {
    for (const [values, polynomials] of [
      [gue, guePolynomials],
      [goe, goePolynomials],
    ] as const) {
      expect(values.table.rows.length).toBe(EVEN_MOMENT_RANGE.maxSize * (EVEN_MOMENT_RANGE.maxOrder + 1));
      for (let k = 0; k <= EVEN_MOMENT_RANGE.maxOrder; k++) {
        const p = tablePolynomial(polynomials, k);
        for (let N = 1; N <= EVEN_MOMENT_RANGE.maxSize; N++) expect(tableMoment(values, N, k)).toBe(evaluateIntegerPolynomial(p, N));
      }
    }
  });

  it('has the Catalan numbers (OEIS A000108) as leading coefficients, the semicircle moments', () => {
    for (let k = 0; k <= 12; k++) {
      expect(guePolynomials.bigint({ k, r: k + 1 }, 'coefficient'), `GUE k = ${k}`).toBe(OEIS_A000108[k]);
      expect(goePolynomials.bigint({ k, r: k + 1 }, 'coefficient'), `GOE k = ${k}`).toBe(OEIS_A000108[k]);
    }
  });
});

describe('GUE table (Harer and Zagier 1986, Invent. Math. 85)', () => {
  it('matches the closed forms a_0 = N, a_1 = N², a_2 = 2N³ + N, a_3 = 5N⁴ + 10N² (Harer and Zagier 1986; THEORY.md)', () => {
    for (let N = 1; N <= 64; N++) {
      const n = BigInt(N);
      expect(tableMoment(gue, N, 0)).toBe(n);
      expect(tableMoment(gue, N, 1)).toBe(n * n);
      expect(tableMoment(gue, N, 2)).toBe(2n * n ** 3n + n);
      expect(tableMoment(gue, N, 3)).toBe(5n * n ** 4n + 10n * n ** 2n);
    }
  });

  it('matches the published small cases: the genus expansion of a_4 = 14N⁵ + 70N³ + 21N and a_5 = 42N⁶ + 420N⁴ + 483N² (Harer and Zagier 1986, table of ε_g(n), values from memory)', () => {
    expect(tablePolynomial(guePolynomials, 4)).toEqual([0n, 21n, 0n, 70n, 0n, 14n]);
    expect(tablePolynomial(guePolynomials, 5)).toEqual([0n, 0n, 483n, 0n, 420n, 0n, 42n]);
  });

  it('agrees with the Gaussian loop equations for every k ≤ 12 (an independent derivation by integration by parts)', () => {
    for (let k = 0; k <= 12; k++) {
      expect(tablePolynomial(guePolynomials, k)).toEqual(padded(evenTraceMomentPolynomial('gue', k), k));
      expect(harerZagierPolynomial(k)).toEqual(evenTraceMomentPolynomial('gue', k));
    }
  });

  it('agrees with Wick enumeration (Isserlis 1918): symbolic for k ≤ 6, with explicit indices for N ≤ 3, k ≤ 3', () => {
    for (let k = 0; k <= 6; k++) {
      const polynomial = wickTracePolynomial(k, 'gue');
      for (let N = 1; N <= 64; N += 9) expect(tableMoment(gue, N, k), `N = ${N}, k = ${k}`).toBe(evaluatePolynomial(polynomial, N));
    }
    for (let N = 1; N <= 3; N++) for (let k = 1; k <= 3; k++) expect(Number(tableMoment(gue, N, k))).toBe(wickTraceExplicit(N, k, 'gue'));
  });

  it('agrees with the tridiagonal model (Dumitriu and Edelman 2002) for N ≤ 3 and every k ≤ 12', () => {
    for (let N = 1; N <= 3; N++) for (let k = 0; k <= 12; k++) expect(tableMoment(gue, N, k), `N = ${N}, k = ${k}`).toBe(tridiagonalTraceMoment('gue', N, k));
  });
});

describe('GOE table (Gaussian loop equations; cross-checked by exact enumeration)', () => {
  it('matches THEORY.md: N² + N, 2N³ + 5N² + 5N, 5N⁴ + 22N³ + 52N² + 41N, and the k = 4, 5 polynomials', () => {
    expect(tablePolynomial(goePolynomials, 1)).toEqual([0n, 1n, 1n]);
    expect(tablePolynomial(goePolynomials, 2)).toEqual([0n, 5n, 5n, 2n]);
    expect(tablePolynomial(goePolynomials, 3)).toEqual([0n, 41n, 52n, 22n, 5n]);
    expect(tablePolynomial(goePolynomials, 4)).toEqual([0n, 509n, 690n, 374n, 93n, 14n]);
    expect(tablePolynomial(goePolynomials, 5)).toEqual([0n, 8229n, 12143n, 7150n, 2290n, 386n, 42n]);
  });

  it('agrees with Wick enumeration (Isserlis 1918): symbolic for k ≤ 6, with explicit indices for N ≤ 3, k ≤ 3 and N = 4, k = 2', () => {
    for (let k = 0; k <= 6; k++) {
      const polynomial = wickTracePolynomial(k, 'goe');
      for (let N = 1; N <= 64; N += 9) expect(tableMoment(goe, N, k), `N = ${N}, k = ${k}`).toBe(evaluatePolynomial(polynomial, N));
    }
    for (let N = 1; N <= 3; N++) for (let k = 1; k <= 3; k++) expect(Number(tableMoment(goe, N, k))).toBe(wickTraceExplicit(N, k, 'goe'));
    expect(Number(tableMoment(goe, 4, 2))).toBe(wickTraceExplicit(4, 2, 'goe'));
  });

  it('agrees with the moment method over index patterns for Gaussian entries (k ≤ 4)', () => {
    const law = { field: 'real' as const, offDiagonal: gaussianMoment, diagonal: (p: number) => (p % 2 === 1 ? 0n : gaussianMoment(p) * 2n ** BigInt(p / 2)) };
    for (let k = 1; k <= 4; k++) {
      const polynomial = momentMethodPolynomial(k, law);
      for (let N = 1; N <= 6; N++) expect(tableMoment(goe, N, k)).toBe(evaluatePolynomial(polynomial, N));
    }
  });

  it('agrees with the tridiagonal model (Dumitriu and Edelman 2002) for N ≤ 3 and every k ≤ 12, and N = 4 for k ≤ 8', () => {
    for (let N = 1; N <= 3; N++) for (let k = 0; k <= 12; k++) expect(tableMoment(goe, N, k), `N = ${N}, k = ${k}`).toBe(tridiagonalTraceMoment('goe', N, k));
    for (let k = 0; k <= 8; k++) expect(tableMoment(goe, 4, k), `N = 4, k = ${k}`).toBe(tridiagonalTraceMoment('goe', 4, k));
  });

  it('has E Tr X^{2k} = (2k − 1)!!·2^k at N = 1 (one Gaussian of variance 2) and E (Tr X)² = 2N', () => {
    for (let k = 0; k <= 12; k++) expect(tableMoment(goe, 1, k)).toBe(gaussianMoment(2 * k) * 2n ** BigInt(k));
    expect(mixedTraceMomentPolynomial('goe', [1, 1])).toEqual([0n, 2n]);
    expect(mixedTraceMomentPolynomial('gue', [1, 1])).toEqual([0n, 1n]);
  });
});
