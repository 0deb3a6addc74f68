import { existsSync, readFileSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

let root: string | undefined;

/**
 * The folder of rmt-assay's package.json. This module is <root>/reference-values/package-root.ts
 * when vitest runs the source and <root>/dist/reference-values/package-root.js when built (tsc's
 * outDir is dist/, and it copies package.json into dist/ too, so the first package.json upwards
 * is not the answer). An installed package ships reference-values/ beside dist/ (package.json
 * "files"), so its tables are found the same way.
 */
export function packageRoot(): string {
  if (root !== undefined) return root;
  const up = dirname(dirname(fileURLToPath(import.meta.url)));
  const candidate = basename(up) === 'dist' ? dirname(up) : up;
  const manifest = join(candidate, 'package.json');
  if (!existsSync(manifest) || (JSON.parse(readFileSync(manifest, 'utf8')) as { name?: string }).name !== 'rmt-assay') {
    throw new Error(`packageRoot: ${candidate} holds no package.json of rmt-assay`);
  }
  root = candidate;
  return candidate;
}
