import { createHash } from 'node:crypto';
import type { WireMatrix } from '../process/matrix-codec.js';
import { CHAIN_MEMBERS, MATRIX_MEMBERS, type MatrixRef } from './recording-format.js';

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
export function mapMatrixMembers(object: Record<string, unknown>, map: (value: unknown, path: string) => unknown, prefix = ''): Record<string, unknown> {
  const out: Record<string, unknown> = { ...object };
  const each = (members: Readonly<Record<string, 'one' | 'list'>>, f: (value: unknown, path: string) => unknown) => {
    for (const [member, kind] of Object.entries(members)) {
      const value = out[member];
      if (value === undefined) continue;
      if (kind === 'one') out[member] = f(value, `${prefix}/${member}`);
      else if (Array.isArray(value)) out[member] = value.map((v, i) => f(v, `${prefix}/${member}/${i}`));
    }
  };
  each(MATRIX_MEMBERS, map);
  each(CHAIN_MEMBERS, (chain, path) =>
    chain !== null && typeof chain === 'object' ? mapMatrixMembers(chain as Record<string, unknown>, map, path) : chain,
  );
  return out;
}
