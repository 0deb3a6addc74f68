import { beforeAll, describe, expect, it } from 'vitest';
import { formatJunitXml, junitCaseName } from '../../../harness/reporters/junit-reporter.js';
import type { RunResult } from '../../../harness/run-result.js';
import type { CheckVerdict } from '../../../harness/verdict.js';
import { junitProblems, parseJunitXml } from './support/junit-essentials.js';
import { HOSTILE, hostileRun, referenceRun } from './support/report-runs.js';

type Node = Record<string, any>;

let passing: RunResult;
let hostile: RunResult;

beforeAll(async () => {
  [passing, hostile] = await Promise.all([referenceRun(), hostileRun()]);
});

/** The first check of the hostile run in `state`, and its testcase as the parser reads it back. */
function firstCase(state: CheckVerdict['state']): { verdict: CheckVerdict; testcase: Node; suite: Node } {
  const root = parseJunitXml(formatJunitXml(hostile)).testsuites as Node;
  for (const [i, suite] of hostile.suites.entries()) {
    const k = suite.checks.findIndex((v) => v.state === state);
    if (k >= 0) return { verdict: suite.checks[k], testcase: root.testsuite[i].testcase[k], suite: root.testsuite[i] };
  }
  throw new Error(`no ${state} check in the hostile run`);
}

describe('JUnit XML report', () => {
  it('meets the essentials of the common JUnit XML schema, for a passing run and for one with every state', () => {
    expect(junitProblems(formatJunitXml(passing))).toEqual([]);
    expect(junitProblems(formatJunitXml(hostile))).toEqual([]);
    expect([hostile.counts.fail, hostile.counts.fault, hostile.counts.skipped].every((n) => n > 0)).toBe(true);
  });

  it('holds one testsuite per suite and one testcase per check, with the model\'s counts', () => {
    const root = parseJunitXml(formatJunitXml(hostile)).testsuites as Node;
    expect(root['@_tests']).toBe(String(Object.values(hostile.counts).reduce((a, b) => a + b, 0)));
    expect(root['@_failures']).toBe(String(hostile.counts.fail));
    expect(root['@_errors']).toBe(String(hostile.counts.fault));
    expect(root['@_skipped']).toBe(String(hostile.counts.skipped));
    expect(root.testsuite.map((s: Node) => s['@_name'])).toEqual(hostile.suites.map((s) => s.name));
    hostile.suites.forEach((suite, i) => {
      const cases: Node[] = root.testsuite[i].testcase;
      expect(cases.map((c) => c['@_classname'])).toEqual(suite.checks.map((v) => v.suite));
      expect(cases.map((c) => c['@_name'])).toEqual(suite.checks.map(junitCaseName));
    });
  });

  it('names a check with its parameters', () => {
    const check = passing.suites[0].checks[0];
    const name = junitCaseName(check);
    expect(name.startsWith(check.id)).toBe(true);
    for (const [key, value] of Object.entries(check.parameters)) expect(name).toContain(`${key}=${value}`);
  });

  it('gives a failed check a failure with observed, expected and error bar, and its replay command', () => {
    const { verdict: failed, testcase } = firstCase('fail');
    const [failure] = testcase.failure;
    expect(failure['@_type']).toBe(failed.evidence?.kind);
    expect(failure['@_message']).toMatch(/^observed \S+, expected \S+, error bar ±\S+, allowance/);
    expect(failure['#text']).toContain(`replay     ${failed.replay}`);
    expect(failure['#text']).toContain(failed.title);
  });

  it('gives an adapter fault an error element whose message, markup and all, reads back exactly', () => {
    const { testcase, suite } = firstCase('fault');
    const [error] = testcase.error;
    expect(error['@_type']).toBe('implementation-error');
    // XML cannot hold U+0001 at all: it is shown as \u0001, everything else is kept.
    expect(error['@_message']).toBe(`eigenvalues: ${HOSTILE.fault.replace('\u0001', '\\u0001')}`);
    expect(suite['system-err']).toBe(HOSTILE.log);
  });

  it('gives a skipped check a skipped element with its reason', () => {
    const { verdict, testcase } = firstCase('skipped');
    expect(testcase.skipped[0]['@_message']).toBe(verdict.reason);
    expect(verdict.reason).toBe(HOSTILE.notOffered);
  });

  it('states the run\'s seed, level and versions as properties of every testsuite', () => {
    const root = parseJunitXml(formatJunitXml(hostile)).testsuites as Node;
    for (const suite of root.testsuite) {
      const properties = Object.fromEntries(suite.properties.property.map((p: Node) => [p['@_name'], p['@_value']]));
      expect(properties).toMatchObject({
        seed: String(hostile.settings.seed),
        level: String(hostile.falseAlarmControl.level),
        [`${hostile.tool.name}.version`]: hostile.tool.version,
        'adapter.name': HOSTILE.name,
        'adapter.version': HOSTILE.version,
      });
    }
  });

  it('is caught by the essentials check when a count is wrong or a testcase has no name (the check is not vacuous)', () => {
    const xml = formatJunitXml(hostile);
    const miscounted = xml.replace(/(<testsuite name="semicircle" tests=")(\d+)/, (_m, head, n) => `${head}${Number(n) + 1}`);
    expect(junitProblems(miscounted)).toEqual([expect.stringMatching(/testsuites?\[0\]: tests="\d+" but it holds \d+/)]);
    const unnamed = xml.replace(/<testcase classname="semicircle" name="[^"]*"/, '<testcase classname="semicircle"');
    expect(junitProblems(unnamed)).toEqual([expect.stringMatching(/needs a non-empty name/)]);
    expect(junitProblems(xml.replace('</testsuites>', ''))[0]).toMatch(/not well-formed/);
  });
});
