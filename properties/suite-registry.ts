import type { PropertySuite } from '../harness/check-group.js';
import { fluctuationsSuite } from './fluctuations.js';
import { identitiesSuite } from './identities.js';
import { semicircleSuite } from './semicircle.js';

/** Every suite by its name on the command line. */
export const SUITES: ReadonlyMap<string, PropertySuite> = new Map([
  [semicircleSuite.name, semicircleSuite],
  [identitiesSuite.name, identitiesSuite],
  [fluctuationsSuite.name, fluctuationsSuite],
]);

export function suiteNames(): string[] {
  return [...SUITES.keys()];
}
