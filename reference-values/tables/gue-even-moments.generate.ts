import { harerZagierPolynomial } from '../exact-moments/harer-zagier-polynomial.js';
import { gueTraceMoment } from '../finite-n-corrections.js';
import { HARER_ZAGIER_1986 } from '../sources.js';
import { evenMomentTables } from './even-moment-tables.js';
import { runGeneratorIfMain } from './run-generator.js';

/**
 * Generator of gue-even-moments.json and gue-even-moment-polynomials.json:
 * `node dist/reference-values/tables/gue-even-moments.generate.js` after a build.
 *
 * Method: the Harer–Zagier recursion (k + 2) a_{k+1} = (4k + 2) N a_k + k(4k² − 1) a_{k−1},
 * a_0 = N, a_1 = N², in exact integers: at each N for the values (gueTraceMoment), and on the
 * coefficients of the polynomial in N for the second table (harerZagierPolynomial).
 */
export const gueEvenMomentTables = evenMomentTables(
  {
    ensemble: 'GUE',
    conventions: {
      normalisation:
        'unnormalised: off-diagonal E|x_ij|² = 1 (real and imaginary parts independent, variance 1/2 each; E x_ij² = 0), diagonal real with variance 1',
      beta: 2,
      diagonalVariance: 1,
      kappa4: 0,
    },
    sources: [HARER_ZAGIER_1986],
    production: {
      generator: 'gue-even-moments.generate.ts',
      method: 'Harer–Zagier recursion (k + 2) a_{k+1} = (4k + 2) N a_k + k(4k² − 1) a_{k−1}, a_0 = N, a_1 = N², at each N and on the polynomial coefficients',
      tool: 'rmt-assay reference-values: gueTraceMoment (finite-n-corrections.ts), harerZagierPolynomial (exact-moments/)',
    },
    certification:
      'exact integers. test/reference-values checks them against the closed forms a_2 = 2N³ + N, a_3 = 5N⁴ + 10N² (Harer and Zagier 1986), exact Wick enumeration (Isserlis 1918), the Gaussian loop equations and the tridiagonal model (Dumitriu and Edelman 2002)',
  },
  harerZagierPolynomial,
  gueTraceMoment,
);

runGeneratorIfMain(import.meta.url, [gueEvenMomentTables.values, gueEvenMomentTables.polynomials]);
