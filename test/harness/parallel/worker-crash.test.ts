import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { expectNoCrash } from '../../support/cli-expectations.js';
import { privateCliForFile, runCli } from '../../support/private-cli-build.js';

/**
 * A worker thread that dies while it runs a unit (its implementation ends the thread, or throws
 * where nothing can catch it): the run goes on, the group whose unit was running is reported as
 * faulted, every other check as usual, exit code 1; no hang, no stack trace.
 */
const { bin, folder } = privateCliForFile('worker-crash');
const fixtures = join(import.meta.dirname, 'fixtures');

interface ReportedCheck {
  readonly id: string;
  readonly state: string;
  readonly reason?: string;
}

/** The crashing kernels crash at N = 64: with --size 48, a size of the ladder only (the Kolmogorov-decay group's last sample set). */
function runKernel(kernel: string, size = '48'): { code: number | null; stdout: string; checks: ReportedCheck[] } {
  const report = join(folder, `${kernel}-${size}.json`);
  const run = runCli(bin(), [
    'check',
    '--module',
    join(fixtures, kernel),
    '--suite',
    'semicircle',
    '--size',
    size,
    '--ladder',
    '32,48,64',
    '--samples',
    '64',
    '--ensemble',
    'goe',
    '--workers',
    '2',
    '--report',
    report,
  ]);
  expectNoCrash(run);
  expect(run.stderr).toBe('');
  const result = JSON.parse(readFileSync(report, 'utf8')) as { suites: Array<{ checks: ReportedCheck[] }> };
  return { code: run.code, stdout: run.stdout, checks: result.suites.flatMap((s) => s.checks) };
}

function expectOnlyTheCrashedGroupFaulted(checks: readonly ReportedCheck[], reason: RegExp): void {
  const crashed = checks.filter((c) => c.id.startsWith('semicircle/kolmogorov-decay/'));
  const others = checks.filter((c) => !c.id.startsWith('semicircle/kolmogorov-decay/'));
  expect(crashed.length).toBeGreaterThan(0);
  for (const check of crashed) {
    expect(check.state, check.id).toBe('fault');
    expect(check.reason).toMatch(reason);
  }
  expect(others.length).toBeGreaterThan(5);
  expect(others.filter((c) => c.state !== 'pass').map((c) => `${c.id}: ${c.state} ${c.reason ?? ''}`)).toEqual([]);
}

describe('check --workers 2 with an implementation that kills its worker thread', () => {
  it('faults the group of a sampler that calls process.exit, and finishes the run with exit code 1', () => {
    const { code, stdout, checks } = runKernel('exiting-sampler-kernel.mjs');
    expect(code).toBe(1);
    expectOnlyTheCrashedGroupFaulted(checks, /^worker thread exited with code 7$/);
    expect(stdout).toMatch(/\d+ passed, 0 failed, 0 skipped, [1-9]\d* faults?/);
  });

  it('faults every group when the sampler throws outside its promise in each of them (more crashes than threads), and still reports', () => {
    // At --size 64 every group samples at N = 64: the threads die more times than there are threads.
    const { code, checks } = runKernel('uncaught-throw-sampler-kernel.mjs', '64');
    expect(code).toBe(1);
    const groups = new Set(checks.map((c) => c.id.split('/').slice(0, 2).join('/')));
    expect([...groups].sort()).toEqual(['semicircle/even-moments', 'semicircle/kolmogorov-decay', 'semicircle/stieltjes-mean']);
    for (const check of checks) {
      expect(check.state, check.id).toBe('fault');
      expect(check.reason).toBe('worker thread stopped: sampler state corrupted');
    }
  });
});
