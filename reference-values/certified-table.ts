import type { Cell, ReferenceColumn, ReferenceTable } from './reference-table.js';

/** Where a table was found: shipped with rmt-assay, or in the user's folder (--tables, RMT_ASSAY_TABLES). */
export type TableOrigin = 'built-in' | 'user';

/**
 * Typed access to a validated table (`parseReferenceTable` builds these; nothing else should).
 * Rows are found by their parameter cells, e.g. `table.bigint({ N: 10, k: 3 }, 'moment')`.
 */
export class CertifiedTable {
  private readonly index = new Map<string, number>();

  constructor(
    readonly table: ReferenceTable,
    readonly file: string,
    readonly origin: TableOrigin,
  ) {
    const parameters = this.parameterColumns();
    table.rows.forEach((row, i) => this.index.set(CertifiedTable.key(parameters.map((c) => row[this.columnIndex(c.name)])), i));
  }

  get name(): string {
    return this.table.name;
  }

  /** The cap of the log relative error: the certified digits, or 17 (a double's) for exact values. */
  get digitsCap(): number {
    return this.table.certifiedDigits === 'exact' ? 17 : this.table.certifiedDigits;
  }

  parameterColumns(): readonly ReferenceColumn[] {
    return this.table.columns.filter((c) => c.role === 'parameter');
  }

  columnIndex(name: string): number {
    const i = this.table.columns.findIndex((c) => c.name === name);
    if (i < 0) throw new RangeError(`table ${this.name} has no column '${name}' (columns: ${this.table.columns.map((c) => c.name).join(', ')})`);
    return i;
  }

  /** The row whose parameter cells equal `where` (every parameter column must be given), or undefined. */
  row(where: Readonly<Record<string, Cell>>): readonly Cell[] | undefined {
    const cells = this.parameterColumns().map((c) => {
      if (!Object.hasOwn(where, c.name)) throw new RangeError(`table ${this.name}: give the parameter '${c.name}'`);
      return where[c.name];
    });
    const i = this.index.get(CertifiedTable.key(cells));
    return i === undefined ? undefined : this.table.rows[i];
  }

  /** The cell's text exactly as stored (decimal and integer cells keep every digit). */
  text(where: Readonly<Record<string, Cell>>, column: string): string | undefined {
    const row = this.row(where);
    return row === undefined ? undefined : String(row[this.columnIndex(column)]);
  }

  /** An 'integer' cell as an exact bigint. */
  bigint(where: Readonly<Record<string, Cell>>, column: string): bigint | undefined {
    this.expectType(column, ['integer']);
    const text = this.text(where, column);
    return text === undefined ? undefined : BigInt(text);
  }

  /** A cell as the nearest double (decimal strings are correctly rounded by Number()). */
  number(where: Readonly<Record<string, Cell>>, column: string): number | undefined {
    this.expectType(column, ['number', 'integer', 'decimal']);
    const text = this.text(where, column);
    return text === undefined ? undefined : Number(text);
  }

  /** Every cell of a column, in row order, as stored. */
  column(name: string): Cell[] {
    const i = this.columnIndex(name);
    return this.table.rows.map((row) => row[i]);
  }

  private expectType(column: string, types: readonly string[]): void {
    const type = this.table.columns[this.columnIndex(column)].type;
    if (!types.includes(type)) throw new RangeError(`table ${this.name}: column '${column}' holds ${type} cells, not ${types.join(' or ')}`);
  }

  private static key(cells: readonly Cell[]): string {
    return JSON.stringify(cells.map((c) => (typeof c === 'number' ? c : `s:${c}`)));
  }
}
