import { SPECIFICATION_SYNTAX } from './adapter-specification.js';
import { CHECK_OPTIONS, type OptionDeclaration } from './option-table.js';

const { timeout, size, samples, seed, alpha, ensemble, only, report, junit, html, verbose } = CHECK_OPTIONS;

/**
 * The `compare` command's options: the two sides, and the run options it shares with `check`
 * (taken from the check table, so they are declared once).
 */
export const COMPARE_OPTIONS = {
  left: {
    type: 'string',
    describe: `one implementation: ${SPECIFICATION_SYNTAX} (shown as "observed")`,
    group: 'Adapter',
  },
  right: {
    type: 'string',
    describe: `the other implementation, the same way (shown as "expected")`,
    group: 'Adapter',
  },
  timeout,
  size,
  samples,
  seed,
  alpha,
  ensemble,
  only,
  report: { ...report, describe: 'write the JSON report (the run result with its "comparison": both sides, the agreement table, the distinguishing checks) to this file' },
  junit,
  html,
  verbose,
} as const satisfies Record<string, OptionDeclaration>;
