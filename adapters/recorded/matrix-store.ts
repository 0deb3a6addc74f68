import { createHash } from 'node:crypto';
import type { WireMatrix } from '../process/matrix-codec.js';
import { MATRIX_MEMBERS, type MatrixRef } from './recording-format.js';

/** Collects the matrices of a recording once each and hands out references to them. */
export class MatrixStore {
  private readonly index = new Map<string, number>();
  readonly matrices: WireMatrix[] = [];

  private refOf(wire: WireMatrix): MatrixRef {
    const key = createHash('sha256').update(`${wire.size} ${wire.field} `).update(wire.data).digest('hex');
    let k = this.index.get(key);
    if (k === undefined) {
      k = this.matrices.length;
      this.matrices.push(wire);
      this.index.set(key, k);
    }
    return { ref: k };
  }

  /** A copy of a params or result object with every matrix member replaced by a reference. */
  withRefs(object: Record<string, unknown>): Record<string, unknown> {
    return mapMatrixMembers(object, (wire) => this.refOf(wire as WireMatrix));
  }
}

/**
 * A copy of `object` with each matrix member (see MATRIX_MEMBERS) passed through `map`. Members of
 * the wrong kind are left as they are for the schema to report.
 */
export function mapMatrixMembers(object: Record<string, unknown>, map: (value: unknown, path: string) => unknown): Record<string, unknown> {
  const out: Record<string, unknown> = { ...object };
  for (const [member, kind] of Object.entries(MATRIX_MEMBERS)) {
    const value = out[member];
    if (value === undefined) continue;
    if (kind === 'one') out[member] = map(value, `/${member}`);
    else if (Array.isArray(value)) out[member] = value.map((v, i) => map(v, `/${member}/${i}`));
  }
  return out;
}
