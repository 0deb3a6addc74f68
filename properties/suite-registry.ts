import type { PropertySuite } from '../harness/check-group.js';
import { semicircleSuite } from './semicircle.js';

/** Every suite by its name on the command line. */
export const SUITES: ReadonlyMap<string, PropertySuite> = new Map([[semicircleSuite.name, semicircleSuite]]);

export function suiteNames(): string[] {
  return [...SUITES.keys()];
}
