import type { AdapterDescription } from '../../adapters/adapter.js';
import type { RawOutcome } from '../decide-verdicts.js';
import type { RunResult } from '../run-result.js';

/**
 * A reporter: optional hooks over the run. It sees the result model and progress events, never
 * harness internals. Where its output goes is decided by whoever builds it (a file, a stream).
 */
export interface Reporter {
  onRunStart?(info: { readonly adapter: AdapterDescription; readonly totalChecks: number }): void;
  onCheckFinished?(outcome: RawOutcome, finished: number, total: number): void;
  onRunEnd?(result: RunResult): void | Promise<void>;
}

/** Where a reporter's text goes. */
export interface TextSink {
  write(text: string): void;
}
