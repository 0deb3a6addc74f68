import { writeFileSync } from 'node:fs';
import type { CertifiedTable } from '../../reference-values/certified-table.js';
import { formatCitation } from '../../reference-values/citation.js';
import type { Cell, ReferenceTable } from '../../reference-values/reference-table.js';
import { listReferenceTables } from '../../reference-values/reference-table-catalog.js';
import { ReferenceTableError } from '../../reference-values/reference-table-error.js';
import { referenceTableText } from '../../reference-values/reference-table-text.js';
import { UsageError } from './usage-error.js';

/** The environment variable naming a folder of the user's own tables (the --tables option wins). */
export const USER_TABLES_VARIABLE = 'RMT_ASSAY_TABLES';

export interface TableOptions {
  /** --tables DIR: a folder of the user's own tables, validated against the same schema. */
  readonly tables?: string;
}

function tables(options: TableOptions): CertifiedTable[] {
  const folder = options.tables ?? process.env[USER_TABLES_VARIABLE];
  try {
    return listReferenceTables(folder === undefined || folder === '' ? undefined : folder);
  } catch (error) {
    if (error instanceof ReferenceTableError) throw new UsageError(error.message);
    throw error;
  }
}

function findTable(name: string, options: TableOptions): CertifiedTable {
  const all = tables(options);
  const table = all.find((t) => t.name === name);
  if (table === undefined) throw new UsageError(`no table named '${name}' (rmt-assay reference list shows the ${all.length} tables)`);
  return table;
}

const digits = (t: ReferenceTable): string => (t.certifiedDigits === 'exact' ? 'exact' : String(t.certifiedDigits));

function aligned(rows: readonly (readonly string[])[]): string[] {
  const widths = rows[0].map((_, j) => Math.max(...rows.map((r) => r[j].length)));
  return rows.map((r) => r.map((cell, j) => (j === r.length - 1 ? cell : cell.padEnd(widths[j]))).join('  '));
}

/** `reference list`: one line per table, built-in first. */
export function referenceListLines(options: TableOptions): string[] {
  const header = ['NAME', 'ROWS', 'DIGITS', 'ORIGIN', 'TITLE'];
  const rows = tables(options).map((t) => [t.name, String(t.table.rows.length), digits(t.table), t.origin, t.table.title]);
  return aligned([header, ...rows]);
}

/** `reference show NAME`: the provenance, then the rows (the first 20 unless `all`). */
export function referenceShowLines(name: string, options: TableOptions & { readonly all?: boolean }): string[] {
  const entry = findTable(name, options);
  const t = entry.table;
  const c = t.quantity.conventions;
  const conventions = [
    `normalisation: ${c.normalisation}`,
    c.beta === undefined ? undefined : `β = ${Array.isArray(c.beta) ? c.beta.join(', ') : c.beta}`,
    c.diagonalVariance === undefined ? undefined : `σ_d² = ${c.diagonalVariance}`,
    c.kappa4 === undefined ? undefined : `κ4 = ${c.kappa4}`,
    c.branch === undefined ? undefined : `branch: ${c.branch}`,
    c.notes === undefined ? undefined : `notes: ${c.notes}`,
  ].filter((line): line is string => line !== undefined);
  const shown = options.all ? t.rows : t.rows.slice(0, 20);
  const lines = [
    `${t.name}: ${t.title}`,
    `quantity:     ${t.quantity.symbol}: ${t.quantity.definition}`,
    ...conventions.map((line, i) => `${i === 0 ? 'conventions:  ' : '              '}${line}`),
    ...t.sources.map((s, i) => `${i === 0 ? 'sources:      ' : '              '}${i + 1}. ${formatCitation(s)}`),
    `produced by:  ${t.production.generator}: ${t.production.method}`,
    `              arithmetic: ${t.production.arithmetic}; precision: ${t.production.precision}; tool: ${t.production.tool}`,
    `certified:    ${digits(t)}${t.certifiedDigits === 'exact' ? '' : ' significant digits'}: ${t.certification}`,
    `file:         ${entry.file} (${entry.origin}), digest ${t.digest}`,
    ...t.columns.map((col, i) => `${i === 0 ? 'columns:      ' : '              '}${col.name} (${col.type}, ${col.role}): ${col.description}`),
    '',
    ...aligned([t.columns.map((col) => col.name), ...shown.map((row) => row.map(String))]),
  ];
  if (shown.length < t.rows.length) lines.push(`(the first ${shown.length} of ${t.rows.length} rows: --all shows every row; export takes the table into your tests)`);
  return lines;
}

/** RFC 4180 quoting: only cells with a comma, quote or line break are quoted. */
function csvCell(cell: Cell): string {
  const text = String(cell);
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/**
 * `reference export NAME --format json|csv`: json is the table's canonical file text (provenance and
 * digest included, loadable as a user table); csv has '#' comment lines with the provenance (read
 * by numpy.loadtxt and pandas with comment='#'), a header of column names, then the rows, with
 * decimal and integer cells as written (no digit lost).
 */
export function referenceExportText(name: string, format: string, options: TableOptions): string {
  const t = findTable(name, options).table;
  if (format === 'json') {
    const { digest: _digest, ...content } = t;
    return referenceTableText(content);
  }
  if (format !== 'csv') throw new UsageError(`--format must be json or csv, got '${format}'`);
  const comments = [
    `${t.name}: ${t.title}`,
    `quantity: ${t.quantity.symbol}: ${t.quantity.definition}`,
    `conventions: ${JSON.stringify(t.quantity.conventions)}`,
    ...t.sources.map((s) => `source: ${formatCitation(s)}`),
    `produced by: ${t.production.generator}: ${t.production.method} (${t.production.arithmetic})`,
    `certified digits: ${digits(t)}; digest ${t.digest}`,
  ].map((line) => `# ${line.replace(/[\r\n]+/g, ' ')}`);
  const rows = [t.columns.map((c) => c.name), ...t.rows].map((row) => row.map(csvCell).join(','));
  return `${[...comments, ...rows].join('\n')}\n`;
}

/** Writes an export to FILE (the terminal gets one line on stderr), or returns it for stdout. */
export function writeExport(text: string, output: string | undefined): string | undefined {
  if (output === undefined) return text;
  try {
    writeFileSync(output, text);
  } catch (error) {
    throw new UsageError(`cannot write --output ${output} (${(error as NodeJS.ErrnoException).code ?? (error as Error).message})`);
  }
  return undefined;
}
