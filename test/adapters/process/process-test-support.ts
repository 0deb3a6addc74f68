import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { expect } from 'vitest';
import { AdapterFault, type AdapterFaultKind } from '../../../adapters/adapter.js';
import type { SquareMatrix } from '../../../harness/numeric/square-matrix.js';

const FIXTURE = fileURLToPath(new URL('./fixtures/misbehaving-kernel.mjs', import.meta.url));

/** The shell command that starts the misbehaving kernel in `mode`. */
export function kernelCommand(mode: string, ...extra: string[]): string {
  return ['node', JSON.stringify(FIXTURE), '--mode', mode, ...extra].join(' ');
}

/**
 * Options for tests: a short per-call timeout, since the fixtures answer in milliseconds, and a
 * generous start timeout, since starting Node and ml-matrix on a loaded machine is slower.
 */
export const FAST = { timeoutMs: 500, startTimeoutMs: 30_000, killGraceMs: 200 } as const;

/**
 * The tridiagonal Toeplitz matrix with 2 on the diagonal and 1 beside it. Its eigenvalues are
 * 2 + 2 cos(kπ/(n + 1)), k = 1..n (a classical closed form, e.g. G. D. Smith 1985, Numerical
 * Solution of Partial Differential Equations, 3rd ed., Oxford, §2.10; citation from memory).
 * The fixture misbehaves at n = 3 and answers correctly at n = 2.
 */
export function tridiagonal(n: number): SquareMatrix {
  const data = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    data[i * n + i] = 2;
    if (i + 1 < n) data[i * n + i + 1] = data[(i + 1) * n + i] = 1;
  }
  return { field: 'real', size: n, data };
}

export function tridiagonalEigenvalues(n: number): number[] {
  return Array.from({ length: n }, (_, k) => 2 + 2 * Math.cos(((n - k) * Math.PI) / (n + 1)));
}

/** Asserts that `promise` rejects with an AdapterFault of `kind` for `method` whose message matches. */
export async function expectFault(promise: Promise<unknown>, method: string, kind: AdapterFaultKind, message: RegExp): Promise<AdapterFault> {
  const error = await promise.then(
    () => undefined,
    (e: unknown) => e,
  );
  expect(error, `expected ${method} to fail with ${kind}`).toBeInstanceOf(AdapterFault);
  const fault = error as AdapterFault;
  expect({ method: fault.method, kind: fault.kind }).toEqual({ method, kind });
  expect(fault.message).toMatch(message);
  return fault;
}

/** Asserts eigenvalues of tridiagonal(n) within a few ulps of the closed form (ml-matrix's QL is backward stable). */
export function expectTridiagonalSpectrum(values: Float64Array, n: number): void {
  const expected = tridiagonalEigenvalues(n);
  expect(values.length).toBe(n);
  // ‖H‖ ≤ 4, so a backward-stable solver is within a small multiple of n·4·ε (common practice).
  const tolerance = 64 * n * 4 * Number.EPSILON;
  values.forEach((v, k) => expect(Math.abs(v - expected[k])).toBeLessThanOrEqual(tolerance));
}

/**
 * Children of this process that are zombies (exited but not reaped), from /proc (Linux). Empty on
 * other systems, where the check cannot be made.
 */
export function zombieChildren(): number[] {
  let entries: string[];
  try {
    entries = readdirSync('/proc').filter((name) => /^\d+$/.test(name));
  } catch {
    return [];
  }
  const zombies: number[] = [];
  for (const pid of entries) {
    try {
      // /proc/PID/stat: "pid (comm) state ppid …"; comm may hold spaces, so read after the last ')'.
      const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
      const [state, ppid] = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
      if (state === 'Z' && Number(ppid) === process.pid) zombies.push(Number(pid));
    } catch {
      // The process ended while we looked.
    }
  }
  return zombies;
}

/** Whether a process with this pid is running; a zombie counts as not running. */
export function isRunning(pid: number): boolean {
  if (existsSync('/proc/self/stat')) {
    try {
      const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
      return stat.slice(stat.lastIndexOf(')') + 2).split(' ')[0] !== 'Z';
    } catch {
      return false;
    }
  }
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

/**
 * Waits until `condition` holds, polling every 20 ms, at most `attempts` times; fails otherwise.
 * For events of another process that the test cannot await (a program exiting on its own).
 */
export async function eventually(condition: () => boolean, attempts = 250): Promise<void> {
  for (let k = 0; k < attempts; k++) {
    if (condition()) return;
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
  expect(condition(), 'condition still false after polling').toBe(true);
}
