import type { Adapter, Capability } from '../adapters/adapter.js';
import type { Evidence } from './evidence.js';
import type { Exhibit } from './exhibit.js';
import type { RandomStream } from './numeric/random-stream.js';
import type { RunSettings } from './run-settings.js';
import type { SampledWork } from './sampled-work.js';

/** One check as the plan knows it before anything runs. */
export interface PlannedCheck {
  /** Unique and stable for a given seed and settings; `--only ID` replays it. */
  readonly id: string;
  readonly title: string;
  readonly parameters: Readonly<Record<string, string | number>>;
}

/** What running one check found. */
export type CheckFinding =
  | {
      readonly state: 'measured';
      readonly evidence: Evidence;
      /** Where the matrices and the statistic came from (implementation or harness). */
      readonly path: string;
      /** For a randomised check that failed: fast-check's path of the shrunk case, for `--case`. */
      readonly replayCase?: string;
      /** Data for a picture of what was measured. */
      readonly exhibit?: Exhibit;
    }
  | { readonly state: 'skipped'; readonly reason: string };

/** What concluding from gathered samples may consult: no adapter (a merge of shards has none open). */
export interface ConcludeContext {
  readonly capabilities: ReadonlySet<Capability>;
  readonly settings: RunSettings;
}

export interface CheckContext extends ConcludeContext {
  readonly adapter: Adapter;
  /** The random stream for draw `index` of the stream named `key`, under the run's seed. */
  stream(key: string, index: number): RandomStream;
  /** A 32-bit seed for an implementation's own sampler, derived from the run's seed. */
  derivedSeed(key: string, index: number): number;
}

interface GroupBase {
  readonly id: string;
  readonly suite: string;
  readonly checks: readonly PlannedCheck[];
  /** Why this group cannot run with these capabilities, or null when it can. */
  skipReason(capabilities: ReadonlySet<Capability>): string | null;
}

/** A group that runs in one piece (randomised identities, deterministic comparisons). */
export interface WholeGroup extends GroupBase {
  /** One finding per planned check, in the same order. */
  run(context: CheckContext): Promise<CheckFinding[]>;
}

/** A group whose samples are observed block by block, anywhere, and concluded from in one place. */
export interface SampledGroup<Part = unknown> extends GroupBase {
  readonly work: SampledWork<Part>;
}

/**
 * Checks that share their samples (for instance E⟨G(z)⟩ at several z from the same matrices) run
 * as one group; each yields its own verdict. A group is the unit of failure: an adapter fault
 * inside it faults each of its checks, and the rest of the run goes on.
 */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type CheckGroup = WholeGroup | SampledGroup<any>;

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export function isSampled(group: CheckGroup): group is SampledGroup<any> {
  return 'work' in group;
}

/** A property suite: given the settings, the groups of checks to run. */
export interface PropertySuite {
  readonly name: string;
  readonly description: string;
  plan(settings: RunSettings): CheckGroup[];
}
