import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runBaselineRecordCommand } from '../../../harness/cli/baseline-command.js';
import { openBaselineOption, selectableSuites } from '../../../harness/cli/baseline-option.js';
import { resolveSettings, type CheckArguments } from '../../../harness/cli/check-command.js';
import { runCompareCommand } from '../../../harness/cli/compare-command.js';
import { withOptionDefaults } from '../../../harness/cli/declare-options.js';
import { CHECK_OPTIONS } from '../../../harness/cli/option-table.js';
import { UsageError } from '../../../harness/cli/usage-error.js';

/** Collects what a command prints. */
function sink() {
  let text = '';
  return { write: (t: string) => void (text += t), text: () => text };
}

const folder = mkdtempSync(join(tmpdir(), 'rmt-assay-usage-'));

describe('compare, in process', () => {
  it('compares the reference engine with itself, prints the table and writes the reports', async () => {
    const out = sink();
    const [report, junit, html] = ['compare.json', 'compare.xml', 'compare.html'].map((f) => join(folder, f));
    const code = await runCompareCommand({ left: 'reference', right: 'reference', size: '12', samples: 30, ensemble: 'goe', report, junit, html }, out);
    expect(code).toBe(0);
    expect(out.text()).toMatch(/left {3}rmt-assay reference engine .* · reference\n {2}right {2}rmt-assay reference engine/);
    expect(out.text()).toMatch(/eigenvalues\s+goe\s+12\s+3\s+0\s+16\.0\s+0 \/ 50\s+agree/);
    expect(JSON.parse(readFileSync(report, 'utf8')).comparison.agreement).toHaveLength(3);
    expect(readFileSync(junit, 'utf8')).toContain('compare/agreement/eigenvalues/goe/N=12');
    expect(readFileSync(html, 'utf8')).toContain('compare/mean/goe/N=12');
  });

  const bad: Array<[string, Parameters<typeof runCompareCommand>[0], RegExp]> = [
    ['a missing side', { left: 'reference' }, /compare needs --left and --right/],
    ['a side without a kind', { left: 'kernel.mjs', right: 'reference' }, /--left must name an implementation/],
    ['a missing module', { left: 'reference', right: 'module:no/such.mjs' }, /module not found: no\/such\.mjs/],
    ['a size below 2', { left: 'reference', right: 'reference', size: 1 }, /--size must be a whole number from 2/],
    ['a zero timeout', { left: 'reference', right: 'reference', timeout: 0 }, /--timeout must be a positive number/],
    ['an empty report file', { left: 'reference', right: 'reference', junit: ' ' }, /--junit needs a file/],
  ];
  for (const [what, args, message] of bad) {
    it(`refuses ${what} with a usage error`, async () => {
      await expect(runCompareCommand(args, sink())).rejects.toThrow(UsageError);
      await expect(runCompareCommand(args, sink())).rejects.toThrow(message);
    });
  }
});

describe('baseline options, in process', () => {
  it('records the reference engine and says how to check against it', async () => {
    const out = sink();
    const file = join(folder, 'nested', 'reference.json');
    expect(await runBaselineRecordCommand({ out: file, size: '10', samples: 20, ensemble: 'gue' }, out)).toBe(0);
    expect(out.text()).toMatch(/9 per-matrix outputs, 1 sampled statistics sets \(seed 20261202, N = 10, gue, 20 samples\)/);
    expect(out.text()).toContain(`check a later version with: npx rmt-assay check --baseline ${file}`);
    expect(openBaselineOption(file)?.replayArguments).toBe(`--baseline ${file}`);
  });

  it('refuses record without --out or with a threshold that is not positive', async () => {
    await expect(runBaselineRecordCommand({}, sink())).rejects.toThrow(/baseline record needs --out FILE/);
    await expect(runBaselineRecordCommand({ out: join(folder, 'x.json'), threshold: 0 }, sink())).rejects.toThrow(/--threshold must be a positive number/);
  });

  it('refuses a baseline that is missing or breaks its schema, naming the file and the JSON path', () => {
    expect(() => openBaselineOption('no/such/baseline.json')).toThrow(UsageError);
    expect(() => openBaselineOption('no/such/baseline.json')).toThrow(/cannot read baseline no\/such\/baseline\.json: ENOENT/);
    const broken = join(folder, 'broken.json');
    writeFileSync(broken, JSON.stringify({ format: 'rmt-assay-baseline', formatVersion: 2 }));
    expect(() => openBaselineOption(broken)).toThrow(/^baseline .*broken\.json at \(top level\): must have required property '\w+'$/);
    writeFileSync(broken, JSON.stringify({ ...JSON.parse(readFileSync(join(folder, 'nested', 'reference.json'), 'utf8')), formatVersion: 2 }));
    expect(() => openBaselineOption(broken)).toThrow(/^baseline .*broken\.json at \/formatVersion: must be 1$/);
    expect(() => openBaselineOption(' ')).toThrow(/--baseline needs a file/);
    expect(openBaselineOption(undefined)).toBeUndefined();
  });

  it('accepts --suite baseline only with --baseline', () => {
    expect(selectableSuites(undefined)).not.toContain('baseline');
    expect(selectableSuites('b.json')).toContain('baseline');
    const args = (extra: object) => withOptionDefaults(CHECK_OPTIONS, { suite: 'baseline', ...extra }) as unknown as CheckArguments;
    expect(() => resolveSettings(args({}), '')).toThrow(/--suite: unknown name 'baseline'/);
    expect(resolveSettings(args({ baseline: 'b.json' }), '').suites).toEqual(['baseline']);
  });
});
