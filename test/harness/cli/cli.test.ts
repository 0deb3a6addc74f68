import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

/** The CLI as a user runs it: the built bin, in a child process. Built once for this file. */
const root = join(import.meta.dirname, '..', '..', '..');
const bin = join(root, 'dist', 'harness', 'cli', 'main.js');
const fixtures = join(import.meta.dirname, 'fixtures');

function cli(...args: string[]) {
  const run = spawnSync(process.execPath, [bin, ...args], { cwd: root, encoding: 'utf8', env: { ...process.env, CI: 'true' } });
  return { code: run.status, stdout: run.stdout, stderr: run.stderr };
}

const quick = ['--size', '40', '--ladder', '32,48,64', '--samples', '40', '--ensemble', 'goe'];

beforeAll(() => {
  execFileSync(process.execPath, [join(root, 'node_modules', 'typescript', 'bin', 'tsc'), '-p', join(root, 'tsconfig.json')], { stdio: 'inherit' });
}, 120_000);

describe('rmt-assay CLI', () => {
  it('lists every check option in --help', () => {
    const { code, stdout } = cli('check', '--help');
    expect(code).toBe(0);
    for (const option of ['--module', '--exec', '--suite', '--size', '--samples', '--seed', '--alpha', '--report', '--only', '--case']) {
      expect(stdout).toContain(option);
    }
  });

  const badUsage: Array<[string, string[], RegExp]> = [
    ['an unknown option', ['check', '--sizes', '200'], /Unknown argument|sizes/],
    ['N below 2', ['check', '--size', '1'], /--size/],
    ['zero samples', ['check', '--samples', '0'], /--samples/],
    ['alpha outside (0, 1)', ['check', '--alpha', '1.5'], /--alpha/],
    ['an unknown suite', ['check', '--suite', 'nonsense'], /--suite/],
    ['a missing module', ['check', '--module', 'no/such/kernel.mjs'], /module not found/],
    ['a module that does not parse', ['check', '--module', join(fixtures, 'syntax-error-kernel.mjs')], /cannot load module/],
    ['a module that exports nothing usable', ['check', '--module', join(fixtures, 'empty-kernel.mjs')], /exports none of/],
    ['a program that cannot start', ['check', '--exec', 'no-such-program-rmt-assay', '--timeout', '5'], /cannot run/],
    ['both --module and --exec', ['check', '--module', 'a.mjs', '--exec', 'b'], /not two/],
    ['no command', [], /name a command/],
  ];
  for (const [what, args, message] of badUsage) {
    it(`refuses ${what} with one clear line and exit code 2`, () => {
      const { code, stderr, stdout } = cli(...args);
      expect(code).toBe(2);
      const text = (stderr + stdout).trim();
      expect(text).toMatch(message);
      expect(stderr).not.toMatch(/\n\s+at .*\(.*:\d+:\d+\)/);
    });
  }

  it('prints reference values with their sources', () => {
    const { code, stdout } = cli('reference', 'stieltjes', '0+1i');
    expect(code).toBe(0);
    // m(i) = i(√5 − 1)/2 = 0.6180339887498949i: the golden-ratio conjugate (closed form of
    // (−z + √(z² − 4))/2 at z = i; common practice).
    expect(stdout).toMatch(/m\(0\+1i\) = 0\+0\.618033988749894\di/);
    expect(stdout).toContain('Wigner 1955');
  });

  it('exits 0 and writes a JSON report when every check passes', () => {
    const report = join(mkdtempSync(join(tmpdir(), 'rmt-assay-')), 'report.json');
    const { code, stdout } = cli('check', ...quick, '--report', report);
    expect(code).toBe(0);
    expect(stdout).toMatch(/\d+ passed, 0 failed/);
    const parsed = JSON.parse(readFileSync(report, 'utf8'));
    expect(parsed.counts.fail).toBe(0);
    expect(parsed.falseAlarmControl).toMatchObject({ method: 'holm', level: 0.001 });
  });

  it('exits 1 with failing verdicts and their replay commands for a broken module', () => {
    const kernel = join(fixtures, 'off-by-trace-kernel.mjs');
    const { code, stdout } = cli('check', '--module', kernel, ...quick);
    expect(code).toBe(1);
    expect(stdout).toContain('FAILED');
    expect(stdout).toContain('replay     npx rmt-assay check --module');
  });
});
