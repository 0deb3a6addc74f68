import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import type { BaselineFile } from '../../../harness/baseline/baseline-file.js';
import { baselineToJson } from '../../../harness/baseline/baseline-json.js';
import { BaselineError, loadBaseline, validateBaseline } from '../../../harness/baseline/load-baseline.js';
import { recordBaseline } from '../../../harness/baseline/record-baseline.js';
import { reference } from '../../support/mutant-adapter.js';

let good: BaselineFile;
const folder = mkdtempSync(join(tmpdir(), 'rmt-assay-baseline-'));

beforeAll(async () => {
  good = JSON.parse(baselineToJson(await recordBaseline(reference, { seed: 3, sizes: [8], ensembles: [{ kind: 'goe' }], samples: 20 })));
});

/** A copy of the good file with one change, as a user's hand edit or a corrupted download would make it. */
function edited(change: (b: Record<string, any>) => void): unknown {
  const copy = structuredClone(good) as unknown as Record<string, any>;
  change(copy);
  return copy;
}

describe('loading a baseline', () => {
  it('reads back what was written, spectra on one line each', () => {
    const file = join(folder, 'good.json');
    const text = baselineToJson(good);
    writeFileSync(file, text);
    expect(loadBaseline(file)).toEqual(good);
    expect(text).toMatch(/"values": \[-?\d[^\n]*\]\n/);
  });

  const broken: Array<[string, (b: Record<string, any>) => void, RegExp]> = [
    ['a value that is not a number', (b) => (b.outputs[0].values[3] = 'x'), /^baseline b\.json at \/outputs\/0\/values\/3: must be number/],
    ['a missing seed', (b) => delete b.seed, /at \(top level\): must have required property 'seed'/],
    ['an unknown routine', (b) => (b.outputs[1].routine = 'determinant'), /at \/outputs\/1\/routine: must be one of "eigenvalues", "resolvent_trace", "chain_trace"/],
    ['a complex number of three parts', (b) => (b.inputs.points[0] = [1, 2, 3]), /at \/inputs\/points\/0: must NOT have more than 2 items/],
    ['an unknown field', (b) => (b.comment = 'pinned'), /at \(top level\): must NOT have additional properties/],
    ['another format', (b) => (b.format = 'something-else'), /at \/format: must be "rmt-assay-baseline"/],
    ['an ensemble that does not parse', (b) => (b.ensembles = ['goe', 'wishart']), /at \/ensembles\/1: unknown ensemble 'wishart'/],
    ['an output for a size not recorded', (b) => (b.outputs[0].size = 9), /at \/outputs\/0\/size: 9 is not in \/sizes/],
    ['a matrix index beyond the probe set', (b) => (b.outputs[2].matrix = 7), /at \/outputs\/2\/matrix: 7 is beyond \/inputs\/matricesPerCase \(3\)/],
    ['a chain with a weight missing', (b) => b.inputs.chains[0].weights.pop(), /at \/inputs\/chains\/0: 2 points but 1 weights/],
  ];
  for (const [what, change, message] of broken) {
    it(`refuses ${what}, naming the file and the JSON path`, () => {
      expect(() => validateBaseline(edited(change), 'b.json')).toThrow(BaselineError);
      expect(() => validateBaseline(edited(change), 'b.json')).toThrow(message);
    });
  }

  it('says when the file is missing or not JSON', () => {
    expect(() => loadBaseline(join(folder, 'missing.json'))).toThrow(/cannot read baseline .*missing\.json: ENOENT/);
    const notJson = join(folder, 'not.json');
    writeFileSync(notJson, '{"format": ');
    expect(() => loadBaseline(notJson)).toThrow(/baseline .*not\.json is not JSON/);
  });
});
