import type { ProbeRoutine } from '../compare/probe-routines.js';
import type { ProbeWeight } from '../compare/probe-inputs.js';

/** A complex number as the file holds it. */
export type ComplexPair = readonly [number, number];

/** One routine's output on one probe matrix, as recorded. */
export interface RecordedOutput {
  readonly routine: ProbeRoutine;
  readonly ensemble: string;
  readonly size: number;
  /** Index of the probe matrix (stream 'probe/matrix' under the baseline's seed). */
  readonly matrix: number;
  /**
   * [Re Tr H, ‖H‖_F²] of the harness's matrix when recorded: a later harness that draws another
   * matrix from the same seed is told apart from an implementation whose output changed.
   */
  readonly inputFingerprint: ComplexPair;
  /** Eigenvalues (ascending), or the traces in the order of probe-routines.ts. */
  readonly values: ReadonlyArray<number> | ReadonlyArray<ComplexPair>;
}

/** The moments of one real statistic over the samples, for two-sample tests later. */
export interface RecordedStatistic {
  /** E.g. 'Re Tr G(0.5+0.5i)'. */
  readonly name: string;
  readonly point: ComplexPair;
  readonly part: 're' | 'im';
  readonly mean: number;
  readonly variance: number;
  readonly fourthCentralMoment: number;
}

/** The statistics of one ensemble and size, from the implementation's own samples. */
export interface RecordedSample {
  readonly ensemble: string;
  readonly size: number;
  readonly count: number;
  /** Where the matrices and statistics came from when recorded. */
  readonly path: string;
  readonly moments: readonly RecordedStatistic[];
}

/**
 * A regression baseline: an implementation's outputs on a fixed, seeded input set, recorded by
 * `rmt-assay baseline record` and compared with by `rmt-assay check --baseline FILE`. It holds no
 * matrix: the inputs are rebuilt from the seed and the probe set it names. Its JSON Schema is
 * baseline.schema.json beside this file.
 */
export interface BaselineFile {
  readonly format: 'rmt-assay-baseline';
  readonly formatVersion: 1;
  readonly tool: { readonly name: string; readonly version: string };
  readonly adapter: { readonly name: string; readonly version: string; readonly kind: string; readonly capabilities: readonly string[] };
  /** The CLI words that selected the implementation when recorded (for people; not used to check). */
  readonly adapterArguments: string;
  readonly seed: number;
  readonly sizes: readonly number[];
  /** Ensembles in the CLI syntax. */
  readonly ensembles: readonly string[];
  /** Samples per ensemble and size behind each statistic. */
  readonly samples: number;
  /** Largest ratio |now − recorded| / rounding-error scale that counts as unchanged. */
  readonly threshold: number;
  readonly inputs: {
    readonly matricesPerCase: number;
    readonly points: readonly ComplexPair[];
    readonly weights: readonly ProbeWeight[];
    readonly chains: ReadonlyArray<{ readonly points: readonly ComplexPair[]; readonly weights: readonly ProbeWeight[] }>;
    readonly statisticPoints: readonly ComplexPair[];
  };
  readonly outputs: readonly RecordedOutput[];
  readonly statistics: readonly RecordedSample[];
}

export const BASELINE_FORMAT = 'rmt-assay-baseline';
export const BASELINE_FORMAT_VERSION = 1;
