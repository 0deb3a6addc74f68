import { execFileSync, spawnSync } from 'node:child_process';
import { mkdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';

/** The package root, where the CLI runs (examples/ resolve from here). */
export const PACKAGE_ROOT = join(import.meta.dirname, '..', '..');

/**
 * The CLI compiled into a folder of its own under test-artifacts/ (ignored by git), so test files
 * that run the built bin never read dist/ while another file's build is writing it. Node finds
 * node_modules by walking up from there, as it does from dist/.
 */
export function buildPrivateCli(name: string): { readonly bin: string; readonly remove: () => void } {
  const outDir = join(PACKAGE_ROOT, 'test-artifacts', `${name}-${process.pid}`);
  mkdirSync(outDir, { recursive: true });
  const remove = () => rmSync(outDir, { recursive: true, force: true });
  try {
    execFileSync(process.execPath, [join(PACKAGE_ROOT, 'node_modules', 'typescript', 'bin', 'tsc'), '-p', join(PACKAGE_ROOT, 'tsconfig.json'), '--outDir', outDir], {
      stdio: 'inherit',
    });
  } catch (error) {
    remove();
    throw error;
  }
  return { bin: join(outDir, 'harness', 'cli', 'main.js'), remove };
}

export interface CliRun {
  readonly code: number | null;
  readonly stdout: string;
  readonly stderr: string;
}

/** Runs the built bin as a user would, in `cwd` (the package root by default), as in CI. */
export function runCli(bin: string, args: readonly string[], cwd = PACKAGE_ROOT): CliRun {
  const run = spawnSync(process.execPath, [bin, ...args], { cwd, encoding: 'utf8', env: { ...process.env, CI: 'true' } });
  return { code: run.status, stdout: run.stdout, stderr: run.stderr };
}
