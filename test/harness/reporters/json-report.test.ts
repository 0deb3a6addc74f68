import { beforeAll, describe, expect, it } from 'vitest';
import { ALL_CAPABILITIES } from '../../../adapters/adapter.js';
import schema from '../../../harness/reporters/schemas/run-result.schema.json' with { type: 'json' };
import { resultToJson } from '../../../harness/reporters/json-reporter.js';
import { validateRunResultJson } from '../../../harness/reporters/validate-run-result-json.js';
import type { RunResult } from '../../../harness/run-result.js';
import type { CheckVerdict } from '../../../harness/verdict.js';
import { HOSTILE, hostileRun, referenceRun } from './support/report-runs.js';

let passing: RunResult;
let hostile: RunResult;

beforeAll(async () => {
  [passing, hostile] = await Promise.all([referenceRun(), hostileRun()]);
});

/** The report as a reader gets it: written, then parsed. */
const reportOf = (result: RunResult) => JSON.parse(resultToJson(result));

/** A copy of `result` whose first check is replaced by `edit(check)`. */
function withFirstCheck(result: RunResult, edit: (v: CheckVerdict) => object): object {
  const [first, ...rest] = result.suites;
  return { ...result, suites: [{ ...first, checks: [edit(first.checks[0]), ...first.checks.slice(1)] }, ...rest] };
}

describe('JSON report', () => {
  it('validates against the published schema for a passing run carrying all four kinds of exhibit', () => {
    const report = reportOf(passing);
    expect(validateRunResultJson(report)).toEqual([]);
    const kinds = new Set(report.suites.flatMap((s: RunResult['suites'][number]) => s.checks.map((c) => c.exhibit?.kind)).filter(Boolean));
    expect([...kinds].sort()).toEqual(['log-log-decay', 'normal-quantiles', 'observed-vs-predicted', 'spectral-histogram']);
  });

  it('validates for a run with failures, faults and skips, and keeps untrusted strings exactly', () => {
    const report = reportOf(hostile);
    expect(validateRunResultJson(report)).toEqual([]);
    expect(report.adapter.name).toBe(HOSTILE.name);
    expect(report.adapterLog).toBe(HOSTILE.log);
    expect(report.counts).toEqual(hostile.counts);
    expect(report.suites.flatMap((s: RunResult['suites'][number]) => s.checks).find((c: CheckVerdict) => c.state === 'fault').reason).toBe(
      `eigenvalues: ${HOSTILE.fault}`,
    );
  });

  it('writes −0, NaN and ±Infinity as strings the schema admits wherever a number may be non-finite', () => {
    const odd = withFirstCheck(passing, (v) => ({
      ...v,
      adjustedPValue: NaN,
      evidence: { ...v.evidence!, observed: -0, zScore: Infinity, ...(v.evidence?.kind === 'statistical' ? { standardError: { re: -Infinity, im: NaN } } : {}) },
    }));
    const text = resultToJson(odd as RunResult);
    const check = JSON.parse(text).suites[0].checks[0];
    expect(check.adjustedPValue).toBe('NaN');
    expect(check.evidence.observed).toBe('-0');
    expect(check.evidence.zScore).toBe('Infinity');
    expect(validateRunResultJson(JSON.parse(text))).toEqual([]);
  });

  it('rejects what is not a report, naming the JSON path of each problem', () => {
    const report = reportOf(passing);
    const badState = withFirstCheck(report, (v) => ({ ...v, state: 'passed' }));
    expect(validateRunResultJson(badState)).toContainEqual({
      path: '/suites/0/checks/0/state',
      message: 'must be equal to one of the allowed values ("pass", "fail", "skipped", "fault")',
    });
    const noEvidence = withFirstCheck(report, ({ evidence: _evidence, ...v }) => v);
    expect(validateRunResultJson(noEvidence)).toContainEqual({ path: '/suites/0/checks/0', message: "must have required property 'evidence'" });
    const faultWithoutKind = withFirstCheck(report, ({ evidence: _evidence, ...v }) => ({ ...v, state: 'fault', reason: 'crashed' }));
    expect(validateRunResultJson(faultWithoutKind).map((p) => p.message)).toContain("must have required property 'faultKind'");
    const lowerCaseNaN = withFirstCheck(report, (v) => ({ ...v, adjustedPValue: 'nan' }));
    expect(validateRunResultJson(lowerCaseNaN).map((p) => p.path)).toContain('/suites/0/checks/0/adjustedPValue');
    const extra = { ...report, settings: { ...report.settings, colour: 'blue' } };
    expect(validateRunResultJson(extra)).toContainEqual({ path: '/settings', message: "must NOT have additional properties ('colour')" });
    expect(validateRunResultJson({ ...report, formatVersion: 2 })).toContainEqual({ path: '/formatVersion', message: 'must be equal to constant (1)' });
    expect(validateRunResultJson('not a report')).toEqual([{ path: '/', message: 'must be object' }]);
  });

  it('lists exactly the capabilities an adapter can declare', () => {
    expect(schema.definitions.capability.enum).toEqual([...ALL_CAPABILITIES]);
  });
});
