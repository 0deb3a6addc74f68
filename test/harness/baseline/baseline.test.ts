import { describe, expect, it } from 'vitest';
import type { Adapter } from '../../../adapters/adapter.js';
import type { BaselineFile } from '../../../harness/baseline/baseline-file.js';
import { baselineToJson } from '../../../harness/baseline/baseline-json.js';
import { baselineSuite } from '../../../harness/baseline/baseline-suite.js';
import { validateBaseline } from '../../../harness/baseline/load-baseline.js';
import { recordBaseline } from '../../../harness/baseline/record-baseline.js';
import { randomStream } from '../../../harness/numeric/random-stream.js';
import { sampleMatrix } from '../../../harness/numeric/sample-wigner.js';
import type { SquareMatrix } from '../../../harness/numeric/square-matrix.js';
import { runChecks } from '../../../harness/run-checks.js';
import type { RunResult } from '../../../harness/run-result.js';
import { independentAdapter } from '../../support/independent-adapter.js';
import { mutantAdapter, reference } from '../../support/mutant-adapter.js';
import { testSettings } from '../../support/run-settings-for-tests.js';

const recordOptions = { seed: 17, sizes: [24], ensembles: [{ kind: 'goe' as const }, { kind: 'gue' as const }], samples: 150 };

/** Records, writes and reads back the file (so the check sees what a later CI job would). */
async function recorded(adapter: Adapter): Promise<BaselineFile> {
  return validateBaseline(JSON.parse(baselineToJson(await recordBaseline(adapter, recordOptions))), 'baseline.json');
}

/** Only the baseline suite, under the run's default level. */
async function checkAgainst(adapter: Adapter, baseline: BaselineFile): Promise<RunResult> {
  return runChecks(adapter, testSettings({ suites: ['baseline'] }), [baselineSuite(baseline, 'baseline.json')]);
}

const verdicts = (r: RunResult) => r.suites.flatMap((s) => s.checks);
const failed = (r: RunResult) => verdicts(r).filter((v) => v.state !== 'pass' && v.state !== 'skipped').map((v) => v.id);

function scaled(m: SquareMatrix, factor: number): SquareMatrix {
  return { ...m, data: m.data.map((x) => x * factor) };
}

describe('baseline record and check', () => {
  it('records every routine and the sampled statistics of the reference engine, small and without matrices', async () => {
    const baseline = await recordBaseline(reference, recordOptions);
    // 3 routines × 2 ensembles × 3 probe matrices; statistics per ensemble: Re and Im at 2 points.
    expect(baseline.outputs).toHaveLength(18);
    expect(baseline.statistics.map((s) => s.moments.length)).toEqual([4, 4]);
    expect(baseline.outputs.find((o) => o.routine === 'eigenvalues')!.values).toHaveLength(24);
    expect(baseline.tool.name).toBe('rmt-assay');
    expect(baseline.adapter.kind).toBe('reference');
    // No matrix in the file: a spectrum per matrix and a handful of traces, a few kilobytes.
    expect(baselineToJson(baseline).length).toBeLessThan(20_000);
  });

  it('passes the reference engine against its own baseline, reproducing the statistics exactly', async () => {
    const result = await checkAgainst(reference, await recorded(reference));
    expect(failed(result)).toEqual([]);
    expect(result.counts.skipped).toBe(0);
    // 3 routine checks per ensemble, and a mean and a variance check for each of 4 statistics.
    expect(result.counts.pass).toBe(2 * 3 + 2 * 8);
    for (const v of verdicts(result)) {
      if (v.evidence?.kind === 'statistical') expect(v.evidence.zScore).toBe(0);
      if (v.evidence?.kind === 'deterministic') expect(v.evidence.ratio).toBe(0);
    }
    expect(verdicts(result)[0].replay).toContain('--suite baseline');
  });

  it('passes an engine sharing no numerical code with the reference against the reference’s baseline', async () => {
    const result = await checkAgainst(independentAdapter, await recorded(reference));
    expect(failed(result)).toEqual([]);
    // It has no sampler: the statistics are skipped, saying why.
    const skipped = verdicts(result).filter((v) => v.state === 'skipped');
    expect(skipped).toHaveLength(16);
    expect(skipped[0].reason).toMatch(/no longer draws its own matrices/);
  });

  it('passes a sampler with other random streams but the same law (the statistics are two-sample tests)', async () => {
    const reseeded = mutantAdapter('reseeded sampler', { sample: (e, n, seed, c) => reference.sample(e, n, (seed + 1) % 2 ** 32, c) }, ['eigenvalues', 'resolvent_trace', 'chain_trace', 'sample']);
    const result = await checkAgainst(reseeded, await recorded(reference));
    expect(failed(result)).toEqual([]);
    expect(verdicts(result).some((v) => v.evidence?.kind === 'statistical' && v.evidence.zScore > 0)).toBe(true);
  });

  it('fails a trace normalised by N − 1, naming the routine that changed and no other', async () => {
    const minusOne = mutantAdapter('N − 1 traces', {
      resolventTrace: async (m, points, w) => (await reference.resolventTrace(m, points, w)).map((t) => ({ re: (t.re * m.size) / (m.size - 1), im: (t.im * m.size) / (m.size - 1) })),
    });
    const result = await checkAgainst(minusOne, await recorded(reference));
    expect(failed(result).sort()).toEqual(['baseline/resolvent-trace/goe/N=24', 'baseline/resolvent-trace/gue/N=24']);
    const v = verdicts(result).find((c) => c.id === 'baseline/resolvent-trace/goe/N=24')!;
    expect(v.evidence?.kind === 'deterministic' && v.evidence.worstInput).toMatch(/goe, N = 24, matrix \d of stream 'probe\/matrix' under seed 17; ⟨G\(z\)A⟩ at z = /);
    expect(v.evidence?.kind === 'deterministic' && v.evidence.expectedSource).toMatch(/1\.4 digits agree at worst/);
  });

  it('fails a sampler 10 % too wide through the statistics, naming them', async () => {
    const wide = mutantAdapter('scale-1.1 sampler', { sample: async (e, n, s, c) => (await reference.sample(e, n, s, c)).map((m) => scaled(m, 1.1)) }, [
      'eigenvalues',
      'resolvent_trace',
      'chain_trace',
      'sample',
    ]);
    const result = await checkAgainst(wide, await recorded(reference));
    const ids = failed(result);
    expect(ids.length).toBeGreaterThan(0);
    expect(ids.every((id) => /^baseline\/(mean|variance)\//.test(id))).toBe(true);
  });

  it('skips, asking for a new recording, when the harness draws other probe matrices than at recording', async () => {
    const baseline = await recorded(reference);
    const moved: BaselineFile = { ...baseline, outputs: baseline.outputs.map((o) => ({ ...o, inputFingerprint: [o.inputFingerprint[0] + 1, o.inputFingerprint[1]] as const })) };
    const result = await checkAgainst(reference, moved);
    const deterministic = verdicts(result).filter((v) => !/baseline\/(mean|variance)\//.test(v.id));
    expect(deterministic.every((v) => v.state === 'skipped')).toBe(true);
    expect(deterministic[0].reason).toMatch(/the harness now draws a different probe matrix .* record it again with this version/);
  });

  it('records what a sampler-only implementation offers and nothing else', async () => {
    const samplerOnly = mutantAdapter(
      'sampler only',
      { sample: async (e, n, s, c) => Array.from({ length: c }, (_, i) => sampleMatrix(e, n, randomStream(s, 'own', i))) },
      ['sample'],
    );
    const baseline = await recordBaseline(samplerOnly, recordOptions);
    expect(baseline.outputs).toEqual([]);
    expect(baseline.statistics[0].path).toMatch(/implementation's sampler.*statistic: reference engine's resolvent_trace/);
  });
});
