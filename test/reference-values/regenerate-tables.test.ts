import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { ReferenceTableContent } from '../../reference-values/reference-table.js';
import { builtInTableDirectory } from '../../reference-values/reference-table-catalog.js';
import { referenceTableText } from '../../reference-values/reference-table-text.js';
import { chebyshevCoefficientsTable, chebyshevVariancesTable } from '../../reference-values/tables/chebyshev-variances.generate.js';
import { goeEvenMomentTables } from '../../reference-values/tables/goe-even-moments.generate.js';
import { gueEvenMomentTables } from '../../reference-values/tables/gue-even-moments.generate.js';
import {
  resolventCovarianceTracelessTable,
  resolventCovarianceTracialTable,
} from '../../reference-values/tables/resolvent-covariance-kernels.generate.js';
import { semicircleStieltjesTable } from '../../reference-values/tables/semicircle-stieltjes.generate.js';
import { tracyWidomDistributionsTable, tracyWidomMomentsTable } from '../../reference-values/tables/tracy-widom.generate.js';

/** Every built-in table and the generator function that writes it (in-process: no build needed). */
const GENERATORS: Record<string, () => ReferenceTableContent> = {
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

describe('regenerating every table from its generator reproduces the committed JSON byte for byte', () => {
  it('knows a generator for every committed table, and each generator sits beside its JSON', () => {
    const files = readdirSync(builtInTableDirectory()).filter((f) => f.endsWith('.json'));
    expect(files.map((f) => f.replace(/\.json$/, '')).sort()).toEqual(Object.keys(GENERATORS).sort());
    for (const name of Object.keys(GENERATORS)) {
      const table = JSON.parse(readFileSync(join(builtInTableDirectory(), `${name}.json`), 'utf8')) as ReferenceTableContent;
      expect(readdirSync(builtInTableDirectory())).toContain(table.production.generator);
    }
  });

  for (const [name, generate] of Object.entries(GENERATORS)) {
    it(name, () => {
      const committed = readFileSync(join(builtInTableDirectory(), `${name}.json`), 'utf8');
      const regenerated = referenceTableText(generate());
      // Compare line by line first, so a failure names the first differing line instead of a 40 kB blob.
      const a = regenerated.split('\n');
      const b = committed.split('\n');
      const first = a.findIndex((line, i) => line !== b[i]);
      expect(first === -1 ? null : { line: first + 1, regenerated: a[first], committed: b[first] }).toBeNull();
      expect(regenerated === committed).toBe(true);
    });
  }
});
