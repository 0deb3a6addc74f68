import type { ReferenceTable, ReferenceTableContent } from './reference-table.js';
import { referenceTableDigest } from './reference-table-digest.js';

/**
 * The canonical text of a table file: two-space indented JSON with one row per line, the digest
 * last, and a final newline. Generators write exactly this, so regenerating a table reproduces its
 * committed file byte for byte.
 */
export function referenceTableText(content: ReferenceTableContent): string {
  const table: ReferenceTable = { ...content, digest: referenceTableDigest(content) };
  const marker = '"rows placeholder"';
  const head = JSON.stringify({ ...table, rows: JSON.parse(marker) as string }, null, 2);
  const rows = `[\n${table.rows.map((row) => `    ${JSON.stringify(row)}`).join(',\n')}\n  ]`;
  // A function replacement, so that "$" in a cell is not read as a replacement pattern.
  return `${head.replace(marker, () => rows)}\n`;
}
