import type { Citation } from '../citation.js';
import type { IntegerPolynomial } from '../exact-moments/integer-polynomial.js';
import type { ReferenceTableContent, TableConventions, TableProduction } from '../reference-table.js';
import { tableColumns } from './table-columns.js';

/** The ranges of the exact moment tables: N = 1 … 64, k = 0 … 12. */
export const EVEN_MOMENT_RANGE = { maxSize: 64, maxOrder: 12 } as const;

interface EvenMomentTableSpec {
  readonly ensemble: 'GOE' | 'GUE';
  readonly conventions: TableConventions;
  readonly sources: readonly Citation[];
  readonly production: Omit<TableProduction, 'arithmetic' | 'precision'>;
  readonly certification: string;
}

const ARITHMETIC = 'exact integer arithmetic (JavaScript BigInt); no floating point anywhere';

/**
 * The two tables of an ensemble's exact moments, which share their provenance: the values
 * E Tr X^{2k} for N = 1 … 64, and the coefficients of E Tr X^{2k} as a polynomial in N (degree
 * k + 1, no constant term), which give the exact value at any N beyond the first table.
 */
export function evenMomentTables(spec: EvenMomentTableSpec, polynomial: (k: number) => IntegerPolynomial, value: (N: number, k: number) => bigint) {
  const lower = spec.ensemble.toLowerCase();
  const production: TableProduction = {
    generator: spec.production.generator,
    method: spec.production.method,
    arithmetic: ARITHMETIC,
    precision: 'exact',
    tool: spec.production.tool,
  };
  const quantity = {
    symbol: 'E Tr X^{2k}',
    definition: `the expected trace of the 2k-th power of an N×N ${spec.ensemble} matrix X with unnormalised entries; E⟨H^{2k}⟩ for H = X/√N is this divided by N^{k+1}`,
    conventions: spec.conventions,
  };
  const provenance = { sources: spec.sources, production, certifiedDigits: 'exact' as const, certification: spec.certification };
  const values = (): ReferenceTableContent => {
    const rows: [number, number, string][] = [];
    for (let N = 1; N <= EVEN_MOMENT_RANGE.maxSize; N++) {
      for (let k = 0; k <= EVEN_MOMENT_RANGE.maxOrder; k++) rows.push([N, k, value(N, k).toString()]);
    }
    return {
      name: `${lower}-even-moments`,
      title: `Exact even moments E Tr X^{2k} of the ${spec.ensemble}, N = 1 … ${EVEN_MOMENT_RANGE.maxSize}, k = 0 … ${EVEN_MOMENT_RANGE.maxOrder}`,
      quantity,
      ...provenance,
      columns: tableColumns({ N: ['number', 'matrix size'], k: ['number', 'half the power'] }, { moment: ['integer', 'E Tr X^{2k}, an exact integer'] }),
      rows,
    };
  };
  const polynomials = (): ReferenceTableContent => {
    const rows: [number, number, string][] = [];
    for (let k = 0; k <= EVEN_MOMENT_RANGE.maxOrder; k++) {
      const p = polynomial(k);
      for (let r = 1; r <= k + 1; r++) rows.push([k, r, (p[r] ?? 0n).toString()]);
    }
    return {
      name: `${lower}-even-moment-polynomials`,
      title: `E Tr X^{2k} of the ${spec.ensemble} as polynomials in N, k = 0 … ${EVEN_MOMENT_RANGE.maxOrder}`,
      quantity: { ...quantity, symbol: 'E Tr X^{2k} = Σ_r c_{k,r} N^r' },
      ...provenance,
      columns: tableColumns(
        { k: ['number', 'half the power'], r: ['number', 'the power of N (1 … k + 1; the constant term is 0)'] },
        { coefficient: ['integer', 'c_{k,r}, an exact integer'] },
      ),
      rows,
    };
  };
  return { values, polynomials };
}
