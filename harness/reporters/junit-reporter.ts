import type { RunResult, SuiteResult } from '../run-result.js';
import type { CheckVerdict } from '../verdict.js';
import { evidenceLines } from './evidence-lines.js';
import { shortNumber, shortQuantity } from './format-quantity.js';
import type { Reporter, TextSink } from './reporter.js';
import { xmlAttribute, xmlText } from './xml-text.js';

/** The check as a test case name: its id, then its parameters (`id [key=value, …]`). */
export function junitCaseName(v: CheckVerdict): string {
  const parameters = Object.entries(v.parameters).map(([key, value]) => `${key}=${value}`);
  return parameters.length === 0 ? v.id : `${v.id} [${parameters.join(', ')}]`;
}

function element(name: string, attributes: Readonly<Record<string, string | number>>, content?: string): string {
  const attributeText = Object.entries(attributes)
    .map(([key, value]) => ` ${key}="${xmlAttribute(String(value))}"`)
    .join('');
  return content === undefined ? `<${name}${attributeText}/>` : `<${name}${attributeText}>${content}</${name}>`;
}

/** The one-line message of a failure: observed, expected, error bar (or ratio and threshold). */
function failureMessage(v: CheckVerdict): string {
  const e = v.evidence;
  if (e === undefined) return v.title;
  if (e.kind === 'statistical') {
    return `observed ${shortQuantity(e.observed, 8)}, expected ${shortQuantity(e.expected, 8)}, error bar ±${shortQuantity(e.standardError, 3)}, allowance ${shortNumber(e.allowance)}; Holm-adjusted p = ${shortNumber(v.adjustedPValue ?? NaN)}`;
  }
  return `observed ${shortQuantity(e.observed, 12)}, expected ${shortQuantity(e.expected, 12)}, ratio ${shortNumber(e.ratio)} against threshold ${e.threshold}`;
}

function testCase(v: CheckVerdict): string {
  const attributes = { classname: v.suite, name: junitCaseName(v) };
  switch (v.state) {
    case 'pass':
      return element('testcase', attributes);
    case 'skipped':
      return element('testcase', attributes, element('skipped', { message: v.reason ?? '' }));
    case 'fault': {
      const body = [v.reason ?? '', `replay     ${v.replay}`].join('\n');
      return element('testcase', attributes, element('error', { type: v.faultKind ?? 'fault', message: v.reason ?? '' }, xmlText(body)));
    }
    case 'fail': {
      const body = [v.title, ...evidenceLines(v), ...(v.path ? [`path       ${v.path}`] : []), `replay     ${v.replay}`].join('\n');
      return element('testcase', attributes, element('failure', { type: v.evidence?.kind ?? 'fail', message: failureMessage(v) }, xmlText(body)));
    }
  }
}

/** What every test suite states about the run: seed, level, versions and the rest of the settings. */
function runProperties(result: RunResult): string {
  const s = result.settings;
  const properties: Record<string, string | number> = {
    seed: s.seed,
    level: result.falseAlarmControl.level,
    'false-alarm-control': `${result.falseAlarmControl.method} over ${result.falseAlarmControl.statisticalChecks} statistical checks`,
    [`${result.tool.name}.version`]: result.tool.version,
    'report.format-version': result.formatVersion,
    'adapter.name': result.adapter.name,
    'adapter.version': result.adapter.version,
    'adapter.kind': result.adapter.kind,
    'adapter.capabilities': result.adapter.capabilities.join(','),
    sizes: s.sizes.join(','),
    ladder: s.ladder.join(','),
    samples: s.samples,
    ensembles: s.ensembles.join(','),
    ...(s.only.length > 0 ? { only: s.only.join(' ') } : {}),
  };
  return element(
    'properties',
    {},
    Object.entries(properties)
      .map(([name, value]) => `\n      ${element('property', { name, value })}`)
      .join('') + '\n    ',
  );
}

function tally(checks: readonly CheckVerdict[]) {
  const count = (state: CheckVerdict['state']) => checks.filter((c) => c.state === state).length;
  return { tests: checks.length, failures: count('fail'), errors: count('fault'), skipped: count('skipped') };
}

function testSuite(suite: SuiteResult, result: RunResult, properties: string): string {
  const cases = suite.checks.map((v) => `\n    ${testCase(v)}`).join('');
  // The implementation's own diagnostics belong beside its faults.
  const log = tally(suite.checks).errors > 0 && result.adapterLog !== '' ? `\n    ${element('system-err', {}, xmlText(result.adapterLog))}` : '';
  return element('testsuite', { name: suite.name, ...tally(suite.checks) }, `\n    ${properties}${cases}${log}\n  `);
}

/**
 * The result model as JUnit XML, for CI systems: one testsuite per suite, one testcase per check
 * (classname the suite, name the check with its parameters); a failed check has a failure element
 * (type the kind of evidence, message observed, expected and error bar, the full evidence and the
 * replay command as its text), an adapter fault an error element (type the fault's kind), a
 * skipped check a skipped element with the reason. Each testsuite carries the run's seed, level
 * and versions as properties. The model has no durations, so no `time` attributes are written.
 */
export function formatJunitXml(result: RunResult): string {
  const properties = runProperties(result);
  const all = result.suites.flatMap((s) => s.checks);
  const suites = result.suites.map((s) => `\n  ${testSuite(s, result, properties)}`).join('');
  return `<?xml version="1.0" encoding="UTF-8"?>\n${element('testsuites', { name: result.tool.name, ...tally(all) }, `${suites}\n`)}\n`;
}

/** Writes the JUnit XML report to `sink` when the run ends. */
export function junitReporter(sink: TextSink): Reporter {
  return {
    onRunEnd(result) {
      sink.write(formatJunitXml(result));
    },
  };
}
