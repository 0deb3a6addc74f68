import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Ajv } from 'ajv';
import { describe, expect, it } from 'vitest';
import { BASELINE_RECORD_OPTIONS } from '../../../harness/cli/baseline-options.js';
import { CONFIG_FILE_NAME } from '../../../harness/cli/config-file.js';
import { configSchema, configSchemaText } from '../../../harness/cli/config-schema.js';
import { configuredArguments, printedConfiguration, withConfiguration } from '../../../harness/cli/configured-arguments.js';
import { CHECK_OPTIONS } from '../../../harness/cli/option-table.js';
import { UsageError } from '../../../harness/cli/usage-error.js';
import { validateRunValues } from '../../../harness/cli/validate-run-values.js';

const published = join(import.meta.dirname, '..', '..', '..', 'harness', 'cli', 'schemas', 'config.schema.json');

/** A fresh working directory holding `config` as rmt-assay.config.json (or nothing). */
function project(config?: unknown): string {
  const cwd = mkdtempSync(join(tmpdir(), 'rmt-assay-config-'));
  if (config !== undefined) writeFileSync(join(cwd, CONFIG_FILE_NAME), typeof config === 'string' ? config : JSON.stringify(config));
  return cwd;
}

const resolved = (cwd: string, flags: Record<string, unknown> = {}) => configuredArguments(CHECK_OPTIONS, flags, cwd, validateRunValues);

describe('the config file schema', () => {
  it('is published exactly as the option table generates it', () => {
    // To regenerate after changing harness/cli/option-table.ts: npx tsc, then
    // node -e "import('./dist/harness/cli/config-schema.js').then(m => process.stdout.write(m.configSchemaText()))" > harness/cli/schemas/config.schema.json
    expect(readFileSync(published, 'utf8')).toBe(configSchemaText());
  });

  it('has one property per option of the table and compiles under ajv strict mode', () => {
    const schema = configSchema() as { properties: Record<string, unknown> };
    expect(Object.keys(schema.properties).sort()).toEqual(['$schema', ...Object.keys(CHECK_OPTIONS)].sort());
    expect(() => new Ajv({ strict: true }).compile(schema)).not.toThrow();
  });
});

describe('resolving options from flags, the config file and defaults', () => {
  it('takes the defaults when there is no config file', () => {
    const c = resolved(project());
    expect(c.config.file).toBeNull();
    expect(c.values.size).toBe('200');
    expect(c.sources.size).toBe('default');
  });

  it('reads ./rmt-assay.config.json, arrays included, and lets flags override it', () => {
    const cwd = project({ $schema: './node_modules/rmt-assay/dist/harness/cli/schemas/config.schema.json', module: './kernel.mjs', size: [50, 100], suite: ['semicircle', 'identities'], seed: 7, verbose: true });
    const c = resolved(cwd, { seed: 9, verbose: false });
    expect(c.config.file).toBe(CONFIG_FILE_NAME);
    expect(c.values).toMatchObject({ module: './kernel.mjs', size: [50, 100], suite: ['semicircle', 'identities'], seed: 9, verbose: false, samples: 300 });
    expect(c.sources).toMatchObject({ module: 'config file', size: 'config file', seed: 'flag', verbose: 'flag', samples: 'default' });
    expect(c.values).not.toHaveProperty('$schema');
  });

  it('reads the file --config names instead, relative to the working directory', () => {
    const cwd = project({ seed: 1 });
    writeFileSync(join(cwd, 'ci.json'), JSON.stringify({ seed: 2, ensemble: 'goe' }));
    expect(resolved(cwd, { config: 'ci.json' }).values).toMatchObject({ seed: 2, ensemble: 'goe' });
  });

  it('gives baseline record only the options it declares', () => {
    const c = configuredArguments(BASELINE_RECORD_OPTIONS, {}, project({ module: './k.mjs', suite: 'identities', report: 'r.json' }), validateRunValues);
    expect(c.values).toMatchObject({ module: './k.mjs' });
    expect(c.values).not.toHaveProperty('suite');
    expect(c.values).not.toHaveProperty('report');
  });

  const broken: Array<[string, unknown, RegExp]> = [
    ['a misspelt option', { sizes: [100] }, /^config file rmt-assay\.config\.json at \(top level\): must NOT have additional properties/],
    ['a wrong type', { samples: 'many' }, /^config file rmt-assay\.config\.json at \/samples: must be number$/],
    ['a list of the wrong items', { size: [100, 'big'] }, /^config file rmt-assay\.config\.json at \/size: must be string or must be integer; at \/size\/1: must be integer$/],
    ['a value out of range', { size: [1] }, /^config file rmt-assay\.config\.json at \/size: must be a whole number from 2 to 20000, got '1'$/],
    ['an unknown suite', { suite: ['semicircle', 'wishart'] }, /^config file rmt-assay\.config\.json at \/suite: unknown name 'wishart'/],
    ['an unknown ensemble', { ensemble: 'wishart' }, /^config file rmt-assay\.config\.json at \/ensemble: unknown ensemble 'wishart'/],
    ['a timeout of zero', { timeout: 0 }, /^config file rmt-assay\.config\.json at \/timeout: must be a positive number of seconds, got '0'$/],
    ['text that is not JSON', '{ "seed": 1,', /^the config file rmt-assay\.config\.json is not JSON/],
  ];
  for (const [what, config, message] of broken) {
    it(`refuses ${what}, naming the file and the JSON path`, () => {
      const cwd = project(config);
      expect(() => resolved(cwd)).toThrow(UsageError);
      expect(() => resolved(cwd)).toThrow(message);
    });
  }

  it('blames the flag, not the file, for a bad value typed on the command line', () => {
    expect(() => resolved(project({ seed: 3 }), { size: '1' })).toThrow(/^--size must be a whole number/);
  });

  it('refuses a --config file that is not there', () => {
    expect(() => resolved(project(), { config: 'missing.json' })).toThrow(/^cannot read the config file missing\.json: ENOENT$/);
  });
});

describe('the CI recipe’s config file', () => {
  it('is valid and resolves to what the recipe says', () => {
    const c = configuredArguments(CHECK_OPTIONS, {}, join(import.meta.dirname, '..', '..', '..', 'examples', 'ci'), validateRunValues);
    expect(c.config.file).toBe(CONFIG_FILE_NAME);
    expect(c.values).toMatchObject({ exec: 'python3 src/lab_kernel.py', suite: ['semicircle', 'identities'], size: [100, 200], baseline: 'baselines/lab-kernel.json' });
  });
});

describe('--print-config', () => {
  it('prints the resolved options as a config file would hold them, and where each came from', async () => {
    let out = '';
    let err = '';
    const io = { cwd: project({ size: [50], module: './kernel.mjs' }), out: { write: (t: string) => void (out += t) }, err: { write: (t: string) => void (err += t) } };
    const code = await withConfiguration(CHECK_OPTIONS, { 'print-config': true, seed: 4 }, io, validateRunValues, async () => {
      throw new Error('the command must not run');
    });
    expect(code).toBe(0);
    const printed = JSON.parse(out);
    expect(printed).toMatchObject({ module: './kernel.mjs', size: [50], seed: 4, samples: 300, suite: 'semicircle' });
    // What it prints is itself a valid config file.
    expect(new Ajv({ strict: true }).compile(configSchema())(printed)).toBe(true);
    expect(err).toMatch(/flags: seed; config file rmt-assay\.config\.json: module, size; defaults: .*samples/);
    expect(printedConfiguration(resolved(project())).origins).toMatch(/config file \(none found\): none/);
  });

  it('runs the command with the resolved options otherwise', async () => {
    const io = { cwd: project({ seed: 5 }), out: { write: () => {} }, err: { write: () => {} } };
    let seen: Record<string, unknown> = {};
    const code = await withConfiguration(CHECK_OPTIONS, { samples: 40 }, io, validateRunValues, async (values) => {
      seen = values;
      return 1;
    });
    expect(code).toBe(1);
    expect(seen).toMatchObject({ seed: 5, samples: 40 });
  });
});
