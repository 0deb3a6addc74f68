import { execFileSync, spawnSync } from 'node:child_process';

/**
 * Independent implementations outside the project, used where they are installed: numpy (double
 * precision) and mpmath (arbitrary precision), through python3. Checks against them are skipped,
 * with the reason in the test name, where they are not.
 */
export function pythonHas(module: string): boolean {
  return spawnSync('python3', ['-c', `import ${module}`], { stdio: 'ignore' }).status === 0;
}

/** Runs a python3 script that prints one JSON value, and returns that value. */
export function runPython<T>(lines: readonly string[]): T {
  return JSON.parse(execFileSync('python3', ['-c', lines.join('\n')], { encoding: 'utf8', maxBuffer: 1 << 26 })) as T;
}
