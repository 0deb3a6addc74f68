import { expect } from 'vitest';
import type { CliRun } from './private-cli-build.js';

/** A stack frame as Node prints one: "    at fn (file:line:column)". */
const STACK_FRAME = /\n\s+at .*:\d+:\d+\)?/;

/** Bad usage as a user must meet it: exit code 2, one line on stderr naming the problem, no stack trace. */
export function expectUsageError(run: CliRun, message: RegExp): void {
  expect(run.stderr, `stdout: ${run.stdout}`).toMatch(/^rmt-assay: [^\n]+\n$/);
  expect(run.stderr).toMatch(message);
  expect(run.stderr).not.toMatch(STACK_FRAME);
  expect(run.code).toBe(2);
}

/** A run that finished as a run, not as a crash: no stack trace and no internal error on stderr. */
export function expectNoCrash(run: CliRun): void {
  expect(run.stderr).not.toMatch(STACK_FRAME);
  expect(run.stderr).not.toMatch(/internal error/);
}
