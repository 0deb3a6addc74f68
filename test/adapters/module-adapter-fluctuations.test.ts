import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { AdapterFault, EnsembleNotOffered, NotAvailable } from '../../adapters/adapter.js';
import { ModuleAdapter } from '../../adapters/module-adapter.js';
import { identityMatrix } from '../../harness/numeric/square-matrix.js';

function moduleFile(source: string): string {
  const dir = mkdtempSync(join(tmpdir(), 'rmt-assay-module-'));
  const file = join(dir, 'kernel.mjs');
  writeFileSync(file, source);
  return file;
}

const chain = { points: [{ re: -1, im: 0.5 }], weights: [identityMatrix('real', 3)] };

describe('module adapter: covariance and sampleStatistics', () => {
  it('declares the capabilities of what the module exports and converts both ways', async () => {
    const adapter = await ModuleAdapter.load(
      moduleFile(`
        export function covariance(ensemble, left, right) {
          if (left.points.length === 0) return null;
          return [left.points[0][0] + right.points[0][1], left.weights.length];
        }
        export function sampleStatistics(ensemble, size, seed, count, statistics) {
          if (ensemble.kind === 'gue') return null;
          return Array.from({ length: count }, (_, k) => statistics.map((s, j) => [k, s.points.length + j]));
        }
      `),
    );
    expect((await adapter.describe()).capabilities).toEqual(['covariance', 'sample_statistics']);
    expect(await adapter.covariance({ kind: 'goe' }, chain, chain)).toEqual({ re: -0.5, im: 1 });
    await expect(adapter.covariance({ kind: 'goe' }, { points: [], weights: [] }, chain)).rejects.toBeInstanceOf(NotAvailable);
    expect(await adapter.sampleStatistics({ kind: 'goe' }, 3, 1, 2, [chain, { points: [], weights: [] }])).toEqual([
      [
        { re: 0, im: 1 },
        { re: 0, im: 1 },
      ],
      [
        { re: 1, im: 1 },
        { re: 1, im: 1 },
      ],
    ]);
    await expect(adapter.sampleStatistics({ kind: 'gue' }, 3, 1, 2, [chain])).rejects.toBeInstanceOf(EnsembleNotOffered);
  });

  it('reports malformed and non-finite answers as faults naming the method', async () => {
    const adapter = await ModuleAdapter.load(
      moduleFile(`
        export function covariance() { return [NaN, 0]; }
        export function sampleStatistics(ensemble, size, seed, count, statistics) { return [[[1, 2]]]; }
      `),
    );
    await expect(adapter.covariance({ kind: 'goe' }, chain, chain)).rejects.toMatchObject({ method: 'covariance', kind: 'invalid-value' });
    const fault = await adapter.sampleStatistics({ kind: 'goe' }, 3, 1, 2, [chain]).catch((e: unknown) => e);
    expect(fault).toBeInstanceOf(AdapterFault);
    expect(fault).toMatchObject({ method: 'sample_statistics', kind: 'invalid-value' });
  });
});
