import { evaluateIntegerPolynomial } from './exact-moments/integer-polynomial.js';
import { gueTraceMoment, ratioToNumber } from './finite-n-corrections.js';
import { builtInTable } from './reference-table-catalog.js';

/** E Tr X^{2k} of GOE or GUE (unnormalised entries, tables' conventions) and E⟨H^{2k}⟩ = that/N^{k+1}. */
export interface CertifiedEvenMoment {
  readonly trace: bigint;
  /** E⟨H^{2k}⟩ for H = X/√N, correctly rounded from the exact ratio. */
  readonly normalised: number;
  /** Where the value comes from: the table (or recursion) and its method and source. */
  readonly source: string;
}

const METHOD = {
  gue: 'Harer–Zagier recursion (Harer and Zagier 1986, Invent. Math. 85)',
  goe: 'Gaussian loop equations, cross-checked by Wick enumeration (Isserlis 1918) and the tridiagonal model (Dumitriu and Edelman 2002)',
} as const;

/**
 * The exact even moment E Tr X^{2k} of an N×N GOE or GUE matrix, from the certified tables:
 * N ≤ 64, k ≤ 12 from `goe-even-moments` / `gue-even-moments`; any N with k ≤ 12 from the
 * polynomial tables (`…-even-moment-polynomials`, exact at every N); GUE with k > 12 from the
 * Harer–Zagier recursion itself (gueTraceMoment). GOE with k > 12 is not tabulated: undefined.
 */
export function certifiedEvenMoment(ensemble: 'goe' | 'gue', N: number, k: number): CertifiedEvenMoment | undefined {
  if (!Number.isInteger(N) || N < 1) throw new RangeError(`certifiedEvenMoment: N must be an integer ≥ 1, got ${N}`);
  if (!Number.isInteger(k) || k < 0) throw new RangeError(`certifiedEvenMoment: k must be an integer ≥ 0, got ${k}`);
  const values = builtInTable(`${ensemble}-even-moments`);
  let trace = values.bigint({ N, k }, 'moment');
  let where = `table ${values.name}`;
  if (trace === undefined) {
    const polynomials = builtInTable(`${ensemble}-even-moment-polynomials`);
    const coefficients = [0n];
    for (let r = 1; r <= k + 1; r++) {
      const c = polynomials.bigint({ k, r }, 'coefficient');
      if (c === undefined) break;
      coefficients.push(c);
    }
    if (coefficients.length === k + 2) {
      trace = evaluateIntegerPolynomial(coefficients, N);
      where = `table ${polynomials.name} evaluated at N = ${N}`;
    } else if (ensemble === 'gue') {
      trace = gueTraceMoment(N, k);
      where = 'the recursion itself (beyond the tables)';
    } else {
      return undefined;
    }
  }
  return {
    trace,
    normalised: ratioToNumber(trace, BigInt(N) ** BigInt(k + 1)),
    source: `exact E Tr X^${2 * k} = ${trace} at N = ${N} (${ensemble.toUpperCase()}), from ${where}: ${METHOD[ensemble]}`,
  };
}
