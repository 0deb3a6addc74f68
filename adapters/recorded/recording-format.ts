import type { Capability } from '../adapter.js';
import type { WireMatrix } from '../process/matrix-codec.js';
import type { ProtocolMethod } from '../process/protocol-schemas.js';

/**
 * A recording (recording.schema.json): calls to an implementation with its answers, in the
 * process protocol's own params and result forms. Matrices are stored once, in `matrices`, and a
 * params or result member that holds a matrix may instead hold `{"ref": k}`, the index of one
 * there: a sampled matrix and the eigenvalue call made on it share one copy.
 */
export const RECORDING_FORMAT = 'rmt-assay-recording';
export const RECORDING_FORMAT_VERSION = 1;

export type RecordedMethod = Exclude<ProtocolMethod, 'describe'>;

export interface MatrixRef {
  readonly ref: number;
}

export interface RecordedCall {
  readonly method: RecordedMethod;
  readonly params: Record<string, unknown>;
  readonly result?: Record<string, unknown>;
  readonly error?: { readonly code: number; readonly message: string };
}

export interface Recording {
  readonly format: typeof RECORDING_FORMAT;
  readonly formatVersion: typeof RECORDING_FORMAT_VERSION;
  readonly implementation: { readonly name: string; readonly version: string };
  readonly capabilities: readonly Capability[];
  readonly recordedWith?: string;
  readonly matrices?: readonly WireMatrix[];
  readonly calls: readonly RecordedCall[];
}

/** The members of params and results that hold matrices, and whether they hold a list of them. */
export const MATRIX_MEMBERS: Readonly<Record<string, 'one' | 'list'>> = {
  matrix: 'one',
  weight: 'one',
  weights: 'list',
  matrices: 'list',
};

/** The members of params that hold chains ({points, weights}), whose weights are matrices too. */
export const CHAIN_MEMBERS: Readonly<Record<string, 'one' | 'list'>> = {
  left: 'one',
  right: 'one',
  statistics: 'list',
};
