import type { CheckContext, CheckFinding, ConcludeContext } from './check-group.js';

/**
 * Samples per block. A statistical group's sample index space is cut into blocks of this many
 * consecutive indices, whatever the number of workers or shards: a block is observed in index
 * order by whoever runs it, and blocks are combined in block order, so the figures of a run do not
 * depend on how its blocks were spread. A multiple of every sampler batch (8 matrices, 16 sample
 * statistics), so a batch never straddles two blocks.
 */
export const SAMPLE_BLOCK = 32;

/**
 * The statistical part of a group, split for parallel and sharded runs:
 * - observe: the samples [start, end) of one sample set (a whole block, in index order) into a
 *   part, which must be plain data (numbers, strings, booleans, arrays, objects, Float64Arrays) so
 *   that it crosses to a worker thread and into a shard file unchanged;
 * - combine: the part of two consecutive index ranges, left then right; applied as a left fold in
 *   block order, which fixes the order of every floating-point reduction;
 * - conclude: the findings from each set's combined part, without the adapter.
 * Every sample i is regenerable on its own: harness matrices come from the stream (seed, key, i),
 * an implementation's sampler is asked with the seed of the batch containing i.
 */
export interface SampledWork<Part> {
  /** Samples in each sample set (a group over a ladder of sizes has one set per size). */
  readonly setSizes: readonly number[];
  observe(context: CheckContext, set: number, start: number, end: number): Promise<Part>;
  combine(left: Part, right: Part): Part;
  conclude(context: ConcludeContext, parts: readonly Part[]): CheckFinding[];
}

/** The number of blocks of a sample set of `count` samples. */
export function blockCount(count: number): number {
  return Math.ceil(count / SAMPLE_BLOCK);
}

/** The index range [start, end) of block `block` of a set of `count` samples. */
export function blockRange(count: number, block: number): { readonly start: number; readonly end: number } {
  const start = block * SAMPLE_BLOCK;
  return { start, end: Math.min(count, start + SAMPLE_BLOCK) };
}
