import { execFileSync } from 'node:child_process';
import { chmodSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrivateCli, PACKAGE_ROOT } from '../support/private-cli-build.js';

/**
 * The README's recipes for spreading a run over machines, run here as written: the CI matrix
 * workflow's `run:` lines (examples/ci/rmt-assay-shards.yml), one per matrix value and then the
 * merge, and the Slurm job array's scripts (examples/slurm/) with the variables Slurm would set.
 * `npx rmt-assay` resolves to the freshly built CLI through node_modules/.bin in a scratch
 * project, as it does in a lab repository that depends on rmt-assay. The merged report must be the
 * report of the same check run in one piece, byte for byte.
 */
let cli: ReturnType<typeof buildPrivateCli>;
let project: string;

/** Small options, so that four shards and a whole run take seconds. */
const CONFIG = {
  suite: ['semicircle', 'fluctuations'],
  size: [48],
  ladder: [32, 48, 64],
  samples: 64,
  budget: 0.1,
  ensemble: ['goe'],
  workers: 1,
};

function shell(command: string, env: NodeJS.ProcessEnv = {}): string {
  return execFileSync('sh', ['-c', command], {
    cwd: project,
    encoding: 'utf8',
    env: { ...process.env, ...env, CI: 'true', npm_config_offline: 'true', npm_config_update_notifier: 'false' },
  });
}

beforeAll(() => {
  cli = buildPrivateCli('shard-recipes');
  project = mkdtempSync(join(tmpdir(), 'rmt-assay-recipes-'));
  mkdirSync(join(project, 'node_modules', '.bin'), { recursive: true });
  const launcher = join(project, 'node_modules', '.bin', 'rmt-assay');
  writeFileSync(launcher, `#!/bin/sh\nexec "${process.execPath}" "${cli.bin}" "$@"\n`);
  chmodSync(launcher, 0o755);
  writeFileSync(join(project, 'rmt-assay.config.json'), JSON.stringify(CONFIG));
  shell('npx rmt-assay check --report whole.json --junit whole.xml > /dev/null');
});

afterAll(() => {
  cli?.remove();
  if (project !== undefined) rmSync(project, { recursive: true, force: true });
});

describe('the shard recipes of the README', () => {
  it('the CI matrix: each matrix job, then the merge job, reproduce the whole run', () => {
    const workflow = readFileSync(join(PACKAGE_ROOT, 'examples', 'ci', 'rmt-assay-shards.yml'), 'utf8');
    const commands = [...workflow.matchAll(/^\s*- run: (npx rmt-assay .*)$/gm)].map((m) => m[1]);
    const matrix = /shard: \[([\d, ]+)\]/.exec(workflow)![1].split(',').map((s) => s.trim());
    expect(commands).toHaveLength(2);
    expect(matrix).toEqual(['1', '2', '3', '4']);
    const [shardCommand, mergeCommand] = commands;
    for (const shard of matrix) shell(shardCommand.replaceAll('${{ matrix.shard }}', shard));
    const merged = shell(mergeCommand);
    expect(merged).toMatch(/\d+ passed, 0 failed/);
    expect(readFileSync(join(project, 'reports', 'rmt-assay.json'), 'utf8')).toBe(readFileSync(join(project, 'whole.json'), 'utf8'));
    expect(readFileSync(join(project, 'reports', 'rmt-assay.xml'), 'utf8')).toBe(readFileSync(join(project, 'whole.xml'), 'utf8'));
  });

  it('the Slurm job array: three array tasks, then the merge job, reproduce the whole run', () => {
    rmSync(join(project, 'shards'), { recursive: true, force: true });
    rmSync(join(project, 'reports'), { recursive: true, force: true });
    mkdirSync(join(project, 'shards'));
    const scripts = join(PACKAGE_ROOT, 'examples', 'slurm');
    for (const task of ['1', '2', '3']) {
      shell(`bash ${join(scripts, 'rmt-assay-shard.sbatch')}`, { SLURM_ARRAY_TASK_ID: task, SLURM_ARRAY_TASK_COUNT: '3', SLURM_CPUS_PER_TASK: '1' });
    }
    shell(`bash ${join(scripts, 'rmt-assay-merge.sbatch')}`);
    expect(readFileSync(join(project, 'reports', 'rmt-assay.json'), 'utf8')).toBe(readFileSync(join(project, 'whole.json'), 'utf8'));
  });
});
