import type { Decimal } from 'decimal.js';
import type { ReferenceTableContent } from '../reference-table.js';
import type { DecimalConstructor } from '../high-precision/decimal-complex.js';
import { decimalCell } from '../high-precision/decimal-cell.js';
import { rowsAtTwoPrecisions } from '../high-precision/rows-at-two-precisions.js';
import { BAI_YAO_2005, DLMF_2010, JOHANSSON_1998, LYTOVA_PASTUR_2009 } from '../sources.js';
import { CHEBYSHEV_TEST_FUNCTIONS, type ChebyshevTestFunction } from './chebyshev-test-functions.js';
import { DECIMAL_DIGITS, decimalProvenance } from './decimal-provenance.js';
import { runGeneratorIfMain } from './run-generator.js';
import { tableColumns } from './table-columns.js';

/** Coefficients c_0 … c_24 are tabulated (the variance sums use more, see PAIRING_TERMS). */
export const TABULATED_COEFFICIENTS = 24;

const provenance = (what: string) =>
  decimalProvenance(
    'chebyshev-variances.generate.ts',
    `${what}; coefficients in closed form (binomial theorem for x^p, exact integers; modified Bessel series I_k for e^x and the Gaussian bump, DLMF 10.25.2 and 10.35.1)`,
    "the coefficients against chebyshev.ts's double-precision trapezoid rule, numpy.polynomial.chebyshev and mpmath where present, and the variances against THEORY.md's checks",
  );

const FUNCTION_COLUMN = ['label', 'x^1 … x^8, exp (e^x), gaussian-bump (e^{−x²/2})'] as const;

const conventions = {
  normalisation: 'f on [−2, 2], the support of the semicircle (off-diagonal E|h_ij|² = 1/N); x^p is the power of the eigenvalue of H',
  beta: [1, 2] as number[],
  notes:
    'f(x) = Σ_k c_k T_k(x/2), c_k = (2/π)∫_0^π f(2cosθ) cos kθ dθ for k ≥ 1, c_0 = (1/π)∫_0^π f(2cosθ) dθ (the convention of chebyshev.ts)',
};

/** Terms of Σ k c_k²: c_k ≤ 2I_k(2) < 2/k! for these functions, far below working precision at k = 120. */
const PAIRING_TERMS = 120;

/**
 * Σ_{k≥1} k c_k² over k ≤ 120; refuses to answer unless the last two coefficients are below
 * 10^−(precision+10), so a function whose coefficients decay slowly cannot be cut short (two,
 * because even functions have every odd coefficient exactly 0).
 */
function pairingSum(D: DecimalConstructor, f: ChebyshevTestFunction): Decimal {
  const negligible = new D(10).pow(-(D.precision + 10));
  let sum = new D(0);
  for (let k = 1; k <= Math.min(f.degree, PAIRING_TERMS); k++) {
    const c = f.coefficient(D, k);
    sum = sum.plus(c.times(c).times(k));
  }
  if (f.degree > PAIRING_TERMS && [PAIRING_TERMS - 1, PAIRING_TERMS].some((k) => f.coefficient(D, k).abs().gte(negligible))) {
    throw new Error(`pairingSum: the Chebyshev coefficients of ${f.name} have not decayed by k = ${PAIRING_TERMS}`);
  }
  return sum;
}

export function chebyshevCoefficientsTable(): ReferenceTableContent {
  const rows = rowsAtTwoPrecisions(DECIMAL_DIGITS.working, (D) =>
    CHEBYSHEV_TEST_FUNCTIONS.flatMap((f) =>
      Array.from({ length: TABULATED_COEFFICIENTS + 1 }, (_, k) => [f.name, k, decimalCell(f.coefficient(D, k), DECIMAL_DIGITS.printed)]),
    ),
  );
  return {
    name: 'chebyshev-coefficients',
    title: `Chebyshev coefficients c_0 … c_${TABULATED_COEFFICIENTS} on [−2, 2] of the standard test functions x^p (p ≤ 8), e^x and e^{−x²/2}`,
    quantity: { symbol: 'c_k(f)', definition: 'the coefficients of f(x) = Σ_k c_k T_k(x/2) on [−2, 2]', conventions },
    sources: [DLMF_2010],
    ...provenance('c_k for each test function'),
    columns: tableColumns({ function: FUNCTION_COLUMN, k: ['number', 'the index of T_k'] }, { c: ['decimal', 'c_k'] }),
    rows,
  };
}

export function chebyshevVariancesTable(): ReferenceTableContent {
  const rows = rowsAtTwoPrecisions(DECIMAL_DIGITS.working, (D) =>
    CHEBYSHEV_TEST_FUNCTIONS.map((f) => {
      const pairing = pairingSum(D, f);
      const c1 = f.coefficient(D, 1);
      const c2 = f.coefficient(D, 2);
      const values = [pairing, c1.times(c1).div(4), c2.times(c2).div(2), pairing.div(2), pairing.div(4)];
      return [f.name, ...values.map((v) => decimalCell(v, DECIMAL_DIGITS.printed))];
    }),
  );
  return {
    name: 'chebyshev-variances',
    title: 'Limiting variances of the linear statistics Tr f(H) of Wigner matrices for the standard test functions, by term',
    quantity: {
      symbol: 'lim Var Tr f(H)',
      definition: 'the N → ∞ variance of Σ_i f(λ_i) for a Wigner matrix H',
      conventions: {
        ...conventions,
        notes: `${conventions.notes}. Var → pairing/(2β) + (σ_d² − 2/β)·diagonal + κ4·cumulant, pairing = Σ_{k≥1} k c_k², diagonal = c_1²/4, cumulant = c_2²/2 (THEORY.md). GOE and GUE: pairing/2 and pairing/4. Checks: f = x gives σ_d², f = x² gives 4/β + 2κ4`,
      },
    },
    sources: [JOHANSSON_1998, BAI_YAO_2005, LYTOVA_PASTUR_2009, DLMF_2010],
    ...provenance('Σ_{k≥1} k c_k² summed over k ≤ 120 (the last coefficients checked to vanish at working precision), c_1²/4 and c_2²/2'),
    columns: tableColumns(
      { function: FUNCTION_COLUMN },
      {
        pairing: ['decimal', 'Σ_{k≥1} k c_k²'],
        diagonal: ['decimal', 'c_1²/4, the coefficient of σ_d² − 2/β'],
        cumulant: ['decimal', 'c_2²/2, the coefficient of κ4'],
        variance_goe: ['decimal', 'the GOE limit, pairing/2'],
        variance_gue: ['decimal', 'the GUE limit, pairing/4'],
      },
    ),
    rows,
  };
}

runGeneratorIfMain(import.meta.url, [chebyshevCoefficientsTable, chebyshevVariancesTable]);
