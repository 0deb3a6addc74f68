import type { ReferenceTableContent } from '../reference-table.js';
import { chebyshevCoefficientsTable, chebyshevVariancesTable } from './chebyshev-variances.generate.js';
import { goeEvenMomentTables } from './goe-even-moments.generate.js';
import { gueEvenMomentTables } from './gue-even-moments.generate.js';
import { resolventCovarianceTracelessTable, resolventCovarianceTracialTable } from './resolvent-covariance-kernels.generate.js';
import { runGeneratorIfMain } from './run-generator.js';
import { semicircleStieltjesTable } from './semicircle-stieltjes.generate.js';
import { tracyWidomDistributionsTable, tracyWidomMomentsTable } from './tracy-widom.generate.js';

/**
 * Every built-in table by name, with the builder of its generator script: what
 * `node dist/reference-values/tables/generate-all-tables.js` writes, and what the regeneration test
 * compares byte for byte with the committed files.
 */
export const TABLE_GENERATORS: Readonly<Record<string, () => ReferenceTableContent>> = {
  'gue-even-moments': gueEvenMomentTables.values,
  'gue-even-moment-polynomials': gueEvenMomentTables.polynomials,
  'goe-even-moments': goeEvenMomentTables.values,
  'goe-even-moment-polynomials': goeEvenMomentTables.polynomials,
  'semicircle-stieltjes': semicircleStieltjesTable,
  'resolvent-covariance-tracial': resolventCovarianceTracialTable,
  'resolvent-covariance-traceless': resolventCovarianceTracelessTable,
  'chebyshev-coefficients': chebyshevCoefficientsTable,
  'chebyshev-variances': chebyshevVariancesTable,
  'tracy-widom-moments': tracyWidomMomentsTable,
  'tracy-widom-distributions': tracyWidomDistributionsTable,
};

runGeneratorIfMain(import.meta.url, Object.values(TABLE_GENERATORS));
