import { AdapterFault, type Adapter, type Capability } from '../../adapters/adapter.js';
import { offeringOnly } from '../../adapters/capability-filter.js';
import { ProcessAdapter } from '../../adapters/process/process-adapter.js';
import { RecordedAdapter, RecordingError } from '../../adapters/recorded/recorded-adapter.js';
import { ModuleAdapter, ModuleLoadError } from '../../adapters/module-adapter.js';
import { ReferenceAdapter } from '../../adapters/reference-adapter.js';
import { shellQuote } from '../replay-command.js';
import { UsageError } from './usage-error.js';

export interface AdapterChoice {
  readonly module?: string;
  readonly exec?: string;
  readonly recorded?: string;
  /** Capabilities to use (all the implementation declares when absent). */
  readonly offer?: readonly Capability[];
  /** Seconds to wait for one answer of an --exec program. */
  readonly timeoutSeconds: number;
}

export interface OpenedAdapter {
  readonly adapter: Adapter;
  /** The CLI words that select it again, for replay commands. */
  readonly arguments: string;
  readonly log: () => string;
}

/** The adapter the options name, restricted to the capabilities of --offer. */
export async function openAdapter(choice: AdapterChoice): Promise<OpenedAdapter> {
  const opened = await openNamedAdapter(choice);
  if (choice.offer === undefined) return opened;
  return {
    adapter: offeringOnly(opened.adapter, choice.offer),
    arguments: `${opened.arguments} --offer ${choice.offer.join(',')}`.trim(),
    log: opened.log,
  };
}

/** The adapter the options name: a module, a program, a recording, or the built-in reference engine by default. */
async function openNamedAdapter(choice: AdapterChoice): Promise<OpenedAdapter> {
  const chosen = [choice.module, choice.exec, choice.recorded].filter((c) => c !== undefined);
  if (chosen.length > 1) throw new UsageError('name one implementation: --module, --exec or --recorded, not two');
  if (choice.recorded !== undefined) {
    try {
      return { adapter: RecordedAdapter.load(choice.recorded), arguments: `--recorded ${shellQuote(choice.recorded)}`, log: () => '' };
    } catch (error) {
      if (error instanceof RecordingError) throw new UsageError(error.message);
      throw error;
    }
  }
  if (choice.exec !== undefined) {
    if (choice.exec.trim() === '') throw new UsageError('--exec needs a command');
    try {
      const adapter = await ProcessAdapter.start(choice.exec, { timeoutMs: choice.timeoutSeconds * 1000 });
      return { adapter, arguments: `--exec ${shellQuote(choice.exec)}`, log: () => adapter.log() };
    } catch (error) {
      if (error instanceof AdapterFault) throw new UsageError(`the program '${choice.exec}' cannot run: ${error.message}`);
      throw error;
    }
  }
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
