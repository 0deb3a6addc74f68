import { createHash } from 'node:crypto';

/**
 * A key that identifies a call by its method and params, whatever the order of members in the
 * JSON that holds it: SHA-256 of the method and the params serialised with sorted keys. Two calls
 * with the same inputs (bit for bit: numbers print as the shortest round-trip decimal, matrices as
 * their base64 bytes) get the same key.
 */
export function callKey(method: string, params: unknown): string {
  return createHash('sha256').update(method).update('\u0000').update(sortedJson(params)).digest('hex');
}

function sortedJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(sortedJson).join(',')}]`;
  if (value !== null && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${sortedJson(v)}`).join(',')}}`;
  }
  return JSON.stringify(value);
}
