import type { PropertySuite } from '../harness/check-group.js';
import { covarianceFunctionGroup } from './fluctuations/covariance-function-group.js';
import { decorrelationGroup, fluctuationMainGroup } from './fluctuations/fluctuation-group.js';

/**
 * Gaussian fluctuations of Wigner matrices (issue items 1–7): the covariances of resolvent, chain,
 * weighted, linear and mesoscopic trace statistics against their limits (exact finite-N values
 * where known), the mean corrections, Wick factorisation through joint cumulants, independence of
 * consecutive samples, and an implementation's own covariance function. Statistics come from the
 * implementation's sample_statistics when it offers them, else from its sampler's matrices through
 * the harness's engine.
 */
export const fluctuationsSuite: PropertySuite = {
  name: 'fluctuations',
  description:
    'Gaussian fluctuations: covariances of Tr G(z), identity chains, weighted resolvents, linear and mesoscopic statistics against ' +
    'their limits or exact finite-N values; mean corrections; Wick factorisation (joint cumulants); independence of consecutive ' +
    "samples; an implementation's covariance function (symmetry, empty chain, closed forms, Monte Carlo).",
  plan: (settings) => {
    const plans = settings.ensembles.flatMap((ensemble) => [
      ...settings.sizes.flatMap((size) => [fluctuationMainGroup(ensemble, size, settings), decorrelationGroup(ensemble, size, settings)]),
      ...settings.sizes.map((size) => covarianceFunctionGroup(ensemble, size, settings)),
    ]);
    const power = { alpha: settings.alpha, familySize: plans.reduce((n, p) => n + p.statisticalChecks, 0) };
    return plans.map((p) => p.group(power));
  },
};
