import type { ColumnType, ReferenceColumn } from '../reference-table.js';

type ColumnSpecs = Readonly<Record<string, readonly [ColumnType, string]>>;

/** A table's columns from two name → [type, description] maps, parameters first (key order kept). */
export function tableColumns(parameters: ColumnSpecs, values: ColumnSpecs): ReferenceColumn[] {
  const list = (specs: ColumnSpecs, role: ReferenceColumn['role']): ReferenceColumn[] =>
    Object.entries(specs).map(([name, [type, description]]) => ({ name, type, role, description }));
  return [...list(parameters, 'parameter'), ...list(values, 'value')];
}
