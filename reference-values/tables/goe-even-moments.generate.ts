import { evaluateIntegerPolynomial } from '../exact-moments/integer-polynomial.js';
import { evenTraceMomentPolynomial } from '../exact-moments/loop-equation-moments.js';
import { GOULDEN_JACKSON_1997, LEDOUX_2009, STEIN_1981 } from '../sources.js';
import { evenMomentTables } from './even-moment-tables.js';
import { runGeneratorIfMain } from './run-generator.js';

/**
 * Generator of goe-even-moments.json and goe-even-moment-polynomials.json:
 * `node dist/reference-values/tables/goe-even-moments.generate.js` after a build.
 *
 * Method: the Schwinger–Dyson (loop) equations of the GOE, from Gaussian integration by parts,
 * solved exactly for the mixed moments E Π Tr X^{μ_j} as polynomials in N
 * (exact-moments/loop-equation-moments.ts, where the equations are derived), then evaluated at
 * N = 1 … 64 in integers.
 */
export const goeEvenMomentTables = evenMomentTables(
  {
    ensemble: 'GOE',
    conventions: {
      normalisation: 'unnormalised: off-diagonal E x_ij² = 1, diagonal variance 2 (E x_ij x_kl = δ_ik δ_jl + δ_il δ_jk)',
      beta: 1,
      diagonalVariance: 2,
      kappa4: 0,
    },
    sources: [STEIN_1981, LEDOUX_2009, GOULDEN_JACKSON_1997],
    production: {
      generator: 'goe-even-moments.generate.ts',
      method:
        'Gaussian integration by parts (Stein 1981) gives the loop equations E[Tr X^{n+1} Π_ν] = Σ_{a<n} E[Tr X^a Tr X^{n−1−a} Π_ν] + n E[Tr X^{n−1} Π_ν] + Σ_{m∈ν} 2m E[Tr X^{n+m−1} Π_{ν∖m}], solved exactly on polynomials in N; the same integration by parts underlies Ledoux 2009, whose five-term recursion is not used',
      tool: 'rmt-assay reference-values: evenTraceMomentPolynomial (exact-moments/loop-equation-moments.ts)',
    },
    certification:
      'exact integers. test/reference-values checks them against THEORY.md\u2019s polynomials for k ≤ 5, exact Wick enumeration (Isserlis 1918) symbolic in N and with explicit indices, the moment method over index patterns, and the tridiagonal model (Dumitriu and Edelman 2002) for small N up to k = 12',
  },
  (k) => evenTraceMomentPolynomial('goe', k),
  (N, k) => evaluateIntegerPolynomial(evenTraceMomentPolynomial('goe', k), N),
);

runGeneratorIfMain(import.meta.url, [goeEvenMomentTables.values, goeEvenMomentTables.polynomials]);
