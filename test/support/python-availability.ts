import { spawnSync } from 'node:child_process';

/** Whether python3 with numpy runs here; tests that need it skip, saying why, when it does not. */
const probe = spawnSync('python3', ['-c', 'import numpy; print(numpy.__version__)'], { encoding: 'utf8' });
export const hasNumpy = probe.status === 0;
export const numpyMissingReason = hasNumpy ? '' : `python3 with numpy is not available (${probe.error?.message ?? probe.stderr.trim()})`;
