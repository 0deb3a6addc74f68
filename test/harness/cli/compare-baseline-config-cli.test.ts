import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrivateCli, PACKAGE_ROOT, runCli, type CliRun } from '../../support/private-cli-build.js';

/** compare, baseline and the config file as a user meets them: the built bin, in a child process. */
let build: ReturnType<typeof buildPrivateCli>;
const cli = (...args: string[]): CliRun => runCli(build.bin, args);
const folder = mkdtempSync(join(tmpdir(), 'rmt-assay-cli-'));

/** The demo kernel handles real symmetric matrices only: GOE. */
const quick = ['--size', '24', '--samples', '60', '--ensemble', 'goe', '--seed', '4'];
const demo = (release: string) => `examples/demo/lab-kernel/spectral-kernel-${release}.mjs`;

beforeAll(() => {
  build = buildPrivateCli('compare-baseline-cli');
}, 120_000);
afterAll(() => build?.remove());

describe('rmt-assay compare', () => {
  it('exits 0 and says nothing distinguishes a correct release from the reference engine', () => {
    const report = join(folder, 'same.json');
    const { code, stdout } = cli('compare', '--left', `module:${demo('2.0')}`, '--right', 'reference', ...quick, '--report', report);
    expect(code).toBe(0);
    expect(stdout).toContain('Nothing distinguishes the two');
    expect(stdout).toMatch(/eigenvalues\s+goe\s+24\s+3\s+\S+\s+1\d\.\d/);
    const parsed = JSON.parse(readFileSync(report, 'utf8'));
    expect(parsed.comparison.left.specification).toBe(`module:${demo('2.0')}`);
    expect(parsed.comparison.distinguishing).toEqual([]);
  });

  it('exits 1 for the release with the N − 1 regression, naming the checks that tell them apart with replay commands', () => {
    const { code, stdout } = cli('compare', '--left', `module:${demo('2.1')}`, '--right', `module:${demo('2.0')}`, ...quick);
    expect(code).toBe(1);
    expect(stdout).toMatch(/Distinguished by \d+ checks?: .*compare\/agreement\/resolvent-trace\/goe\/N=24/);
    // N/(N − 1) − 1 = 1/23: a relative difference of 0.0435, 1.4 digits.
    expect(stdout).toMatch(/resolvent_trace\s+goe\s+24\s+3\s+0\.0435\s+1\.4\s+.*DIFFER/);
    expect(stdout).toContain(`replay     npx rmt-assay compare --left module:${demo('2.1')} --right module:${demo('2.0')} --size 24`);
  });

  it('refuses a missing side with one line and exit code 2', () => {
    const { code, stderr } = cli('compare', '--left', 'reference');
    expect(code).toBe(2);
    expect(stderr.trim()).toMatch(/^rmt-assay: compare needs --left and --right, each reference, module:FILE, exec:COMMAND or recorded:FILE$/);
  });
});

describe('rmt-assay baseline record and check --baseline', () => {
  const file = join(folder, 'baselines', 'kernel-2.0.json');

  it('pins release 2.0: the file names the implementation and how it was selected', () => {
    const recorded = cli('baseline', 'record', '--module', demo('2.0'), '--out', file, ...quick);
    expect(recorded.code).toBe(0);
    expect(recorded.stdout).toMatch(/demo lab spectral kernel 2\.0 \(module\) · 6 per-matrix outputs, 1 sampled statistics sets/);
    expect(JSON.parse(readFileSync(file, 'utf8')).adapterArguments).toBe(`--module ${demo('2.0')}`);
  });

  it('passes release 2.0 against its baseline, the baseline checks beside the suites asked for', () => {
    const report = join(folder, 'with-suites.json');
    const same = cli('check', '--module', demo('2.0'), '--baseline', file, '--suite', 'identities', '--size', '24', '--ensemble', 'goe', '--report', report);
    expect(same.stdout).toMatch(/\d+ passed, 0 failed/);
    expect(same.code).toBe(0);
    const parsed = JSON.parse(readFileSync(report, 'utf8'));
    expect(parsed.suites.map((s: { name: string }) => s.name)).toEqual(['identities', 'baseline']);
  });

  it('catches release 2.1 in the baseline checks, with replay commands that carry the baseline', () => {
    const changed = cli('check', '--module', demo('2.1'), '--baseline', file, '--suite', 'baseline');
    expect(changed.code).toBe(1);
    expect(changed.stdout).toContain('FAILED  baseline/resolvent-trace/goe/N=24');
    expect(changed.stdout).not.toContain('FAILED  baseline/eigenvalues');
    expect(changed.stdout).toContain(`replay     npx rmt-assay check --module ${demo('2.1')} --baseline ${file} --suite baseline`);
  });
});

describe('rmt-assay check with a config file', () => {
  const cwd = mkdtempSync(join(tmpdir(), 'rmt-assay-project-'));
  writeFileSync(
    join(cwd, 'rmt-assay.config.json'),
    JSON.stringify({ module: join(PACKAGE_ROOT, demo('2.0')), suite: ['identities'], size: [16], ensemble: 'goe', seed: 3 }, null, 2),
  );

  it('prints the resolved configuration, flags over the file over defaults, and exits 0', () => {
    const { code, stdout, stderr } = runCli(build.bin, ['check', '--print-config', '--seed', '8'], cwd);
    expect(code).toBe(0);
    expect(JSON.parse(stdout)).toMatchObject({ module: join(PACKAGE_ROOT, demo('2.0')), suite: ['identities'], size: [16], seed: 8, samples: 300 });
    expect(stderr).toMatch(/flags: seed; config file rmt-assay\.config\.json: module, suite, size, ensemble/);
  });

  it('runs what the file says, with a flag naming another implementation', () => {
    const { code, stdout } = runCli(build.bin, ['check', '--module', join(PACKAGE_ROOT, demo('2.1'))], cwd);
    expect(code).toBe(1);
    expect(stdout).toContain('demo lab spectral kernel 2.1');
    expect(stdout).toContain('FAILED  identities/agreement/resolvent-trace');
  });
});

describe('the built package’s main export', () => {
  it('loads in plain Node and runs a conformance assertion, as a lab’s test suite would import it', () => {
    const index = join(dirname(build.bin), '..', 'index.js');
    const script =
      `const m = await import(${JSON.stringify(pathToFileURL(index).href)});` +
      `const r = await m.expectConformance(new m.ReferenceAdapter(), { suites: ['identities'], sizes: [12], ensembles: ['goe'] });` +
      `process.stdout.write(JSON.stringify(r.counts));`;
    const run = spawnSync(process.execPath, ['--input-type=module', '-e', script], { cwd: PACKAGE_ROOT, encoding: 'utf8' });
    expect(run.stderr).toBe('');
    expect(JSON.parse(run.stdout)).toMatchObject({ fail: 0, fault: 0 });
  });
});
