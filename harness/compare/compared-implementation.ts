import { AdapterFault, NotAvailable, type Adapter, type AdapterDescription } from '../../adapters/adapter.js';

/** One of the two implementations of a comparison, with what it said of itself. */
export interface ComparedImplementation {
  readonly role: 'left' | 'right';
  readonly adapter: Adapter;
  readonly description: AdapterDescription;
}

/**
 * Runs a call on one side, so that a fault or a refusal names the side it came from
 * ("right: eigenvalues: …") in the verdict of the check that made the call.
 */
export async function onSide<T>(side: ComparedImplementation, call: () => Promise<T>): Promise<T> {
  try {
    return await call();
  } catch (error) {
    if (error instanceof AdapterFault) throw new AdapterFault(`${side.role} (${side.description.name}) ${error.method}`, error.kind, error.message);
    if (error instanceof NotAvailable) throw new NotAvailable(`${side.role} (${side.description.name}): ${error.message}`);
    throw error;
  }
}
