import type { Adapter } from '../../adapters/adapter.js';
import { ModuleAdapter, ModuleLoadError } from '../../adapters/module-adapter.js';
import { ReferenceAdapter } from '../../adapters/reference-adapter.js';
import { shellQuote } from '../replay-command.js';
import { UsageError } from './usage-error.js';

export interface AdapterChoice {
  readonly module?: string;
}

export interface OpenedAdapter {
  readonly adapter: Adapter;
  /** The CLI words that select it again, for replay commands. */
  readonly arguments: string;
  readonly log: () => string;
}

/** The adapter the options name: a module, or the built-in reference engine by default. */
export async function openAdapter(choice: AdapterChoice): Promise<OpenedAdapter> {
  if (choice.module !== undefined) {
    try {
      const adapter = await ModuleAdapter.load(choice.module);
      return { adapter, arguments: `--module ${shellQuote(choice.module)}`, log: () => '' };
    } catch (error) {
      if (error instanceof ModuleLoadError) throw new UsageError(error.message);
      throw error;
    }
  }
  return { adapter: new ReferenceAdapter(), arguments: '', log: () => '' };
}
