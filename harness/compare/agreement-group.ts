import { RATIO_THRESHOLD } from '../../properties/identities/error-scales.js';
import type { CheckFinding, CheckGroup } from '../check-group.js';
import { ensembleLabel, type EnsembleSpec } from '../numeric/ensemble.js';
import type { RunSettings } from '../run-settings.js';
import { ratioTest } from '../tolerance-test.js';
import { AgreementTally } from './agreement-tally.js';
import type { RoutineAgreement } from './comparison-result.js';
import { onSide, type ComparedImplementation } from './compared-implementation.js';
import { describeProbeMatrix, probeMatrix, type ProbeInputs } from './probe-inputs.js';
import { probeAgreement, probeOutputs, type ProbeRoutine } from './probe-routines.js';

/** What an agreement check measured besides its verdict, for the agreement table. */
export type AgreementMeasurement = Omit<RoutineAgreement, 'threshold' | 'state' | 'replay'>;

/** Why each routine's ratio has the scale it has (shared with the baseline comparisons). */
export const AGREEMENT_TOLERANCE: Record<ProbeRoutine, string> = {
  eigenvalues:
    'max_i |Δλ_i| / (2Nε‖H‖₂): each backward-stable solver is exact for a matrix within Nε‖H‖₂ of H and Weyl’s inequality bounds the move ' +
    '(Golub and Van Loan 2013, §8.3.5; Horn and Johnson 2013, Cor. 4.3.15); 2 for the two results',
  resolvent_trace:
    '|Δ| / (2 s₁), s₁ = Nε‖A‖((‖H‖₂ + |z|)/d² + 1/d), d = dist(z, spectrum) from the harness’s eigenvalues (Higham 2002, §3.5; ' +
    'properties/identities/error-scales.ts); 2 for the two results; D = diag(1 + cos(2πi/N)/2)',
  chain_trace:
    '|Δ| / (2 s_k), s_k = Nε Π_j(‖A_j‖/d_j) Σ_j((‖H‖₂ + |z_j|)/d_j + 1) (Higham 2002, §3.5; properties/identities/error-scales.ts); ' +
    '2 for the two results; D = diag(1 + cos(2πi/N)/2)',
};

/**
 * One routine of both implementations on the same harness-drawn matrices (the probe set): the
 * worst difference over the matrices and outputs, as a ratio to the rounding error two
 * backward-stable results may carry together, held against the identities suite's threshold.
 * The relative difference and its digits go to `record` for the agreement table.
 */
export function agreementGroup(
  routine: ProbeRoutine,
  ensemble: EnsembleSpec,
  size: number,
  sides: readonly [ComparedImplementation, ComparedImplementation],
  settings: RunSettings,
  inputs: ProbeInputs,
  record: (measurement: AgreementMeasurement) => void,
): CheckGroup {
  const label = ensembleLabel(ensemble);
  const id = `compare/agreement/${routine.replace('_', '-')}/${label}/N=${size}`;
  const [left, right] = sides;
  return {
    id,
    suite: 'compare',
    checks: [
      {
        id,
        title: `${routine} agree on the same matrices within the rounding error of two backward-stable results`,
        parameters: { routine, ensemble: label, N: size, matrices: inputs.matricesPerCase },
      },
    ],
    skipReason() {
      const offering = sides.filter((s) => s.description.capabilities.includes(routine));
      if (offering.length === 2) return null;
      if (offering.length === 0) return `neither side offers ${routine}`;
      return `only the ${offering[0].role} side (${offering[0].description.name}) offers ${routine}`;
    },
    async run(): Promise<CheckFinding[]> {
      const tally = new AgreementTally();
      for (let i = 0; i < inputs.matricesPerCase; i++) {
        const matrix = probeMatrix(settings.seed, ensemble, size, i);
        const l = await onSide(left, () => probeOutputs(left.adapter, routine, matrix, inputs));
        const r = await onSide(right, () => probeOutputs(right.adapter, routine, matrix, inputs));
        tally.add(probeAgreement(routine, l, r, matrix, inputs, describeProbeMatrix(settings.seed, ensemble, size, i)));
      }
      const worst = tally.worst;
      record({
        checkId: id,
        routine,
        ensemble: label,
        size,
        inputs: tally.count,
        maxRelativeDifference: tally.maxRelativeDifference,
        digits: tally.digits,
        ratio: worst.ratio,
        worstInput: worst.where,
      });
      return [
        {
          state: 'measured',
          path: `matrices: harness sampler (probe set, ${inputs.matricesPerCase} per case); statistic: both sides' ${routine}`,
          evidence: ratioTest({
            observed: worst.left,
            expected: worst.right,
            expectedSource: `the right side (${right.description.name} ${right.description.version}) on the same matrix; left is ${left.description.name} ${left.description.version}`,
            scale: worst.scale,
            threshold: RATIO_THRESHOLD,
            toleranceReason: AGREEMENT_TOLERANCE[routine],
            worstInput: worst.where,
          }),
        },
      ];
    },
  };
}
