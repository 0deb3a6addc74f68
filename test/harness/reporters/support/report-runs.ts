import { AdapterFault, NotAvailable } from '../../../../adapters/adapter.js';
import { runChecks } from '../../../../harness/run-checks.js';
import type { RunResult } from '../../../../harness/run-result.js';
import { semicircleSuite } from '../../../../properties/semicircle.js';
import { mutantAdapter, reference } from '../../../support/mutant-adapter.js';
import { testSettings } from '../../../support/run-settings-for-tests.js';
import { powerTraceSuite } from './power-trace-suite.js';

/** Small settings: enough for every check to say something, quick enough for the report tests. */
const SMALL = { sizes: [60], ladder: [40, 60, 90], samples: 100, seed: 20260101 };

/** Markup, quotes, entities and a control character: what an untrusted string may hold. */
export const HOSTILE = {
  name: `<script>alert(1)</script> "quotes" &amp; 'apostrophes'`,
  version: '<b>1.0</b>',
  fault: `<img src=x onerror="alert(2)"> broke: "bad" & 'worse' ]]> \u0001 end`,
  notOffered: '<i>GUE</i> & "friends"',
  label: '<svg onload=alert(4)>GOE&lt;',
  log: '<script>alert(3)</script> the implementation said & left\n',
} as const;

/**
 * The semicircle suite and the power-trace suite on the reference engine: every check passes and
 * the run carries all four kinds of exhibit.
 */
export function referenceRun(): Promise<RunResult> {
  return runChecks(reference, testSettings(SMALL), [semicircleSuite, powerTraceSuite(30, 200)]);
}

/**
 * An implementation with markup in its name, version, messages and log, and in the labels the
 * checks carry: a sampler √2 too wide (its GOE checks fail, with pictures), no resolvent of a
 * complex matrix (GUE's Stieltjes checks are skipped, the reason in markup), and eigenvalues of a
 * complex matrix that fault with a message in markup.
 */
export function hostileRun(): Promise<RunResult> {
  const adapter = mutantAdapter(
    HOSTILE.name,
    {
      sample: async (ensemble, n, seed, count) =>
        (await reference.sample(ensemble, n, seed, count)).map((m) => ({ ...m, data: m.data.map((x) => x * Math.SQRT2) })),
      eigenvalues: async (m) => {
        if (m.field === 'complex') throw new AdapterFault('eigenvalues', 'implementation-error', HOSTILE.fault);
        return reference.eigenvalues(m);
      },
      resolventTrace: async (m, points, weight) => {
        if (m.field === 'complex') throw new NotAvailable(HOSTILE.notOffered);
        return reference.resolventTrace(m, points, weight);
      },
    },
    ['sample', 'eigenvalues', 'resolvent_trace'],
  );
  const described = { ...adapter, describe: async () => ({ ...(await adapter.describe()), version: HOSTILE.version }) };
  return runChecks(
    described,
    testSettings({ ...SMALL, ensembles: [{ kind: 'goe' }, { kind: 'gue' }] }),
    [semicircleSuite, powerTraceSuite(30, 50, HOSTILE.label)],
    {},
    () => HOSTILE.log,
  );
}
