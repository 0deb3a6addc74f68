import { beforeAll, describe, expect, it } from 'vitest';
import { isInteractiveTerminal } from '../../../harness/reporters/interactive-terminal.js';
import { formatTerminalSummary, terminalReporter } from '../../../harness/reporters/terminal-reporter.js';
import { runChecks } from '../../../harness/run-checks.js';
import type { RunResult } from '../../../harness/run-result.js';
import { semicircleSuite } from '../../../properties/semicircle.js';
import { mutantAdapter, reference } from '../../support/mutant-adapter.js';
import { testSettings } from '../../support/run-settings-for-tests.js';
import { HOSTILE, hostileRun } from './support/report-runs.js';

let scaled: RunResult;
let hostile: RunResult;

/** A sampler 3 % too wide, one Stieltjes check at a fixed seed: one failure, always the same. */
function scaledSamplerRun(): Promise<RunResult> {
  const adapter = mutantAdapter(
    'scale-1.03 sampler',
    { sample: async (e, n, s, c) => (await reference.sample(e, n, s, c)).map((m) => ({ ...m, data: m.data.map((x) => x * 1.03) })) },
    ['sample', 'resolvent_trace'],
  );
  const settings = testSettings({ sizes: [60], ladder: [40, 60, 90], samples: 100, seed: 7 });
  const first = semicircleSuite.plan(settings)[0].checks[0].id;
  return runChecks(adapter, { ...settings, only: [first] }, [semicircleSuite]);
}

beforeAll(async () => {
  [scaled, hostile] = await Promise.all([scaledSamplerRun(), hostileRun()]);
});

/** A sink that keeps what is written. */
function recorder() {
  const chunks: string[] = [];
  return { sink: { write: (text: string) => void chunks.push(text) }, text: () => chunks.join('') };
}

describe('terminal summary', () => {
  it('prints a failure with observed, expected, error bar, allowance and the replay command (snapshot at a fixed seed)', () => {
    expect(scaled.counts).toEqual({ pass: 0, fail: 1, skipped: 0, fault: 0 });
    const summary = formatTerminalSummary(scaled, { interactive: false, verbose: false });
    // Up to the counts; the caveats after them are the model's own text.
    const failure = summary.slice(0, summary.indexOf('What a pass means'));
    expect(failure).toMatchSnapshot();
  });

  it('uses colour only when interactive', () => {
    expect(formatTerminalSummary(scaled, { interactive: true, verbose: false })).toContain('\u001b[31m');
    expect(formatTerminalSummary(scaled, { interactive: false, verbose: false })).not.toContain('\u001b');
  });

  it('lists failures, then faults, then skips grouped by reason, then the counts', () => {
    const summary = formatTerminalSummary(hostile, { interactive: false, verbose: false });
    const firstFault = summary.indexOf('FAULT  ');
    expect(summary.indexOf('FAILED ')).toBeLessThan(firstFault);
    expect(firstFault).toBeLessThan(summary.indexOf('SKIPPED'));
    expect(summary).toContain(`SKIPPED ${hostile.counts.skipped} checks: ${HOSTILE.notOffered}`);
    const c = hostile.counts;
    expect(summary).toContain(`${c.pass} passed, ${c.fail} failed, ${c.skipped} skipped, ${c.fault} faults`);
  });

  it('shows control characters from an implementation as \\uXXXX, so they cannot drive the terminal', () => {
    const summary = formatTerminalSummary(hostile, { interactive: false, verbose: false });
    expect(summary).toContain(`eigenvalues: ${HOSTILE.fault.replace('\u0001', '\\u0001')}`);
    expect(summary).not.toContain('\u0001');
  });
});

describe('terminal progress', () => {
  /** A clock that advances `step` milliseconds each time it is read: the estimates are pure arithmetic. */
  const steadyClock = (step: number) => {
    let t = 0;
    return () => (t += step);
  };
  const start = { adapter: { name: 'x', version: '1', kind: 'module', capabilities: [] }, totalChecks: 4 } as const;
  const outcome = {} as Parameters<NonNullable<ReturnType<typeof terminalReporter>['onCheckFinished']>>[0];

  it('draws a bar with the estimated time left on a TTY', () => {
    const out = recorder();
    const reporter = terminalReporter(out.sink, { interactive: true, verbose: false }, steadyClock(50_000));
    reporter.onRunStart!(start);
    reporter.onCheckFinished!(outcome, 1, 4);
    // 50 s for one check of four: about 150 s left.
    expect(out.text()).toContain('\r[########......................] 1/4 checks, about 2 min 30 s left');
    for (const k of [2, 3, 4]) reporter.onCheckFinished!(outcome, k, 4);
    expect(out.text()).toContain('4/4 checks, about 0 s left');
    expect(out.text().endsWith('\n')).toBe(true);
  });

  it('writes plain lines, a few per run, without colour or carriage returns, elsewhere (CI, a pipe)', () => {
    const out = recorder();
    const reporter = terminalReporter(out.sink, { interactive: false, verbose: false }, steadyClock(1000));
    reporter.onRunStart!(start);
    for (const k of [1, 2, 3, 4]) reporter.onCheckFinished!(outcome, k, 4);
    expect(out.text().split('\n').filter((l) => l.includes('checks done'))).toEqual([
      '1/4 checks done (1.0 s)',
      '2/4 checks done (2.0 s)',
      '3/4 checks done (3.0 s)',
      '4/4 checks done (4.0 s)',
    ]);
    expect(out.text()).not.toMatch(/[\r\u001b]/);
  });

  it('is interactive only on a TTY outside CI', () => {
    expect(isInteractiveTerminal({ isTTY: true }, {})).toBe(true);
    expect(isInteractiveTerminal({ isTTY: true }, { CI: 'true' })).toBe(false);
    expect(isInteractiveTerminal({ isTTY: true }, { CI: '1' })).toBe(false);
    expect(isInteractiveTerminal({ isTTY: true }, { CI: 'false' })).toBe(true);
    expect(isInteractiveTerminal({ isTTY: true }, { CI: '' })).toBe(true);
    expect(isInteractiveTerminal({ isTTY: false }, {})).toBe(false);
    expect(isInteractiveTerminal({}, {})).toBe(false);
  });
});
