import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { expectNoCrash } from '../../support/cli-expectations.js';
import { privateCliForFile, runCli, startCli, type CliRun } from '../../support/private-cli-build.js';

/**
 * `check --shard I/N` run as N separate processes, then `merge`: the JSON and JUnit reports are
 * those of the run in one piece, byte for byte.
 */
const { bin, folder } = privateCliForFile('shard-merge-identity');
/** The reports of the run in one piece. */
let whole: { code: number | null; json: string; junit: string };

/**
 * Every suite at small sizes, on GOE (the worker-count test covers GUE). 64 samples are 2 blocks
 * in the per-size sets: fewer than 3 or 4 shards, so some shards hold no block of such a set.
 */
const RUN = ['--suite', 'semicircle,identities,fluctuations', '--size', '48', '--ladder', '32,48,64', '--samples', '64', '--budget', '0.1', '--ensemble', 'goe', '--seed', '5'];

beforeAll(() => {
  const json = join(folder, 'whole.json');
  const junit = join(folder, 'whole.xml');
  const run = runCli(bin(), ['check', ...RUN, '--workers', '1', '--report', json, '--junit', junit]);
  expectNoCrash(run);
  whole = { code: run.code, json: readFileSync(json, 'utf8'), junit: readFileSync(junit, 'utf8') };
}, 180_000);

const shardFile = (name: string, index: number, count: number) => join(folder, `${name}-${index}-of-${count}.json`);

/** Runs the N shards at once, each a process of its own, with the worker count `workersOf(index)`. */
async function runShards(name: string, count: number, workersOf: (index: number) => number): Promise<CliRun[]> {
  const runs = await Promise.all(
    Array.from({ length: count }, (_, i) =>
      startCli(bin(), ['check', ...RUN, '--shard', `${i + 1}/${count}`, '--shard-file', shardFile(name, i + 1, count), '--workers', String(workersOf(i + 1))]),
    ),
  );
  runs.forEach((run, i) => {
    expectNoCrash(run);
    expect(run.code, run.stderr).toBe(0);
    expect(run.stdout).toContain(`shard ${i + 1}/${count}: `);
    expect(run.stdout).toContain(`written to ${shardFile(name, i + 1, count)}`);
  });
  return runs;
}

/** Merges the files in the order given and returns the exit code and both reports. */
function merge(name: string, files: readonly string[]): { code: number | null; json: string; junit: string } {
  const json = join(folder, `${name}-merged.json`);
  const junit = join(folder, `${name}-merged.xml`);
  const run = runCli(bin(), ['merge', ...files, '--report', json, '--junit', junit]);
  expectNoCrash(run);
  return { code: run.code, json: readFileSync(json, 'utf8'), junit: readFileSync(junit, 'utf8') };
}

function expectSameAsWhole(merged: { code: number | null; json: string; junit: string }): void {
  expect(merged.code).toBe(whole.code);
  expect(merged.json === whole.json, 'the merged JSON report differs from the whole run').toBe(true);
  expect(merged.junit === whole.junit, 'the merged JUnit report differs from the whole run').toBe(true);
}

/** Units of a shard file by (group, set): how the blocks of each sample set were spread. */
function blocksBySet(file: string): Map<string, number> {
  const record = JSON.parse(readFileSync(file, 'utf8')) as { units: Array<{ unit: { group: number; kind: string; set?: number } }> };
  const counts = new Map<string, number>();
  for (const { unit } of record.units) {
    if (unit.kind !== 'block') continue;
    const key = `${unit.group}/${unit.set}`;
    counts.set(key, (counts.get(key) ?? 0) + 1);
  }
  return counts;
}

describe('check --shard I/N and merge give the report of the run in one piece', () => {
  it('is a run that did real work and passed', () => {
    expect(whole.code).toBe(0);
    const result = JSON.parse(whole.json) as { counts: Record<string, number> };
    expect(result.counts).toMatchObject({ fail: 0, fault: 0 });
    expect(result.counts.pass).toBeGreaterThan(50);
    expect(whole.junit).toContain('<testsuites');
  });

  it('with 4 shards run as 4 processes at once, merged in a scrambled order', async () => {
    await runShards('four', 4, () => 1);
    const files = [3, 1, 4, 2].map((i) => shardFile('four', i, 4));
    expectSameAsWhole(merge('four', files));
  });

  it('with 3 shards, more than the blocks of some sets, one of them on 2 worker threads', async () => {
    await runShards('three', 3, (index) => (index === 2 ? 2 : 1));
    const spread = Array.from({ length: 3 }, (_, i) => blocksBySet(shardFile('three', i + 1, 3)));
    // A set of 2 blocks is in 2 of the 3 shard files: the third holds none of its blocks.
    const sets = new Set(spread.flatMap((m) => [...m.keys()]));
    const holders = [...sets].map((set) => spread.filter((m) => m.has(set)).length);
    expect(Math.min(...holders)).toBeLessThan(3);
    expectSameAsWhole(
      merge(
        'three',
        [2, 3, 1].map((i) => shardFile('three', i, 3)),
      ),
    );
  });
});
