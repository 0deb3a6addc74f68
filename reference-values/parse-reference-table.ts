import { Ajv, type ValidateFunction } from 'ajv';
import { schemaErrorText } from '../adapters/process/schema-error-text.js';
import { CertifiedTable, type TableOrigin } from './certified-table.js';
import type { ColumnType, ReferenceTable } from './reference-table.js';
import { referenceTableDigest } from './reference-table-digest.js';
import { ReferenceTableError } from './reference-table-error.js';
import schema from './reference-table.schema.json' with { type: 'json' };

let validate: ValidateFunction | undefined;

function schemaValidator(): ValidateFunction {
  // verbose: errors carry their schema, whose title says what a failed anyOf expected.
  validate ??= new Ajv({ allErrors: true, verbose: true, strict: true }).compile(schema);
  return validate;
}

const CELL_FORMS: Record<ColumnType, { test: (cell: unknown) => boolean; expected: string }> = {
  number: { test: (c) => typeof c === 'number' && Number.isFinite(c), expected: 'a finite JSON number' },
  integer: { test: (c) => typeof c === 'string' && /^-?(0|[1-9]\d*)$/.test(c), expected: 'an integer written as a string such as "-12"' },
  decimal: {
    test: (c) => typeof c === 'string' && /^-?(0|[1-9]\d*)(\.\d+)?([eE][-+]?\d+)?$/.test(c),
    expected: 'a decimal string such as "-1.25e-3"',
  },
  label: { test: (c) => typeof c === 'string' && c.length > 0, expected: 'a non-empty string' },
};

/**
 * Validates the text of a table file and gives typed access to it. Refused, with a
 * ReferenceTableError naming `file` and the JSON path: text that is not JSON; anything the schema
 * (reference-table.schema.json) rejects; a name that differs from the file's base name (when
 * `expectedName` is given); a row whose length differs from the columns'; a cell not of its
 * column's type; two rows with the same parameters; a digest that does not match the content.
 */
export function parseReferenceTable(text: string, file: string, origin: TableOrigin, expectedName?: string): CertifiedTable {
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (error) {
    throw new ReferenceTableError(file, '', `not valid JSON (${(error as Error).message})`);
  }
  const validator = schemaValidator();
  if (!validator(data)) {
    throw new ReferenceTableError(file, '', `does not match the reference table schema: ${schemaErrorText(validator.errors ?? [])}`);
  }
  const table = data as ReferenceTable;
  if (expectedName !== undefined && table.name !== expectedName) {
    throw new ReferenceTableError(file, '/name', `the name '${table.name}' must equal the file's base name '${expectedName}'`);
  }
  const names = new Set<string>();
  table.columns.forEach((c, j) => {
    if (names.has(c.name)) throw new ReferenceTableError(file, `/columns/${j}/name`, `the column name '${c.name}' is used twice`);
    names.add(c.name);
  });
  if (!table.columns.some((c) => c.role === 'value')) throw new ReferenceTableError(file, '/columns', 'no column has the role "value"');
  const seen = new Map<string, number>();
  table.rows.forEach((row, i) => {
    if (row.length !== table.columns.length) {
      throw new ReferenceTableError(file, `/rows/${i}`, `has ${row.length} cells, but there are ${table.columns.length} columns`);
    }
    row.forEach((cell, j) => {
      const form = CELL_FORMS[table.columns[j].type];
      if (!form.test(cell)) {
        throw new ReferenceTableError(file, `/rows/${i}/${j}`, `column '${table.columns[j].name}' needs ${form.expected}, got ${JSON.stringify(cell)}`);
      }
    });
    const key = JSON.stringify(row.filter((_, j) => table.columns[j].role === 'parameter'));
    const earlier = seen.get(key);
    if (earlier !== undefined) throw new ReferenceTableError(file, `/rows/${i}`, `repeats the parameters of /rows/${earlier} (${key})`);
    seen.set(key, i);
  });
  const { digest, ...content } = table;
  const actual = referenceTableDigest(content);
  if (digest !== actual) {
    throw new ReferenceTableError(
      file,
      '/digest',
      `the content does not match its digest (it was changed or damaged): it hashes to ${actual}; if the change is intended, put that value in "digest"`,
    );
  }
  return new CertifiedTable(table, file, origin);
}
