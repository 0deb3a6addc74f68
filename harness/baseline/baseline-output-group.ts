import type { CheckFinding, CheckGroup } from '../check-group.js';
import { AGREEMENT_TOLERANCE } from '../compare/agreement-group.js';
import { AgreementTally } from '../compare/agreement-tally.js';
import { describeProbeMatrix, probeMatrix } from '../compare/probe-inputs.js';
import { probeAgreement, probeOutputs, type ProbeRoutine } from '../compare/probe-routines.js';
import { parseEnsemble } from '../numeric/ensemble.js';
import { ratioTest } from '../tolerance-test.js';
import type { BaselineFile, RecordedOutput } from './baseline-file.js';
import { inputFingerprint, sameInput } from './input-fingerprint.js';
import { recordedProbeInputs, recordedProbeOutput } from './recorded-inputs.js';

/** Who recorded the baseline, for sources and reasons. */
export function recordedBy(baseline: BaselineFile): string {
  return `${baseline.adapter.name} ${baseline.adapter.version} (recorded with ${baseline.tool.name} ${baseline.tool.version})`;
}

/**
 * One routine's outputs now against the recorded ones, on the same probe matrices (rebuilt from
 * the baseline's seed): the worst difference as a ratio to the rounding error two
 * backward-stable results may carry, held against the threshold the baseline states. A probe
 * matrix that the harness no longer draws the same way skips the check (re-record), rather than
 * blaming the implementation.
 */
export function baselineOutputGroup(baseline: BaselineFile, file: string, routine: ProbeRoutine, recorded: readonly RecordedOutput[]): CheckGroup {
  const { ensemble: label, size } = recorded[0];
  const ensemble = parseEnsemble(label);
  const inputs = recordedProbeInputs(baseline);
  const id = `baseline/${routine.replace('_', '-')}/${label}/N=${size}`;
  return {
    id,
    suite: 'baseline',
    checks: [
      {
        id,
        title: `${routine} unchanged since the baseline, within the rounding error of two backward-stable results`,
        parameters: { routine, ensemble: label, N: size, matrices: recorded.length, baseline: file },
      },
    ],
    skipReason: (capabilities) =>
      capabilities.has(routine) ? null : `the implementation no longer offers ${routine}; the baseline has it from ${recordedBy(baseline)}`,
    async run(context): Promise<CheckFinding[]> {
      const tally = new AgreementTally();
      for (const entry of recorded) {
        const matrix = probeMatrix(baseline.seed, ensemble, size, entry.matrix);
        const where = describeProbeMatrix(baseline.seed, ensemble, size, entry.matrix);
        if (!sameInput(inputFingerprint(matrix), entry.inputFingerprint)) {
          return [
            {
              state: 'skipped',
              reason: `the harness now draws a different probe matrix (${where}) than ${baseline.tool.name} ${baseline.tool.version} did when the baseline was recorded: record it again with this version`,
            },
          ];
        }
        const now = await probeOutputs(context.adapter, routine, matrix, inputs);
        tally.add(probeAgreement(routine, now, recordedProbeOutput(entry), matrix, inputs, where));
      }
      const worst = tally.worst;
      return [
        {
          state: 'measured',
          path: `matrices: harness sampler (probe set of the baseline ${file}); statistic: implementation's ${routine}, now and as recorded`,
          evidence: ratioTest({
            observed: worst.left,
            expected: worst.right,
            expectedSource: `the baseline ${file}: ${recordedBy(baseline)}, on the same matrix; ${tally.digits.toFixed(1)} digits agree at worst`,
            scale: worst.scale,
            threshold: baseline.threshold,
            toleranceReason: `${AGREEMENT_TOLERANCE[routine]}; threshold ${baseline.threshold} stated in the baseline`,
            worstInput: worst.where,
          }),
        },
      ];
    },
  };
}
