import { describe, expect, it } from 'vitest';
import { ReferenceAdapter } from '../../../adapters/reference-adapter.js';
import { isSampled, type SampledGroup } from '../../../harness/check-group.js';
import { parseEnsemble } from '../../../harness/numeric/ensemble.js';
import { resolveRunSettings } from '../../../harness/resolve-run-settings.js';
import { contextFor, planGroups } from '../../../harness/run-checks.js';
import { blockCount, blockRange } from '../../../harness/sampled-work.js';
import { toExactJson } from '../../../harness/shards/exact-json.js';
import { fluctuationsSuite } from '../../../properties/fluctuations.js';
import { semicircleSuite } from '../../../properties/semicircle.js';

/**
 * Memory does not grow with the number of samples: a statistical group's part after one block and
 * after all its blocks have the same shape (every Float64Array the same length, the same members),
 * for the fluctuation suite's main group (streaming co-moments, the pictured values capped) and
 * every semicircle group (Chan–Golub–LeVeque running means, histograms). Only counts and values
 * change.
 */
function shapeOf(value: unknown): unknown {
  if (value instanceof Float64Array) return `Float64Array(${value.length})`;
  if (Array.isArray(value)) return value.map(shapeOf);
  if (value !== null && typeof value === 'object') return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, shapeOf(v)]));
  return typeof value;
}

async function partsAfterOneAndAllBlocks(group: SampledGroup, settings: ReturnType<typeof resolveRunSettings>) {
  const adapter = new ReferenceAdapter();
  const context = contextFor(adapter, await adapter.describe(), settings);
  const count = group.work.setSizes[0];
  let folded: unknown;
  let first: unknown;
  for (let block = 0; block < blockCount(count); block++) {
    const { start, end } = blockRange(count, block);
    const part = await group.work.observe(context, 0, start, end);
    folded = block === 0 ? part : group.work.combine(folded, part);
    if (block === 0) first = folded;
  }
  return { first, all: folded, blocks: blockCount(count) };
}

describe('streaming parts', () => {
  it('the fluctuation group keeps the same shape of state after 1 block and after 8 (N = 32, 256 samples)', async () => {
    const settings = resolveRunSettings({ suites: ['fluctuations'], sizes: [32], ensembles: [parseEnsemble('goe')], budget: 0.256 });
    const group = planGroups(settings, [fluctuationsSuite]).find((g) => g.id === 'fluctuations/goe/N=32');
    if (group === undefined || !isSampled(group)) throw new Error('no sampled main group');
    const { first, all, blocks } = await partsAfterOneAndAllBlocks(group, settings);
    expect(blocks).toBe(8);
    expect(shapeOf(all)).toEqual(shapeOf(first));
    // And the state is a few hundred kilobytes at most, whatever the sample count.
    expect(JSON.stringify(toExactJson(all)).length).toBeLessThan(400_000);
  });

  it('every semicircle group keeps the same shape of state after 1 block and after all of them', async () => {
    const settings = resolveRunSettings({ suites: ['semicircle'], sizes: [24], ladder: [16, 24, 32], samples: 96, ensembles: [parseEnsemble('gue')] });
    const groups = planGroups(settings, [semicircleSuite]).filter(isSampled);
    expect(groups.length).toBeGreaterThanOrEqual(3);
    for (const group of groups) {
      const { first, all, blocks } = await partsAfterOneAndAllBlocks(group, settings);
      expect(blocks, group.id).toBeGreaterThan(1);
      expect(shapeOf(all), group.id).toEqual(shapeOf(first));
    }
  });
});
