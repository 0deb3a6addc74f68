import { afterEach, describe, expect, it } from 'vitest';
import { EnsembleNotOffered, NotAvailable } from '../../../adapters/adapter.js';
import { ProcessAdapter } from '../../../adapters/process/process-adapter.js';
import type { ProcessAdapterOptions } from '../../../adapters/process/process-adapter-options.js';
import { eventually, expectFault, expectTridiagonalSpectrum, FAST, kernelCommand, tridiagonal } from './process-test-support.js';

// Each fault of adapters/process/PROTOCOL.md provoked by fixtures/misbehaving-kernel.mjs, which
// misbehaves only on 3×3 requests: the fault must name its kind and method, and a later 2×2 call
// must succeed (on a restarted program where the fault stopped it).

const open: ProcessAdapter[] = [];
afterEach(async () => {
  await Promise.all(open.splice(0).map((a) => a.close()));
});

async function start(mode: string, options: ProcessAdapterOptions = FAST, ...extra: string[]): Promise<ProcessAdapter> {
  const adapter = await ProcessAdapter.start(kernelCommand(mode, ...extra), options);
  open.push(adapter);
  return adapter;
}

async function expectRecovers(adapter: ProcessAdapter): Promise<void> {
  expectTridiagonalSpectrum(await adapter.eigenvalues(tridiagonal(2)), 2);
}

describe('ProcessAdapter: a program that does not start', () => {
  it('reports a command that does not exist as unavailable, with the shell\'s complaint', async () => {
    const fault = await expectFault(ProcessAdapter.start('rmt-assay-no-such-program --serve', FAST), 'describe', 'unavailable', /did not start: .*code 127/);
    expect(fault.message).toMatch(/not found/);
  });

  it('reports a program that exits at once with its exit code and stderr', async () => {
    await expectFault(ProcessAdapter.start(kernelCommand('exit-at-once'), FAST), 'describe', 'unavailable', /did not start: .*exited with code 3.*refusing to start/);
  });

  it('reports a missing working directory', async () => {
    await expectFault(
      ProcessAdapter.start(kernelCommand('ok'), { ...FAST, cwd: '/nonexistent/rmt-assay-dir' }),
      'describe',
      'unavailable',
      /could not be started.*ENOENT/,
    );
  });

  it('reports a describe result of the wrong shape with its JSON path', async () => {
    await expectFault(ProcessAdapter.start(kernelCommand('bad-describe'), FAST), 'describe', 'unavailable', /at \/result: must have required property 'version'|at \/result\/capabilities: must be array/);
  });
});

describe('ProcessAdapter: faults that stop and restart the program', () => {
  it('survives a crash mid-run, with the exit code and stderr in the message', async () => {
    const adapter = await start('crash');
    await expectFault(adapter.eigenvalues(tridiagonal(3)), 'eigenvalues', 'crashed', /exited with code 70 while computing eigenvalues.*segmentation fault in eigenvalues/);
    await expectRecovers(adapter);
    expect(adapter.log()).toMatch(/starting the program again for eigenvalues/);
  });

  it('times out a program that hangs, stops it and restarts it', async () => {
    const adapter = await start('hang');
    const fault = await expectFault(adapter.eigenvalues(tridiagonal(3)), 'eigenvalues', 'timeout', /no response to eigenvalues within 500 ms/);
    expect(fault.message).toMatch(/stopped and the next call starts it anew/);
    await expectRecovers(adapter);
  });

  it('kills a program that ignores SIGTERM once the grace period is over', async () => {
    const adapter = await start('ignore-sigterm');
    await expectFault(adapter.eigenvalues(tridiagonal(3)), 'eigenvalues', 'timeout', /within 500 ms/);
    await expectRecovers(adapter);
  });

  it('reports a line that begins like JSON but is not', async () => {
    const adapter = await start('broken-json');
    await expectFault(adapter.eigenvalues(tridiagonal(3)), 'eigenvalues', 'malformed-response', /response to eigenvalues is not valid JSON.*"values": \[1\.5, 2/);
    await expectRecovers(adapter);
  });

  it('explains bare NaN tokens, which JSON does not have', async () => {
    const adapter = await start('bare-nan');
    await expectFault(adapter.eigenvalues(tridiagonal(3)), 'eigenvalues', 'malformed-response', /not valid JSON \(JSON has no NaN or Infinity: send them as the strings "NaN"/);
    await expectRecovers(adapter);
  });

  it('reports a JSON object that is not a JSON-RPC response', async () => {
    const adapter = await start('missing-jsonrpc');
    await expectFault(adapter.eigenvalues(tridiagonal(3)), 'eigenvalues', 'malformed-response', /not a JSON-RPC 2\.0 response: at \(top level\): must have required property 'jsonrpc'/);
    await expectRecovers(adapter);
  });

  it('reports a response that carries the wrong id', async () => {
    const adapter = await start('wrong-id');
    await expectFault(adapter.eigenvalues(tridiagonal(3)), 'eigenvalues', 'malformed-response', /request id \d+\) carries id \d+/);
    await expectRecovers(adapter);
  });

  it('cuts off an enormous response at maxResponseBytes', async () => {
    const adapter = await start('huge', { ...FAST, maxResponseBytes: 64 * 1024 }, '--huge-bytes', String(4 << 20));
    await expectFault(adapter.eigenvalues(tridiagonal(3)), 'eigenvalues', 'malformed-response', /passed the limit of 65536 bytes \(maxResponseBytes\)/);
    await expectRecovers(adapter);
  });

  it('times out a program that writes only noise', async () => {
    const adapter = await start('noise-only');
    await expectFault(adapter.eigenvalues(tridiagonal(3)), 'eigenvalues', 'timeout', /within 500 ms.*1 line\(s\) that are not messages, the last: 'Traceback/);
    await expectRecovers(adapter);
  });

  it('notes a program that exits between calls and restarts it for the next one', async () => {
    const adapter = await start('exit-after-answer');
    expectTridiagonalSpectrum(await adapter.eigenvalues(tridiagonal(2)), 2);
    await eventually(() => adapter.warnings().some((w) => w.startsWith('the program exited with code 0 between calls')));
    expectTridiagonalSpectrum(await adapter.eigenvalues(tridiagonal(2)), 2);
    expect(adapter.log()).toMatch(/\[rmt-assay\] starting the program again for eigenvalues/);
  });
});

describe('ProcessAdapter: a message nobody asked for', () => {
  it('stops the program, notes why, and starts it again for the next call', async () => {
    const adapter = await start('unsolicited');
    expectTridiagonalSpectrum(await adapter.eigenvalues(tridiagonal(3)), 3);
    await eventually(() => adapter.warnings().some((w) => w.startsWith('the program sent a message while no request was pending')));
    await expectRecovers(adapter);
    expect(adapter.log()).toMatch(/starting the program again for eigenvalues/);
  });
});

describe('ProcessAdapter: faults in a well-framed response (the program keeps running)', () => {
  it('reports a result of the wrong shape with the JSON path', async () => {
    const adapter = await start('wrong-shape');
    await expectFault(adapter.eigenvalues(tridiagonal(3)), 'eigenvalues', 'malformed-response', /at \/result\/values\/1: must be number or must be one of "NaN", "Infinity", "-Infinity"/);
    await expectRecovers(adapter);
  });

  it('reports NaN sent as a string as an invalid value', async () => {
    const adapter = await start('nan');
    await expectFault(adapter.eigenvalues(tridiagonal(3)), 'eigenvalues', 'invalid-value', /\/result\/values\/1 is NaN/);
    await expectRecovers(adapter);
  });

  it('reports a number literal that overflows to Infinity as an invalid value', async () => {
    const adapter = await start('overflow-literal');
    await expectFault(adapter.eigenvalues(tridiagonal(3)), 'eigenvalues', 'invalid-value', /\/result\/values\/0 is Infinity/);
    await expectRecovers(adapter);
  });

  it('reports the wrong number of eigenvalues', async () => {
    const adapter = await start('wrong-count');
    await expectFault(adapter.eigenvalues(tridiagonal(3)), 'eigenvalues', 'malformed-response', /\/result\/values holds 2 values; expected 3/);
    await expectRecovers(adapter);
  });

  it('reports the wrong number of resolvent values', async () => {
    const adapter = await start('wrong-count');
    const points = [{ re: 0, im: 1 }, { re: 1, im: 0.5 }, { re: -1, im: 2 }];
    await expectFault(adapter.resolventTrace(tridiagonal(3), points), 'resolvent_trace', 'malformed-response', /holds 2 values; expected 3 \(one per point\)/);
    expect(await adapter.resolventTrace(tridiagonal(2), points)).toHaveLength(3);
  });

  it('passes a JSON-RPC error on as an implementation error with its message', async () => {
    const adapter = await start('error');
    await expectFault(adapter.eigenvalues(tridiagonal(3)), 'eigenvalues', 'implementation-error', /answered error -32000: LinAlgError: Singular matrix/);
    await expectRecovers(adapter);
  });

  it('turns error 1002 into NotAvailable, so that the checks are skipped rather than faulted', async () => {
    const adapter = await start('not-available');
    const error = await adapter.eigenvalues(tridiagonal(3)).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(NotAvailable);
    expect((error as Error).message).toBe('eigenvalues: the implementation cannot answer this request: odd sizes are not supported');
    await expectRecovers(adapter);
  });

  it('passes on an error for a method the program does not have', async () => {
    const adapter = await start('ok');
    await expectFault(adapter.chainTrace(tridiagonal(2), [{ re: 0, im: 1 }], [tridiagonal(2)]), 'chain_trace', 'implementation-error', /-32601: method not found: chain_trace/);
    await expectRecovers(adapter);
  });
});

describe('ProcessAdapter: tolerated behaviour', () => {
  it('ignores noise before the answer and keeps it as a warning', async () => {
    const adapter = await start('noise');
    expectTridiagonalSpectrum(await adapter.eigenvalues(tridiagonal(3)), 3);
    expect(adapter.warnings()).toContain('stdout line that is not a message, ignored: "loading weights from cache..."');
    expect(adapter.log()).toMatch(/\[rmt-assay\] stdout line that is not a message, ignored: "\[progress\] 100%"/);
  });

  it('waits for a slow answer within the timeout', async () => {
    const adapter = await start('slow', { ...FAST, timeoutMs: 20_000 }, '--delay-ms', '100');
    expectTridiagonalSpectrum(await adapter.eigenvalues(tridiagonal(3)), 3);
  });

  it('times out a slow answer beyond the timeout', async () => {
    const adapter = await start('slow', FAST, '--delay-ms', '30000');
    await expectFault(adapter.eigenvalues(tridiagonal(3)), 'eigenvalues', 'timeout', /no response to eigenvalues within 500 ms/);
    await expectRecovers(adapter);
  });
});

describe('ProcessAdapter: sample', () => {
  const goe = { kind: 'goe' } as const;

  it('throws EnsembleNotOffered for an ensemble the program does not sample', async () => {
    const adapter = await start('ok');
    const error = await adapter.sample({ kind: 'gue' }, 4, 1, 2).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(EnsembleNotOffered);
    expect((error as EnsembleNotOffered).ensemble).toBe('gue');
    const matrices = await adapter.sample(goe, 4, 1, 2);
    expect(matrices.map((m) => [m.field, m.size, m.data.length])).toEqual([['real', 4, 16], ['real', 4, 16]]);
  });

  it('reports matrices of the wrong field', async () => {
    const adapter = await start('sample-wrong-field');
    await expectFault(adapter.sample(goe, 3, 1, 2), 'sample', 'malformed-response', /\/result\/matrices\/0 is a 3×3 complex matrix; goe at size 3 needs 3×3 real/);
    expect(await adapter.sample(goe, 2, 1, 2)).toHaveLength(2);
  });

  it('reports a non-finite entry as an invalid value, with its position', async () => {
    const adapter = await start('sample-nan-entry');
    await expectFault(adapter.sample(goe, 3, 1, 2), 'sample', 'invalid-value', /\/result\/matrices\/0 entry \(0, 1\) is NaN/);
  });

  it('reports a payload of the wrong length', async () => {
    const adapter = await start('sample-short-data');
    await expectFault(adapter.sample(goe, 3, 1, 1), 'sample', 'malformed-response', /matrix at \/result\/matrices\/0 holds about 6 bytes .* needs 72 \(9 float64\)/);
  });
});
