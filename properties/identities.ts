import type { PropertySuite } from '../harness/check-group.js';
import type { RunSettings } from '../harness/run-settings.js';
import { chainCyclicity } from './identities/chain-cyclicity.js';
import { conjugationSymmetry } from './identities/conjugation-symmetry.js';
import { eigenvalueCount, eigenvalueOrder, eigenvalueSquares, eigenvalueTrace } from './identities/eigenvalue-invariants.js';
import { herglotzSign, resolventBound } from './identities/herglotz-property.js';
import { randomisedIdentityGroup, type RandomisedIdentity } from './identities/randomised-identity-check.js';
import { chainAgreement, eigenvalueAgreement, resolventAgreement } from './identities/reference-agreement.js';
import { resolventIdentity } from './identities/resolvent-identity.js';
import { spectralSum } from './identities/spectral-sum.js';
import { wardIdentity } from './identities/ward-identity.js';
import { weightLinearity } from './identities/weight-linearity.js';

/** Every check of the suite, in report order. */
function identityChecks(settings: RunSettings): RandomisedIdentity<object>[] {
  return [
    eigenvalueCount(settings),
    eigenvalueOrder(settings),
    eigenvalueTrace(settings),
    eigenvalueSquares(settings),
    eigenvalueAgreement(settings),
    resolventAgreement(settings),
    chainAgreement(settings),
    resolventIdentity(settings),
    conjugationSymmetry(settings),
    herglotzSign(settings),
    resolventBound(settings),
    wardIdentity(settings),
    weightLinearity(settings),
    chainCyclicity(settings),
    spectralSum(settings),
  ] as RandomisedIdentity<object>[];
}

/**
 * Exact per-matrix identities, randomised with fast-check: each check is a property over random
 * cases (N, the ensemble, the matrix's stream index, spectral parameters, weights), held to a
 * normalised rounding-error ratio (LAPACK test-program style) against one threshold; a failure is
 * shrunk to the smallest case fast-check finds and can be replayed with `--only ID --case PATH`.
 */
export const identitiesSuite: PropertySuite = {
  name: 'identities',
  description:
    'Exact per-matrix identities on random cases: agreement with the reference engine, the resolvent and Ward identities, conjugation ' +
    'symmetry, the Herglotz property and the resolvent bound, linearity in the weight, cyclicity of chains, the spectral sum, and ' +
    'the eigenvalues’ count, order, trace and sum of squares.',
  plan: (settings) => identityChecks(settings).map((check) => randomisedIdentityGroup(check, settings)),
};
