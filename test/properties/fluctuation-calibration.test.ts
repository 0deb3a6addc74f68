import { describe, expect, it } from 'vitest';
import { parseEnsemble } from '../../harness/numeric/ensemble.js';
import { runChecks } from '../../harness/run-checks.js';
import { fluctuationsSuite } from '../../properties/fluctuations.js';
import { reference } from '../support/mutant-adapter.js';
import { testSettings } from '../support/run-settings-for-tests.js';

/**
 * The calibration behind properties/fluctuations/fluctuation-allowances.ts, run by hand (hours of
 * CPU): RMT_ASSAY_CALIBRATE=1 npx vitest run test/properties/fluctuation-calibration.test.ts.
 * For every statistical check of the suite it runs the reference engine with many samples and
 * reports the allowance constant the observed deviation would need, C_needed = C·(|obs − exp|)/allowance,
 * with its statistical uncertainty; each must sit below the constant in use (the constants carry a
 * margin of about three over the largest C_needed seen).
 */
const ENSEMBLES = ['goe', 'gue', 'wigner:real:rademacher:diag=zero', 'wigner:real:gaussian:diag=zero', 'wigner:complex:rademacher:diag=gaussian:1'];
const CASES: ReadonlyArray<[number, number]> = [
  [50, 30],
  [100, 8],
];

describe.skipIf(process.env.RMT_ASSAY_CALIBRATE === undefined)('fluctuation allowances (calibration, by hand)', () => {
  for (const [size, budget] of CASES) {
    for (const label of ENSEMBLES) {
      it(`${label} at N = ${size}, budget ${budget}`, async () => {
        const result = await runChecks(reference, testSettings({ sizes: [size], ensembles: [parseEnsemble(label)], budget, seed: 97 }), [fluctuationsSuite]);
        const rows: string[] = [];
        for (const c of result.suites[0].checks) {
          const e = c.evidence;
          if (e?.kind !== 'statistical' || e.allowance <= 0) continue;
          const obs = typeof e.observed === 'number' ? [e.observed] : [e.observed.re, e.observed.im];
          const exp = typeof e.expected === 'number' ? [e.expected] : [e.expected.re, e.expected.im];
          const se = typeof e.standardError === 'number' ? [e.standardError] : [e.standardError.re, e.standardError.im];
          const share = Math.max(...obs.map((o, k) => Math.abs(o - exp[k]) / e.allowance));
          const noise = Math.max(...se.map((s) => s / e.allowance));
          rows.push(`${c.id.padEnd(90)} allowance share ${share.toFixed(3)} ± ${noise.toFixed(3)}  z ${e.zScore.toFixed(2)}`);
        }
        process.stdout.write(`${rows.join('\n')}\n`);
        expect(result.counts.fail).toBe(0);
      }, 3_600_000);
    }
  }
});
