import type { ReferenceTableContent } from '../reference-table.js';
import { decimalComplex } from '../high-precision/decimal-complex.js';
import { decimalCell } from '../high-precision/decimal-cell.js';
import { rowsAtTwoPrecisions } from '../high-precision/rows-at-two-precisions.js';
import { stieltjesDecimal } from '../high-precision/stieltjes-decimal.js';
import { ANDERSON_GUIONNET_ZEITOUNI_2010, WIGNER_1958 } from '../sources.js';
import { DECIMAL_DIGITS, decimalProvenance } from './decimal-provenance.js';
import { runGeneratorIfMain } from './run-generator.js';
import { tableColumns } from './table-columns.js';

/** The grid: Re z from −3 to 3 in steps of 1/2 (bulk, edges, outside), Im z from 10⁻³ to 2. */
export const STIELTJES_GRID = {
  real: [-3, -2.5, -2, -1.5, -1, -0.5, 0, 0.5, 1, 1.5, 2, 2.5, 3],
  imaginary: [0.001, 0.01, 0.1, 0.5, 1, 2],
} as const;

/**
 * Generator of semicircle-stieltjes.json: `node dist/reference-values/tables/semicircle-stieltjes.generate.js`.
 * m(z) and m′(z) on the grid, in decimal arithmetic (stieltjesDecimal), printed to 20 significant
 * digits; the rows are built at 50 and at 70 digits and must agree in every printed digit.
 * Values at z̄ are the conjugates (m(z̄) = conj m(z)).
 */
export function semicircleStieltjesTable(): ReferenceTableContent {
  const rows = rowsAtTwoPrecisions(DECIMAL_DIGITS.working, (D) =>
    STIELTJES_GRID.real.flatMap((x) =>
      STIELTJES_GRID.imaginary.map((y) => {
        const { m, derivative } = stieltjesDecimal(D, decimalComplex.of(D, x, y));
        return [x, y, ...[m.re, m.im, derivative.re, derivative.im].map((v) => decimalCell(v, DECIMAL_DIGITS.printed))];
      }),
    ),
  );
  return {
    name: 'semicircle-stieltjes',
    title: 'Stieltjes transform m(z) of the semicircle law and its derivative m′(z), 78 points of the upper half-plane',
    quantity: {
      symbol: 'm(z), m′(z)',
      definition: 'm(z) = ∫ ρ(x)/(x − z) dx for the semicircle density ρ(x) = √(4 − x²)/(2π) on [−2, 2]; m′ = dm/dz',
      conventions: {
        normalisation: 'semicircle on [−2, 2] (off-diagonal E|h_ij|² = 1/N)',
        branch: 'm(z) = (−z + √(z² − 4))/2 with Im m > 0 for Im z > 0 (m ~ −1/z at infinity); computed as −2/(z + √(z − 2)·√(z + 2)) with principal roots',
        notes: 'm solves m² + zm + 1 = 0; m′ = m²/(1 − m²); m(z̄) = conj m(z)',
      },
    },
    sources: [WIGNER_1958, ANDERSON_GUIONNET_ZEITOUNI_2010],
    ...decimalProvenance(
      'semicircle-stieltjes.generate.ts',
      'closed form of m on the branch above and m′ = m²/(1 − m²), evaluated in decimal arithmetic',
      'the values against quadrature of ∫ρ(x)/(x − z) dx, the double-precision closed form, numpy and mpmath where present',
    ),
    columns: tableColumns(
      { re_z: ['number', 'Re z'], im_z: ['number', 'Im z (> 0)'] },
      { re_m: ['decimal', 'Re m(z)'], im_m: ['decimal', 'Im m(z)'], re_dm: ['decimal', 'Re m′(z)'], im_dm: ['decimal', 'Im m′(z)'] },
    ),
    rows,
  };
}

runGeneratorIfMain(import.meta.url, [semicircleStieltjesTable]);
