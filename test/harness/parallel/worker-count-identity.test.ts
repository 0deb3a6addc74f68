import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { expectNoCrash } from '../../support/cli-expectations.js';
import { privateCliForFile, runCli } from '../../support/private-cli-build.js';
import { hasNumpy, numpyMissingReason } from '../../support/python-availability.js';

/**
 * `check --workers N` through the built CLI (worker threads load the compiled unit worker): the
 * JSON report is the same byte for byte whatever N, for the built-in engine, a program (--exec)
 * and a module (--module), each thread with its own adapter.
 */
const { bin, folder } = privateCliForFile('worker-count-identity');

/** Small sizes: every statistical group still has two blocks of samples per set, most have more. */
const SMALL = ['--size', '48', '--ladder', '32,48,64', '--samples', '64'];

/** Runs `check` with each worker count and returns the exit codes and the JSON reports' text. */
function runWithWorkers(name: string, args: readonly string[], counts: readonly number[]): Array<{ workers: number; code: number | null; report: string }> {
  return counts.map((workers) => {
    const file = join(folder, `${name}-workers-${workers}.json`);
    const run = runCli(bin(), ['check', ...args, '--workers', String(workers), '--report', file]);
    expectNoCrash(run);
    return { workers, code: run.code, report: readFileSync(file, 'utf8') };
  });
}

function expectSameReports(runs: ReadonlyArray<{ workers: number; code: number | null; report: string }>): void {
  const [first, ...others] = runs;
  for (const other of others) {
    expect(other.code, `exit code with --workers ${other.workers}`).toBe(first.code);
    // Byte for byte: a difference in the last bit of one p-value would show here.
    expect(other.report === first.report, `the report with --workers ${other.workers} differs from --workers ${first.workers}`).toBe(true);
  }
}

/** Check states in a report, to be sure the runs compared did real work. */
function statesOf(report: string): Record<string, number> {
  return (JSON.parse(report) as { counts: Record<string, number> }).counts;
}

describe('check --workers N gives the same report whatever N', () => {
  it('for the built-in engine on every suite (GOE and GUE), with 1, 2 and 3 workers', () => {
    const runs = runWithWorkers('reference', ['--suite', 'semicircle,fluctuations,identities', ...SMALL, '--budget', '0.1', '--ensemble', 'goe,gue'], [1, 2, 3]);
    expectSameReports(runs);
    expect(runs[0].code).toBe(0);
    const counts = statesOf(runs[0].report);
    expect(counts).toMatchObject({ fail: 0, fault: 0 });
    expect(counts.pass).toBeGreaterThan(100);
    const result = JSON.parse(runs[0].report) as { falseAlarmControl: { statisticalChecks: number } };
    expect(result.falseAlarmControl.statisticalChecks).toBeGreaterThan(50);
  });

  it('for a JavaScript module with its own sampler (the demo kernel), with 1 and 2 workers', () => {
    const runs = runWithWorkers('module', ['--module', 'examples/demo/lab-kernel/spectral-kernel-2.0.mjs', '--suite', 'semicircle', ...SMALL, '--ensemble', 'goe'], [1, 2]);
    expectSameReports(runs);
    const result = JSON.parse(runs[0].report) as { adapter: { kind: string; capabilities: string[] }; counts: Record<string, number> };
    expect(result.adapter.kind).toBe('module');
    expect(result.adapter.capabilities).toContain('sample');
    expect(result.counts.pass).toBeGreaterThan(10);
  });

  if (!hasNumpy) console.warn(`skipping the --exec worker-count run: ${numpyMissingReason}`);
  it.skipIf(!hasNumpy)('for the numpy example program (--exec), one program per worker, with 1 and 2 workers', () => {
    const runs = runWithWorkers('python', ['--exec', 'python3 examples/python/lab_kernel.py', '--suite', 'semicircle', ...SMALL, '--ensemble', 'goe'], [1, 2]);
    expectSameReports(runs);
    expect(runs[0].code).toBe(0);
    const result = JSON.parse(runs[0].report) as { adapter: { kind: string }; counts: Record<string, number> };
    expect(result.adapter.kind).toBe('process');
    expect(result.counts).toMatchObject({ fail: 0, fault: 0 });
    expect(result.counts.pass).toBeGreaterThan(10);
  });
});
