import type { PropertySuite } from '../harness/check-group.js';
import { kolmogorovDecayGroup } from './semicircle/kolmogorov-decay-group.js';
import { momentGroup } from './semicircle/moment-group.js';
import { stieltjesMeanGroup } from './semicircle/stieltjes-mean-group.js';

/**
 * The law of large numbers for the spectrum: E⟨G(z)⟩ against the Stieltjes transform of the
 * semicircle (with its 1/N correction), the even moments against their finite-N values, and the
 * rate at which the empirical spectral distribution approaches the semicircle.
 */
export const semicircleSuite: PropertySuite = {
  name: 'semicircle',
  description:
    'Semicircle law: E⟨G(z)⟩ = m(z) + δ(z)/N over the bulk, the edge and outside the spectrum; E⟨H^2k⟩ against exact or corrected values; Kolmogorov distance decaying like 1/N.',
  plan: (settings) =>
    settings.ensembles.flatMap((ensemble) => [
      ...settings.sizes.flatMap((size) => [stieltjesMeanGroup(ensemble, size, settings), momentGroup(ensemble, size, settings)]),
      kolmogorovDecayGroup(ensemble, settings),
    ]),
};
