import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { RecordedAdapter, RecordingError } from '../../../adapters/recorded/recorded-adapter.js';
import { RecordingAdapter } from '../../../adapters/recorded/recording-adapter.js';
import { runChecks } from '../../../harness/run-checks.js';
import type { RunResult } from '../../../harness/run-result.js';
import { identitiesSuite } from '../../../properties/identities.js';
import { semicircleSuite } from '../../../properties/semicircle.js';
import { reference } from '../../support/mutant-adapter.js';
import { testSettings } from '../../support/run-settings-for-tests.js';

const settings = testSettings({ sizes: [30], ladder: [20, 30, 40], samples: 30, ensembles: [{ kind: 'goe' }, { kind: 'gue' }] });
const suites = [semicircleSuite, identitiesSuite];

function verdictsOf(result: RunResult) {
  return result.suites.flatMap((s) => s.checks.map((c) => ({ id: c.id, state: c.state, evidence: c.evidence })));
}

async function recordReference(): Promise<{ file: string; live: RunResult }> {
  const recorder = new RecordingAdapter(reference);
  const live = await runChecks(recorder, settings, suites);
  const file = join(mkdtempSync(join(tmpdir(), 'rmt-assay-recording-')), 'recording.json');
  await recorder.save(file, 'test settings');
  return { file, live };
}

function edited(file: string, edit: (recording: any) => void): string {
  const recording = JSON.parse(readFileSync(file, 'utf8'));
  edit(recording);
  const out = file.replace(/\.json$/, `-${Math.random().toString(36).slice(2)}.json`);
  writeFileSync(out, JSON.stringify(recording));
  return out;
}

describe('recorded adapter', async () => {
  const { file, live } = await recordReference();

  it('replays a recording into the same verdicts, bit for bit, as the live run', async () => {
    const replay = await runChecks(RecordedAdapter.load(file), settings, suites);
    expect(replay.adapter.kind).toBe('recorded');
    expect(verdictsOf(replay)).toEqual(verdictsOf(live));
    expect(replay.counts.fail + replay.counts.fault + replay.counts.skipped).toBe(0);
  });

  it('skips, saying why, the checks whose inputs the recording does not hold', async () => {
    const replay = await runChecks(RecordedAdapter.load(file), { ...settings, seed: settings.seed + 1 }, [semicircleSuite]);
    const checks = replay.suites[0].checks;
    expect(checks.every((c) => c.state === 'skipped')).toBe(true);
    expect(checks[0].reason).toMatch(/not in the recording .* replay with the options it was made with/);
  });

  it('turns a recorded lie (a NaN eigenvalue) into a fault of the checks that read it', async () => {
    const lying = edited(file, (r) => {
      const call = r.calls.find((c: any) => c.method === 'eigenvalues' && c.result);
      call.result.values[0] = 'NaN';
    });
    const replay = await runChecks(RecordedAdapter.load(lying), settings, suites);
    const faults = replay.suites.flatMap((s) => s.checks).filter((c) => c.state === 'fault');
    expect(faults.length).toBeGreaterThan(0);
    expect(faults[0].faultKind).toBe('invalid-value');
    expect(faults[0].reason).toMatch(/\/result\/values\/0 is NaN/);
  });

  const broken: Array<[string, (file: string) => string, RegExp]> = [
    ['a file that is not JSON', (f) => { const out = f.replace('.json', '-bad.json'); writeFileSync(out, '{"format": '); return out; }, /is not JSON/],
    ['a missing file', (f) => f.replace('.json', '-absent.json'), /cannot read the recording .*ENOENT/],
    ['the wrong format', (f) => edited(f, (r) => (r.format = 'something else')), /not valid: at \/format/],
    ['a call without result or error', (f) => edited(f, (r) => delete r.calls[2].result), /not valid: at \/calls\/2/],
    ['a result of the wrong shape', (f) => edited(f, (r) => { const i = r.calls.findIndex((c: any) => c.method === 'resolvent_trace'); r.calls[i].result = { values: 'many' }; }), /not valid: at \/calls\/\d+\/result\/values/],
    ['a reference to a matrix that is not there', (f) => edited(f, (r) => { r.calls[0].params.matrix = { ref: 99999 }; }), /at \/calls\/0\/params\/matrix: no matrix 99999/],
  ];
  for (const [what, make, message] of broken) {
    it(`refuses ${what} with the file and the JSON path`, () => {
      const bad = make(file);
      expect(() => RecordedAdapter.load(bad)).toThrow(RecordingError);
      expect(() => RecordedAdapter.load(bad)).toThrow(message);
    });
  }

  it('stores each matrix once: a sampled matrix and the calls made on it share one copy', () => {
    const recording = JSON.parse(readFileSync(file, 'utf8'));
    const refs: number[] = [];
    JSON.stringify(recording.calls, (key, value) => {
      if (value !== null && typeof value === 'object' && 'ref' in value) refs.push(value.ref);
      return value;
    });
    const distinct = new Set(refs);
    expect(recording.matrices.length).toBe(distinct.size);
    expect(refs.length).toBeGreaterThan(distinct.size);
  });
});
