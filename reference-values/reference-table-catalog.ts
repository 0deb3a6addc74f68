import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { basename, join, resolve } from 'node:path';
import type { CertifiedTable, TableOrigin } from './certified-table.js';
import { packageRoot } from './package-root.js';
import { parseReferenceTable } from './parse-reference-table.js';
import { ReferenceTableError } from './reference-table-error.js';

/** reference-values/tables/ of the package: the certified tables shipped with rmt-assay. */
export function builtInTableDirectory(): string {
  return join(packageRoot(), 'reference-values', 'tables');
}

const cache = new Map<string, CertifiedTable>();

/** Reads and validates one table file (every *.json in a table folder is a table). */
export function loadReferenceTable(file: string, origin: TableOrigin): CertifiedTable {
  const path = resolve(file);
  const cached = cache.get(path);
  if (cached !== undefined && cached.origin === origin) return cached;
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch (error) {
    throw new ReferenceTableError(file, '', `cannot be read (${(error as NodeJS.ErrnoException).code ?? (error as Error).message})`);
  }
  const table = parseReferenceTable(text, file, origin, basename(path, '.json'));
  cache.set(path, table);
  return table;
}

function tableFiles(directory: string): string[] {
  return readdirSync(directory)
    .filter((f) => f.endsWith('.json'))
    .sort()
    .map((f) => join(directory, f));
}

/**
 * Every table: the built-in ones, then those in `userDirectory` (the --tables folder or
 * RMT_ASSAY_TABLES), each validated. A user table may not reuse a built-in table's name, so a name
 * always means one set of values.
 */
export function listReferenceTables(userDirectory?: string): CertifiedTable[] {
  const tables = tableFiles(builtInTableDirectory()).map((f) => loadReferenceTable(f, 'built-in'));
  if (userDirectory === undefined) return tables;
  if (!existsSync(userDirectory) || !statSync(userDirectory).isDirectory()) {
    throw new ReferenceTableError(userDirectory, '', 'is not a folder of tables');
  }
  const builtIn = new Set(tables.map((t) => t.name));
  for (const file of tableFiles(userDirectory)) {
    const table = loadReferenceTable(file, 'user');
    if (builtIn.has(table.name)) {
      throw new ReferenceTableError(file, '/name', `'${table.name}' is the name of a built-in table; give your table another name`);
    }
    tables.push(table);
  }
  return tables;
}

/** A built-in table by name (loaded once and cached). */
export function builtInTable(name: string): CertifiedTable {
  return loadReferenceTable(join(builtInTableDirectory(), `${name}.json`), 'built-in');
}
