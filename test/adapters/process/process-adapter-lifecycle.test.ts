import { describe, expect, it } from 'vitest';
import { ProcessAdapter } from '../../../adapters/process/process-adapter.js';
import { expectFault, expectTridiagonalSpectrum, FAST, isRunning, kernelCommand, tridiagonal, zombieChildren } from './process-test-support.js';

// The fixture reports its pid as its version, so a test can see whether the process is gone.
async function programPid(adapter: ProcessAdapter): Promise<number> {
  return Number((await adapter.describe()).version);
}

describe('ProcessAdapter lifecycle', () => {
  it('close() ends the program and leaves no zombie; a second close() is harmless', async () => {
    const adapter = await ProcessAdapter.start(kernelCommand('ok'), FAST);
    const pid = await programPid(adapter);
    expect(isRunning(pid)).toBe(true);
    await adapter.close();
    await adapter.close();
    expect(isRunning(pid)).toBe(false);
    expect(zombieChildren()).toEqual([]);
  });

  it('describes itself as a process adapter with the capabilities it knows', async () => {
    const adapter = await ProcessAdapter.start(kernelCommand('ok'), FAST);
    try {
      expect(await adapter.describe()).toMatchObject({ name: 'misbehaving-kernel', kind: 'process', capabilities: ['eigenvalues', 'resolvent_trace', 'sample'] });
      expect(adapter.warnings()).toEqual(['capabilities this harness does not use, ignored: spectral_gap']);
    } finally {
      await adapter.close();
    }
  });

  it('fails a call after close() as unavailable', async () => {
    const adapter = await ProcessAdapter.start(kernelCommand('ok'), FAST);
    await adapter.close();
    await expectFault(adapter.eigenvalues(tridiagonal(2)), 'eigenvalues', 'unavailable', /the adapter is closed/);
  });

  it('close() during a hung call fails that call and kills a program that ignores SIGTERM', async () => {
    const adapter = await ProcessAdapter.start(kernelCommand('ignore-sigterm'), { ...FAST, timeoutMs: 60_000 });
    const pid = await programPid(adapter);
    const hung = expectFault(adapter.eigenvalues(tridiagonal(3)), 'eigenvalues', 'unavailable', /the adapter was closed while eigenvalues was pending/);
    // Let the request reach the program before closing.
    await new Promise((resolve) => setImmediate(resolve));
    await adapter.close();
    await hung;
    expect(isRunning(pid)).toBe(false);
    expect(zombieChildren()).toEqual([]);
  });

  it('stops the hung program before starting the next one', async () => {
    const adapter = await ProcessAdapter.start(kernelCommand('hang'), FAST);
    try {
      const first = await programPid(adapter);
      await expectFault(adapter.eigenvalues(tridiagonal(3)), 'eigenvalues', 'timeout', /within 500 ms/);
      expectTridiagonalSpectrum(await adapter.eigenvalues(tridiagonal(2)), 2);
      expect(isRunning(first)).toBe(false);
      // The description from the first start stands after a restart.
      expect(await programPid(adapter)).toBe(first);
    } finally {
      await adapter.close();
    }
  });

  it('answers concurrent callers one request at a time, each with its own result', async () => {
    const adapter = await ProcessAdapter.start(kernelCommand('ok'), FAST);
    try {
      const sizes = [2, 4, 3, 5, 1];
      const results = await Promise.all(sizes.map((n) => adapter.eigenvalues(tridiagonal(n))));
      results.forEach((values, k) => expectTridiagonalSpectrum(values, sizes[k]));
    } finally {
      await adapter.close();
    }
  });

  it('keeps only the tail of a flood of stderr in log()', async () => {
    const adapter = await ProcessAdapter.start(kernelCommand('stderr-flood'), { ...FAST, maxLogChars: 4096 });
    try {
      expectTridiagonalSpectrum(await adapter.eigenvalues(tridiagonal(2)), 2);
      const log = adapter.log();
      expect(log.startsWith('[… earlier output dropped; the last 4096 characters follow]\n')).toBe(true);
      expect(log.length).toBeLessThanOrEqual(4096 + 80);
      expect(log).toMatch(/misbehaving-kernel: flood done/);
    } finally {
      await adapter.close();
    }
  });
});
