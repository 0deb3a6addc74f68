import { mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { referenceLines } from '../../../harness/cli/reference-command.js';
import {
  USER_TABLES_VARIABLE,
  referenceExportText,
  referenceListLines,
  referenceShowLines,
  writeExport,
} from '../../../harness/cli/reference-table-commands.js';
import { UsageError } from '../../../harness/cli/usage-error.js';
import type { ReferenceTableContent } from '../../../reference-values/reference-table.js';
import { builtInTableDirectory } from '../../../reference-values/reference-table-catalog.js';
import { referenceTableText } from '../../../reference-values/reference-table-text.js';

const LAB: ReferenceTableContent = {
  name: 'lab-stieltjes',
  title: 'Our lab\u2019s m(z), certified by interval arithmetic',
  quantity: { symbol: 'm(z)', definition: 'semicircle Stieltjes transform', conventions: { normalisation: 'semicircle on [−2, 2]', branch: 'Im m > 0' } },
  sources: [{ authors: 'A. Lab', year: 2024, title: 'Notebook 7', venue: 'internal report' }],
  production: { generator: 'lab script', method: 'closed form', arithmetic: 'intervals', precision: '30 digits', tool: 'our tool' },
  certifiedDigits: 25,
  certification: 'interval enclosure',
  columns: [
    { name: 're_z', type: 'number', role: 'parameter', description: 'Re z' },
    { name: 'im_z', type: 'number', role: 'parameter', description: 'Im z' },
    { name: 'note', type: 'label', role: 'value', description: 'a remark, with a comma' },
    { name: 'im_m', type: 'decimal', role: 'value', description: 'Im m' },
  ],
  rows: [[0, 1, 'golden, conjugate', '0.61803398874989484820458683']],
};

function userFolder(tables: readonly ReferenceTableContent[], broken?: string): string {
  const folder = mkdtempSync(join(tmpdir(), 'rmt-assay-cli-tables-'));
  for (const t of tables) writeFileSync(join(folder, `${t.name}.json`), referenceTableText(t));
  if (broken !== undefined) writeFileSync(join(folder, 'broken.json'), broken);
  return folder;
}

function usageError(action: () => unknown): string {
  try {
    action();
  } catch (error) {
    expect(error).toBeInstanceOf(UsageError);
    return (error as Error).message;
  }
  throw new Error('expected a UsageError');
}

afterEach(() => {
  delete process.env[USER_TABLES_VARIABLE];
});

describe('rmt-assay reference list / show / export', () => {
  it('lists every built-in table with its rows, certified digits and origin', () => {
    const lines = referenceListLines({});
    expect(lines[0]).toMatch(/^NAME\s+ROWS\s+DIGITS\s+ORIGIN\s+TITLE$/);
    expect(lines.some((l) => /^goe-even-moments\s+832\s+exact\s+built-in/.test(l))).toBe(true);
    expect(lines.some((l) => /^tracy-widom-moments\s+3\s+18\s+built-in/.test(l))).toBe(true);
  });

  it('adds a user\u2019s folder, from --tables or RMT_ASSAY_TABLES, after the built-in tables', () => {
    const folder = userFolder([LAB]);
    expect(referenceListLines({ tables: folder }).at(-1)).toMatch(/^lab-stieltjes\s+1\s+25\s+user/);
    process.env[USER_TABLES_VARIABLE] = folder;
    expect(referenceListLines({}).at(-1)).toMatch(/^lab-stieltjes/);
  });

  it('refuses a broken user table with one line naming the file and the JSON path', () => {
    const folder = userFolder([], '{"name": "broken"}');
    expect(usageError(() => referenceListLines({ tables: folder }))).toMatch(/broken\.json: does not match the reference table schema: at \(top level\): must have required property/);
  });

  it('shows a table\u2019s provenance and its first rows', () => {
    const lines = referenceShowLines('gue-even-moments', {});
    const text = lines.join('\n');
    expect(text).toMatch(/^gue-even-moments: Exact even moments/);
    expect(text).toMatch(/conventions:\s+normalisation: unnormalised/);
    expect(text).toMatch(/β = 2/);
    expect(text).toMatch(/sources:\s+1\. J\. Harer and D\. Zagier \(1986\)/);
    expect(text).toMatch(/produced by:\s+gue-even-moments\.generate\.ts/);
    expect(text).toMatch(/certified:\s+exact/);
    expect(text).toMatch(/\n1\s+3\s+15\n/); // N = 1, k = 3: E x⁶ = 15 for one real Gaussian of variance 1
    expect(lines.at(-1)).toMatch(/the first 20 of 832 rows/);
    expect(referenceShowLines('gue-even-moments', { all: true }).length).toBeGreaterThan(832);
    expect(usageError(() => referenceShowLines('no-such-table', {}))).toMatch(/no table named 'no-such-table'/);
  });

  it('exports JSON identical to the table file, provenance and digest included', () => {
    const text = referenceExportText('tracy-widom-moments', 'json', {});
    expect(text).toBe(readFileSync(join(builtInTableDirectory(), 'tracy-widom-moments.json'), 'utf8'));
  });

  it('exports CSV: # provenance lines, a header, then the cells as written (quoted where RFC 4180 needs it)', () => {
    const csv = referenceExportText('chebyshev-variances', 'csv', {}).split('\n');
    expect(csv[0]).toMatch(/^# chebyshev-variances: /);
    expect(csv.filter((l) => l.startsWith('# source: ')).length).toBe(4);
    const header = csv.findIndex((l) => !l.startsWith('#'));
    expect(csv[header]).toBe('function,pairing,diagonal,cumulant,variance_goe,variance_gue');
    expect(csv[header + 3]).toBe('x^3,48,9,0,24,12');
    const user = referenceExportText('lab-stieltjes', 'csv', { tables: userFolder([LAB]) });
    expect(user).toMatch(/\n0,1,"golden, conjugate",0\.61803398874989484820458683\n$/);
    expect(usageError(() => referenceExportText('chebyshev-variances', 'xml', {}))).toMatch(/--format must be json or csv, got 'xml'/);
  });

  it('writes an export to --output, or refuses a path it cannot write', () => {
    const folder = mkdtempSync(join(tmpdir(), 'rmt-assay-export-'));
    const file = join(folder, 'moments.csv');
    expect(writeExport('a,b\n', file)).toBeUndefined();
    expect(readFileSync(file, 'utf8')).toBe('a,b\n');
    expect(writeExport('a,b\n', undefined)).toBe('a,b\n');
    mkdirSync(join(folder, 'a-folder'));
    expect(usageError(() => writeExport('x', join(folder, 'a-folder')))).toMatch(/cannot write --output/);
  });
});

describe('rmt-assay reference value', () => {
  it('prints exact finite-N moments from the certified tables, with their source', () => {
    const lines = referenceLines({ quantity: 'moment', at: '2', size: 10 });
    expect(lines[0]).toBe('lim E⟨H^4⟩ = Catalan(2) = 2 (OEIS A000108)');
    // GOE 2N³ + 5N² + 5N = 2550, GUE 2N³ + N = 2010 at N = 10 (THEORY.md)
    expect(lines[1]).toMatch(/^GOE, N = 10: E⟨H\^4⟩ = 2\.55; exact E Tr X\^4 = 2550 .* table goe-even-moments/);
    expect(lines[2]).toMatch(/^GUE, N = 10: E⟨H\^4⟩ = 2\.01; exact E Tr X\^4 = 2010 .* Harer–Zagier/);
  });

  it('refuses a missing command, an unknown quantity and a missing point with one line', () => {
    expect(usageError(() => referenceLines({}))).toMatch(/name a reference command: list, show NAME, export NAME/);
    expect(usageError(() => referenceLines({ quantity: 'lst' }))).toMatch(/unknown reference command or quantity 'lst'/);
    expect(usageError(() => referenceLines({ quantity: 'density' }))).toMatch(/give the point/);
    expect(usageError(() => referenceLines({ quantity: 'moment', at: '2', size: 10, ensemble: 'nonsense' }))).toMatch(/--ensemble/);
  });
});
