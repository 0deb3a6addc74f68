import type { PropertySuite } from '../check-group.js';
import { agreementGroup, type AgreementMeasurement } from './agreement-group.js';
import type { ComparedImplementation } from './compared-implementation.js';
import { fluctuationComparisonGroup } from './fluctuation-comparison-group.js';
import type { ProbeInputs } from './probe-inputs.js';
import { PROBE_ROUTINES } from './probe-routines.js';

export const COMPARISON_SUITE_NAME = 'compare';

/**
 * Two implementations side by side, per ensemble and size: each per-matrix routine both offer, on
 * the same harness-drawn matrices (agreement within rounding), and, where both draw their own
 * matrices, two-sample tests on the fluctuations of Tr G(z) (means, covariances, distributions).
 * The groups call the two sides they were built with; the run's own adapter is not used.
 */
export function comparisonSuite(
  sides: readonly [ComparedImplementation, ComparedImplementation],
  inputs: ProbeInputs,
  record: (measurement: AgreementMeasurement) => void,
): PropertySuite {
  return {
    name: COMPARISON_SUITE_NAME,
    description:
      'Two implementations on the same inputs: per-routine agreement (eigenvalues, ⟨G(z)A⟩, chains) within the rounding error of two ' +
      'backward-stable results, and two-sample tests (means, covariances, Kolmogorov–Smirnov) on the fluctuations of Tr G(z) where both sample.',
    plan: (settings) =>
      settings.ensembles.flatMap((ensemble) =>
        settings.sizes.flatMap((size) => [
          ...PROBE_ROUTINES.map((routine) => agreementGroup(routine, ensemble, size, sides, settings, inputs, record)),
          fluctuationComparisonGroup(ensemble, size, sides, settings, inputs),
        ]),
      ),
  };
}
