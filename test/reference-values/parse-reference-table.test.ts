import { mkdirSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseReferenceTable } from '../../reference-values/parse-reference-table.js';
import type { ReferenceTable, ReferenceTableContent } from '../../reference-values/reference-table.js';
import { builtInTable, builtInTableDirectory, listReferenceTables } from '../../reference-values/reference-table-catalog.js';
import { ReferenceTableError } from '../../reference-values/reference-table-error.js';
import { referenceTableText } from '../../reference-values/reference-table-text.js';

/** A small valid user table, as a lab would write one. */
const LAB_TABLE: ReferenceTableContent = {
  name: 'lab-goe-moments',
  title: 'Our lab\u2019s certified GOE moments',
  quantity: { symbol: 'E Tr X^2', definition: 'trace moment', conventions: { normalisation: 'off-diagonal variance 1, diagonal 2', beta: 1, diagonalVariance: 2, kappa4: 0 } },
  sources: [{ authors: 'A. Lab', year: 2024, title: 'Notebook', venue: 'internal report' }],
  production: { generator: 'by hand', method: 'N² + N', arithmetic: 'exact', precision: 'exact', tool: 'pencil' },
  certifiedDigits: 'exact',
  certification: 'closed form',
  columns: [
    { name: 'N', type: 'number', role: 'parameter', description: 'size' },
    { name: 'value', type: 'integer', role: 'value', description: 'E Tr X^2' },
    { name: 'scaled', type: 'decimal', role: 'value', description: 'E⟨H^2⟩' },
  ],
  rows: [
    [1, '2', '2'],
    [2, '6', '1.5'],
  ],
};

const BUILT_IN_COUNT = readdirSync(builtInTableDirectory()).filter((f) => f.endsWith('.json')).length;

const parse = (table: unknown, file = 'lab-goe-moments.json') => () =>
  parseReferenceTable(typeof table === 'string' ? table : JSON.stringify(table), file, 'user', 'lab-goe-moments');

function valid(): ReferenceTable {
  return JSON.parse(referenceTableText(LAB_TABLE)) as ReferenceTable;
}

function refusal(action: () => unknown): ReferenceTableError {
  try {
    action();
  } catch (error) {
    expect(error).toBeInstanceOf(ReferenceTableError);
    return error as ReferenceTableError;
  }
  throw new Error('expected the table to be refused');
}

describe('parseReferenceTable', () => {
  it('loads and validates every built-in table', () => {
    const tables = listReferenceTables();
    expect(tables.length).toBe(BUILT_IN_COUNT);
    expect(BUILT_IN_COUNT).toBeGreaterThanOrEqual(4);
    for (const t of tables) expect(t.origin).toBe('built-in');
  });

  it('accepts a valid user table and gives typed access to its cells', () => {
    const table = parse(valid())();
    expect(table.bigint({ N: 2 }, 'value')).toBe(6n);
    expect(table.number({ N: 2 }, 'scaled')).toBe(1.5);
    expect(table.text({ N: 1 }, 'scaled')).toBe('2');
    expect(table.row({ N: 3 })).toBeUndefined();
    expect(() => table.bigint({ N: 2 }, 'scaled')).toThrow(/holds decimal cells/);
    expect(() => table.row({})).toThrow(/give the parameter 'N'/);
    expect(() => table.column('nope')).toThrow(/no column 'nope'/);
  });

  it('refuses text that is not JSON, naming the file', () => {
    const e = refusal(parse('{"name": ', 'broken.json'));
    expect(e.message).toMatch(/^broken\.json: not valid JSON/);
  });

  it('refuses a table the schema rejects, naming the JSON path', () => {
    const noSources = { ...valid(), sources: undefined };
    expect(refusal(parse(noSources)).message).toMatch(/lab-goe-moments\.json: does not match the reference table schema: at \(top level\): must have required property 'sources'/);
    const badBeta = valid();
    (badBeta.quantity.conventions as { beta: unknown }).beta = 3;
    expect(refusal(parse(badBeta)).message).toMatch(/at \/quantity\/conventions\/beta: must be one of 1, 2, 4/);
    const badDigits = { ...valid(), certifiedDigits: 0 };
    expect(refusal(parse(badDigits)).message).toMatch(/at \/certifiedDigits/);
  });

  it('refuses a cell of the wrong type, a short row, repeated parameters and a wrong name, with the path', () => {
    const number = valid();
    (number.rows as unknown[][])[1][2] = 1.5;
    let e = refusal(parse(number));
    expect(e.jsonPath).toBe('/rows/1/2');
    expect(e.message).toMatch(/column 'scaled' needs a decimal string/);
    const short = valid();
    (short.rows as unknown[][])[0].pop();
    expect(refusal(parse(short)).jsonPath).toBe('/rows/0');
    const twice = valid();
    (twice.rows as unknown[][])[1][0] = 1;
    expect(refusal(parse(twice)).message).toMatch(/repeats the parameters of \/rows\/0/);
    e = refusal(() => parseReferenceTable(JSON.stringify(valid()), 'other.json', 'user', 'other'));
    expect(e.message).toMatch(/^other\.json: at \/name: the name 'lab-goe-moments' must equal the file's base name 'other'/);
  });

  it('refuses a tampered table (a changed digit keeps the schema but breaks the digest) and states the digest to use', () => {
    const text = readFileSync(join(builtInTableDirectory(), 'goe-even-moments.json'), 'utf8');
    const tampered = text.replace('[3,2,"114"]', '[3,2,"115"]');
    expect(tampered).not.toBe(text);
    const e = refusal(() => parseReferenceTable(tampered, 'goe-even-moments.json', 'built-in', 'goe-even-moments'));
    expect(e.jsonPath).toBe('/digest');
    expect(e.message).toMatch(/goe-even-moments\.json: at \/digest: the content does not match its digest .* hashes to sha256:[0-9a-f]{64}/);
  });
});

describe('a folder of user tables', () => {
  const folder = mkdtempSync(join(tmpdir(), 'rmt-assay-tables-'));

  it('is listed after the built-in tables, validated against the same schema', () => {
    writeFileSync(join(folder, 'lab-goe-moments.json'), referenceTableText(LAB_TABLE));
    const tables = listReferenceTables(folder);
    const lab = tables.find((t) => t.name === 'lab-goe-moments');
    expect(lab?.origin).toBe('user');
    expect(tables.filter((t) => t.origin === 'built-in').length).toBe(BUILT_IN_COUNT);
  });

  it('may not reuse a built-in name, and must be a folder', () => {
    const shadow = join(folder, 'shadow');
    mkdirSync(shadow);
    writeFileSync(join(shadow, 'goe-even-moments.json'), referenceTableText({ ...LAB_TABLE, name: 'goe-even-moments' }));
    expect(() => listReferenceTables(shadow)).toThrow(/'goe-even-moments' is the name of a built-in table/);
    expect(() => listReferenceTables(join(folder, 'missing'))).toThrow(/is not a folder of tables/);
  });

  it('reports a broken user table by its file', () => {
    const broken = join(folder, 'broken');
    mkdirSync(broken);
    writeFileSync(join(broken, 'lab.json'), '[]');
    expect(() => listReferenceTables(broken)).toThrow(/lab\.json: does not match the reference table schema: at \(top level\): must be object/);
  });

  it('caches built-in tables', () => {
    expect(builtInTable('gue-even-moments')).toBe(builtInTable('gue-even-moments'));
  });
});
