import { existsSync, mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCheckCommand, type CheckArguments } from '../../../harness/cli/check-command.js';
import { UsageError } from '../../../harness/cli/usage-error.js';
import { fileReporter, REPORT_FORMATS } from '../../../harness/reporters/reporter-registry.js';
import { validateRunResultJson } from '../../../harness/reporters/validate-run-result-json.js';
import { junitProblems, parseJunitXml } from './support/junit-essentials.js';

/** The `check` command's arguments for a small run of the reference engine, as yargs would give them. */
function checkArguments(files: Partial<Pick<CheckArguments, 'report' | 'junit' | 'html'>>): CheckArguments {
  return {
    timeout: 60,
    suite: 'semicircle',
    size: '40',
    ladder: '32,48,64',
    samples: 40,
    seed: 3,
    budget: 1,
    alpha: 0.001,
    ensemble: 'goe',
    verbose: false,
    ...files,
  };
}

/** A terminal that is not a TTY and keeps what is written to it. */
function pipe() {
  const chunks: string[] = [];
  const stream = { isTTY: false, write: (text: string) => chunks.push(text) > 0 };
  return { stream: stream as unknown as NodeJS.WriteStream, text: () => chunks.join('') };
}

describe('one run, every report', () => {
  it('writes the terminal summary, the JSON, the JUnit XML and the HTML report of the same model', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'rmt-assay-reports-'));
    const files = { report: join(dir, 'run.json'), junit: join(dir, 'nested', 'run.xml'), html: join(dir, 'run.html') };
    const out = pipe();
    expect(await runCheckCommand(checkArguments(files), out.stream)).toBe(0);

    const json = JSON.parse(readFileSync(files.report, 'utf8'));
    expect(validateRunResultJson(json)).toEqual([]);
    const { pass, fail, skipped, fault } = json.counts;
    const total = pass + fail + skipped + fault;
    expect(total).toBeGreaterThan(0);

    expect(out.text()).toContain(`${pass} passed, ${fail} failed, ${skipped} skipped, ${fault} faults`);
    expect(out.text()).not.toContain('\u001b');

    const xml = readFileSync(files.junit, 'utf8');
    expect(junitProblems(xml)).toEqual([]);
    const root = parseJunitXml(xml).testsuites as Record<string, string>;
    expect([root['@_tests'], root['@_failures'], root['@_errors'], root['@_skipped']]).toEqual([total, fail, fault, skipped].map(String));

    const html = readFileSync(files.html, 'utf8');
    expect(html).toContain(`<span class="badge pass">${pass} passed</span>`);
    expect(html.match(/<tr id="check-\d+"/g)).toHaveLength(total);
    const exhibits = json.suites.flatMap((s: { checks: Array<{ exhibit?: unknown }> }) => s.checks).filter((c: { exhibit?: unknown }) => c.exhibit).length;
    expect(html.match(/<figure id="plot-\d+"/g)).toHaveLength(exhibits);
  });

  it('refuses an empty report file name, and two reports in one file, before anything runs', async () => {
    const out = pipe();
    await expect(runCheckCommand(checkArguments({ html: ' ' }), out.stream)).rejects.toThrow(new UsageError('--html needs a file'));
    const dir = mkdtempSync(join(tmpdir(), 'rmt-assay-reports-'));
    const same = checkArguments({ report: join(dir, 'r.out'), junit: join(dir, '.', 'r.out') });
    await expect(runCheckCommand(same, out.stream)).rejects.toThrow(/--report and --junit name the same file/);
    expect(out.text()).toBe('');
    expect(existsSync(join(dir, 'r.out'))).toBe(false);
  });

  it('knows each format by name, and says which exist when asked for another', () => {
    expect([...REPORT_FORMATS.keys()]).toEqual(['json', 'junit', 'html']);
    expect(() => fileReporter('yaml', 'x.yaml')).toThrow("no report format 'yaml' (known: json, junit, html)");
  });
});
