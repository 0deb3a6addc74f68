import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { dirname, join, relative } from 'node:path';

/**
 * The demo: checks release 2.0 of a fictitious lab's spectral kernel (correct) and release 2.1
 * (a subtle normalisation regression) with the semicircle suite, through the real CLI. It exits 0
 * when 2.0 passes and 2.1 is caught, which is what should happen.
 */
const packageRoot = join(dirname(fileURLToPath(import.meta.url)), '..', '..', '..');
const cli = join(packageRoot, 'dist', 'harness', 'cli', 'main.js');
const kernelFolder = join(packageRoot, 'examples', 'demo', 'lab-kernel');

const common = ['--suite', 'semicircle,identities', '--ensemble', 'goe', '--size', '100', '--ladder', '50,100,200', '--samples', '150', '--seed', '7'];

function check(release: string): number {
  const module = relative(process.cwd(), join(kernelFolder, `spectral-kernel-${release}.mjs`));
  process.stdout.write(`\n=== demo: rmt-assay check --module ${module} ${common.join(' ')}\n`);
  const run = spawnSync(process.execPath, [cli, 'check', '--module', module, ...common], { stdio: 'inherit' });
  return run.status ?? -1;
}

const correct = check('2.0');
const regressed = check('2.1');
const asExpected = correct === 0 && regressed === 1;
process.stdout.write(
  asExpected
    ? '\ndemo: as expected. Release 2.0 passes; release 2.1\'s regression is caught (exit code 1), with the failing checks, their evidence and replay commands above.\n'
    : `\ndemo: NOT as expected: release 2.0 exited ${correct} (expected 0), release 2.1 exited ${regressed} (expected 1).\n`,
);
process.exit(asExpected ? 0 : 1);
