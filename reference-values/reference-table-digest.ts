import { createHash } from 'node:crypto';

/**
 * "sha256:" and the hex SHA-256 of JSON.stringify of a table without its digest field, keys in the
 * order they appear. The digest makes an edited or damaged table fail to load with a clear error;
 * someone who changes a table on purpose puts the new digest in (the error message states it).
 */
export function referenceTableDigest(contentWithoutDigest: object): string {
  return `sha256:${createHash('sha256').update(JSON.stringify(contentWithoutDigest), 'utf8').digest('hex')}`;
}
