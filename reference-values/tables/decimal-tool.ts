import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';

/** "decimal.js X.Y.Z", the version installed, for a table's production record. */
export function decimalTool(): string {
  const manifest = createRequire(import.meta.url).resolve('decimal.js/package.json');
  return `decimal.js ${(JSON.parse(readFileSync(manifest, 'utf8')) as { version: string }).version}`;
}
