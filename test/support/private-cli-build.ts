import { execFileSync, spawn, spawnSync } from 'node:child_process';
import { copyFileSync, mkdirSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll } from 'vitest';

/** The package root, where the CLI runs (examples/ resolve from here). */
export const PACKAGE_ROOT = join(import.meta.dirname, '..', '..');

/**
 * The CLI compiled into a folder of its own under test-artifacts/ (ignored by git), so test files
 * that run the built bin never read dist/ while another file's build is writing it. Node finds
 * node_modules by walking up from there, as it does from dist/. tsc copies package.json into the
 * folder, so the built code takes the folder for the package root (reference-values/package-root.ts)
 * and reads the certified tables from its reference-values/tables/: they are copied there, as an
 * installed package ships them beside its code.
 */
export function buildPrivateCli(name: string): { readonly bin: string; readonly remove: () => void } {
  const outDir = join(PACKAGE_ROOT, 'test-artifacts', `${name}-${process.pid}`);
  mkdirSync(outDir, { recursive: true });
  const remove = () => rmSync(outDir, { recursive: true, force: true });
  try {
    execFileSync(process.execPath, [join(PACKAGE_ROOT, 'node_modules', 'typescript', 'bin', 'tsc'), '-p', join(PACKAGE_ROOT, 'tsconfig.json'), '--outDir', outDir], {
      stdio: 'inherit',
    });
    copyCertifiedTables(outDir);
  } catch (error) {
    remove();
    throw error;
  }
  return { bin: join(outDir, 'harness', 'cli', 'main.js'), remove };
}

/**
 * The CLI built for one test file (in its beforeAll) with a scratch folder for the files its runs
 * write; both are removed in its afterAll. `bin()` is the built bin once beforeAll has run.
 */
export function privateCliForFile(name: string): { readonly bin: () => string; readonly folder: string } {
  let build: ReturnType<typeof buildPrivateCli> | undefined;
  const folder = mkdtempSync(join(tmpdir(), `rmt-assay-${name}-`));
  beforeAll(() => {
    build = buildPrivateCli(name);
  }, 120_000);
  afterAll(() => {
    build?.remove();
    rmSync(folder, { recursive: true, force: true });
  });
  return {
    bin: () => {
      if (build === undefined) throw new Error('the private CLI is built in beforeAll');
      return build.bin;
    },
    folder,
  };
}

function copyCertifiedTables(outDir: string): void {
  const from = join(PACKAGE_ROOT, 'reference-values', 'tables');
  const to = join(outDir, 'reference-values', 'tables');
  mkdirSync(to, { recursive: true });
  for (const file of readdirSync(from).filter((f) => f.endsWith('.json'))) copyFileSync(join(from, file), join(to, file));
}

export interface CliRun {
  readonly code: number | null;
  readonly stdout: string;
  readonly stderr: string;
}

const CLI_ENVIRONMENT = { ...process.env, CI: 'true' };

/** Runs the built bin as a user would, in `cwd` (the package root by default), as in CI. */
export function runCli(bin: string, args: readonly string[], cwd = PACKAGE_ROOT): CliRun {
  const run = spawnSync(process.execPath, [bin, ...args], { cwd, encoding: 'utf8', env: CLI_ENVIRONMENT });
  return { code: run.status, stdout: run.stdout, stderr: run.stderr };
}

/** Starts the built bin as runCli does without waiting for it, so that several runs (the shards of one run) go at once. */
export function startCli(bin: string, args: readonly string[], cwd = PACKAGE_ROOT): Promise<CliRun> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [bin, ...args], { cwd, env: CLI_ENVIRONMENT });
    let stdout = '';
    let stderr = '';
    child.stdout.setEncoding('utf8').on('data', (text: string) => (stdout += text));
    child.stderr.setEncoding('utf8').on('data', (text: string) => (stderr += text));
    child.on('error', reject);
    child.on('close', (code) => resolve({ code, stdout, stderr }));
  });
}
