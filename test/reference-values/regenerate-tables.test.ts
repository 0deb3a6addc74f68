import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { ReferenceTableContent } from '../../reference-values/reference-table.js';
import { builtInTableDirectory } from '../../reference-values/reference-table-catalog.js';
import { referenceTableText } from '../../reference-values/reference-table-text.js';
import { TABLE_GENERATORS } from '../../reference-values/tables/generate-all-tables.js';

describe('regenerating every table from its generator reproduces the committed JSON byte for byte', () => {
  it('knows a generator for every committed table, and each generator sits beside its JSON', () => {
    const files = readdirSync(builtInTableDirectory()).filter((f) => f.endsWith('.json'));
    expect(files.map((f) => f.replace(/\.json$/, '')).sort()).toEqual(Object.keys(TABLE_GENERATORS).sort());
    for (const name of Object.keys(TABLE_GENERATORS)) {
      const table = JSON.parse(readFileSync(join(builtInTableDirectory(), `${name}.json`), 'utf8')) as ReferenceTableContent;
      expect(readdirSync(builtInTableDirectory())).toContain(table.production.generator);
    }
  });

  for (const [name, generate] of Object.entries(TABLE_GENERATORS)) {
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
