import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { PassThrough } from 'node:stream';
import { beforeAll, describe, expect, it } from 'vitest';
import { ReferenceAdapter } from '../../../adapters/reference-adapter.js';
import { runCheckCommand, type CheckArguments } from '../../../harness/cli/check-command.js';
import { withOptionDefaults } from '../../../harness/cli/declare-options.js';
import { runMergeCommand } from '../../../harness/cli/merge-command.js';
import { CHECK_OPTIONS } from '../../../harness/cli/option-table.js';
import { UsageError } from '../../../harness/cli/usage-error.js';
import { suitesOfRecipe, type RunRecipe } from '../../../harness/run-recipe.js';
import { runShard } from '../../../harness/shards/run-shard.js';
import { writeShardFile } from '../../../harness/shards/shard-file.js';
import { expectUsageError } from '../../support/cli-expectations.js';
import { privateCliForFile, runCli } from '../../support/private-cli-build.js';
import { testSettings } from '../../support/run-settings-for-tests.js';

/**
 * What `merge` says about shard files that are not the shards of one run, or not shard files: one
 * line and exit code 2, through the built CLI. The shard files are written in this process by the
 * code `check --shard` runs (a tiny run: the semicircle and identity suites at N = 16).
 */
const { bin, folder } = privateCliForFile('merge-errors');
const shard = (index: number, seed = 3) => join(folder, `seed-${seed}-shard-${index}-of-4.json`);
const file = (name: string) => join(folder, name);

async function writeShards(seed: number, indices: readonly number[]): Promise<void> {
  const settings = testSettings({ suites: ['semicircle', 'identities'], sizes: [16], ladder: [16, 24, 32], samples: 40, seed });
  const recipe: RunRecipe = { settings, adapter: { timeoutSeconds: 60 } };
  for (const index of indices) {
    writeShardFile(shard(index, seed), await runShard(new ReferenceAdapter(), recipe, suitesOfRecipe(recipe), { index, count: 4 }));
  }
}

/** A copy of shard `index` (seed 3) with `damage` done to its parsed JSON. */
function damagedCopy(name: string, index: number, damage: (record: { units: Array<{ unit: Record<string, unknown>; outcome: Record<string, unknown> } | null> } & Record<string, unknown>) => void): string {
  const record = JSON.parse(readFileSync(shard(index), 'utf8'));
  damage(record);
  writeFileSync(file(name), JSON.stringify(record));
  return file(name);
}

beforeAll(async () => {
  await writeShards(3, [1, 2, 3, 4]);
  await writeShards(4, [1]);
}, 180_000);

const merge = (...files: string[]) => runCli(bin(), ['merge', ...files]);
/** Where a command run in this process writes its terminal output (nothing is read from it). */
const quietOut = () => new PassThrough() as unknown as NodeJS.WriteStream;
const others = (but: number) => [1, 2, 3, 4].filter((i) => i !== but).map((i) => shard(i));

describe('rmt-assay merge refuses shard files that do not make one run, with one line and exit code 2', () => {
  it('merges the four shards as written (so each refusal below is about the damage alone)', () => {
    const run = merge(...[1, 2, 3, 4].map((i) => shard(i)));
    expect(run.stderr).toBe('');
    expect(run.code).toBe(0);
    expect(run.stdout).toMatch(/\d+ passed, 0 failed/);
  });

  it('a missing shard (3 of 4 files)', () => {
    expectUsageError(merge(shard(1), shard(2), shard(4)), /^rmt-assay: shard 3\/4 missing: merge needs all 4\n$/);
  });

  it('the same shard twice', () => {
    expectUsageError(merge(shard(1), shard(2), shard(2), shard(3), shard(4)), /'.*seed-3-shard-2-of-4\.json' and '.*seed-3-shard-2-of-4\.json' are both shard 2\/4/);
  });

  it('shards of runs with different seeds', () => {
    expectUsageError(merge(shard(1, 4), ...others(1)), /are not shards of one run: they differ in settings \(suites, sizes, samples, seed, ensembles, adapter options\)/);
  });

  it('a file that is not JSON', () => {
    writeFileSync(file('notes.txt'), 'shard 1 of 4, to be merged later\n');
    expectUsageError(merge(file('notes.txt'), ...others(1)), /'.*notes\.txt' is not a shard file: .*JSON/);
  });

  it('a JSON file that is not a shard file (a report, say)', () => {
    writeFileSync(file('report.json'), JSON.stringify({ formatVersion: 1, counts: { pass: 3 } }));
    expectUsageError(merge(file('report.json'), ...others(1)), /'.*report\.json' is not a shard file \(written by check --shard I\/N\)$/m);
  });

  it('a shard file cut short', () => {
    const text = readFileSync(shard(2), 'utf8');
    writeFileSync(file('truncated.json'), text.slice(0, Math.floor(text.length / 2)));
    expectUsageError(merge(shard(1), file('truncated.json'), shard(3), shard(4)), /'.*truncated\.json' is not a shard file: .*JSON/);
  });

  it('a shard file whose units were removed', () => {
    const damaged = damagedCopy('lacking.json', 4, (record) => record.units.splice(-1, 1));
    expectUsageError(merge(...others(4), damaged), /the shards lack units of 1 group\(s\), e.g. \S+: were they written by an interrupted run\?/);
  });

  it('a file that does not exist', () => {
    expectUsageError(merge(...others(2), file('no-such-shard.json')), /cannot read the shard file '.*no-such-shard\.json': ENOENT/);
  });

  it('a shard file with a null unit entry (once a TypeError and a stack trace)', () => {
    const damaged = damagedCopy('null-entry.json', 1, (record) => (record.units[0] = null));
    expectUsageError(merge(damaged, ...others(1)), /shard 1\/4 holds a unit the plan does not have \(entry 0\)/);
  });
});

/** `merge` in this process: what the CLI prints on one line with exit code 2 is the UsageError's message. */
async function expectMergeRefused(files: readonly string[], message: RegExp): Promise<void> {
  const merging = runMergeCommand({ files, verbose: false }, quietOut());
  await expect(merging).rejects.toThrow(UsageError);
  await expect(merging).rejects.toThrow(message);
}

describe('rmt-assay merge refuses damaged shard files as bad usage, never as a TypeError or a quiet fault', () => {
  it('a shard file from another format version', async () => {
    const damaged = damagedCopy('version-2.json', 1, (record) => (record.formatVersion = 2));
    await expectMergeRefused([damaged, ...others(1)], /has shard format version 2; this rmt-assay reads version 1/);
  });

  it('a shard file whose Float64Array text was damaged', async () => {
    const text = readFileSync(shard(1), 'utf8');
    const at = text.indexOf('{"$f64":"') + '{"$f64":"'.length;
    expect(at).toBeGreaterThan(10);
    writeFileSync(file('bad-f64.json'), text.slice(0, at) + '#' + text.slice(at + 1));
    await expectMergeRefused([file('bad-f64.json'), ...others(1)], /is not a shard file: \$\.units\[\d+\]\.outcome\.part.*: \$f64 must hold base64 text/);
  });

  const damage: Array<[string, (record: Parameters<Parameters<typeof damagedCopy>[2]>[0]) => void, RegExp]> = [
    ['a null shard member', (r) => (r.shard = null), /is damaged: its shard, plan, recipe, adapter or units are missing or malformed/],
    ['a recipe without settings', (r) => (r.recipe = {}), /is damaged: its shard, plan, recipe, adapter or units are missing or malformed/],
    ['a block the plan does not have', (r) => (r.units[0]!.unit.block = 99), /shard 1\/4 holds a unit the plan does not have \(entry 0\)/],
    ['a group index that is not a number', (r) => (r.units[0]!.unit.group = 'constructor'), /shard 1\/4 holds a unit the plan does not have \(entry 0\)/],
    ['an outcome of an unknown kind', (r) => (r.units[0]!.outcome = { kind: 'weird' }), /shard 1\/4 is damaged: the outcome of \S+ set 0 block 0 is malformed/],
    ['a part without its part', (r) => delete r.units[0]!.outcome.part, /shard 1\/4 is damaged: the outcome of .* is malformed/],
    [
      'whole-group findings one short',
      (r) => {
        const whole = r.units.find((u) => u?.outcome.kind === 'findings')!;
        (whole.outcome.findings as unknown[]).pop();
      },
      /shard 1\/4 is damaged: the outcome of identities\/\S+ is malformed/,
    ],
  ];
  for (const [what, change, message] of damage) {
    it(`a shard file with ${what}`, async () => {
      await expectMergeRefused([damagedCopy(`damaged-${what.replaceAll(' ', '-')}.json`, 1, change), ...others(1)], message);
    });
  }
});

/** check's arguments as yargs and the config layer hand them over: the option table's defaults, then these. */
const checkArguments = (values: Partial<Record<keyof CheckArguments, unknown>>) => withOptionDefaults(CHECK_OPTIONS, { ...values }) as unknown as CheckArguments;

describe('rmt-assay check refuses bad --shard and --workers options before it starts an implementation', () => {
  const refused: Array<[string, Partial<Record<keyof CheckArguments, unknown>>, RegExp]> = [
    ['--shard 0/4', { shard: '0/4' }, /^--shard must be I\/N with 1 ≤ I ≤ N ≤ 10000 \(the I-th of N parts\), got '0\/4'$/],
    ['--shard 5/4', { shard: '5/4' }, /--shard must be I\/N .*, got '5\/4'/],
    ['--shard abc', { shard: 'abc' }, /--shard must be I\/N .*, got 'abc'/],
    ['--shard with --report', { shard: '1/4', report: 'report.json' }, /--shard writes a shard file, not reports: give --report, --junit or --html to 'rmt-assay merge'/],
    ['--shard-file without --shard', { 'shard-file': 'part.json' }, /^--shard-file goes with --shard I\/N$/],
    ['--workers 0', { workers: 0 }, /--workers/],
    ['--workers 2 with --record-to', { workers: 2, 'record-to': 'calls.json' }, /^--record-to records one sequence of calls: use it with --workers 1$/],
  ];
  for (const [what, values, message] of refused) {
    it(`${what}: a usage error (one line, exit code 2 from the CLI) naming the option`, async () => {
      const running = runCheckCommand(checkArguments(values), quietOut());
      await expect(running).rejects.toThrow(UsageError);
      await expect(running).rejects.toThrow(message);
    });
  }

  it('--shard 5/4 through the built CLI: exit code 2 and one line', () => {
    expectUsageError(runCli(bin(), ['check', '--shard', '5/4']), /^rmt-assay: --shard must be I\/N with 1 ≤ I ≤ N ≤ 10000 \(the I-th of N parts\), got '5\/4'\n$/);
  });
});
