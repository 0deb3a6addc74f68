import { writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { ReferenceTableContent } from '../reference-table.js';
import { builtInTableDirectory } from '../reference-table-catalog.js';
import { referenceTableText } from '../reference-table-text.js';

/**
 * The entry point of a generator script: when the module at `moduleUrl` is the program being run
 * (`node dist/reference-values/tables/NAME.generate.js`), build each table and write it, in its
 * canonical text, to reference-values/tables/ of the package (not to dist/). Imported by a test,
 * the module does nothing here and the test calls the builders itself.
 */
export function runGeneratorIfMain(moduleUrl: string, builders: ReadonlyArray<() => ReferenceTableContent>): void {
  const script = process.argv[1];
  if (script === undefined || resolve(script) !== fileURLToPath(moduleUrl)) return;
  for (const build of builders) {
    const content = build();
    const file = join(builtInTableDirectory(), `${content.name}.json`);
    writeFileSync(file, referenceTableText(content));
    console.log(`wrote ${file} (${content.rows.length} rows)`);
  }
}
