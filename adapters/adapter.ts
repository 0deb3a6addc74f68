import type { Complex } from '../harness/numeric/complex.js';
import type { EnsembleSpec } from '../harness/numeric/ensemble.js';
import type { SquareMatrix } from '../harness/numeric/square-matrix.js';

/**
 * What an implementation can do. A suite runs a check only when the adapter declares every
 * capability the check needs; the report lists what was skipped and why.
 * - eigenvalues:     the spectrum of a Hermitian matrix, ascending.
 * - resolvent_trace: ⟨G(z)A⟩ = Tr((H − z)⁻¹A)/N at given points, A = I when no weight is given.
 * - chain_trace:     ⟨G(z1)A1 ⋯ G(zk)Ak⟩.
 * - sample:          the implementation's own sampler for a named ensemble.
 */
export type Capability = 'eigenvalues' | 'resolvent_trace' | 'chain_trace' | 'sample';

export const ALL_CAPABILITIES: readonly Capability[] = ['eigenvalues', 'resolvent_trace', 'chain_trace', 'sample'];

export interface AdapterDescription {
  readonly name: string;
  readonly version: string;
  /** How the harness reached it: 'reference', 'module', 'process', 'recorded'. */
  readonly kind: string;
  readonly capabilities: readonly Capability[];
}

/**
 * The one interface through which the harness reaches an implementation. Every method is async,
 * since an implementation may live in another process. A method the description does not list
 * is never called.
 *
 * An adapter reports a misbehaving implementation by throwing `AdapterFault`; the harness turns it
 * into a verdict for the check that called it and carries on with the rest of the run.
 */
export interface Adapter {
  describe(): Promise<AdapterDescription>;
  eigenvalues(matrix: SquareMatrix): Promise<Float64Array>;
  resolventTrace(matrix: SquareMatrix, points: readonly Complex[], weight?: SquareMatrix): Promise<Complex[]>;
  chainTrace(matrix: SquareMatrix, points: readonly Complex[], weights: readonly SquareMatrix[]): Promise<Complex>;
  /**
   * `count` matrices from the implementation's own sampler. `seed` is the harness's stream seed
   * for this request; an implementation may use its own generator, so only the distribution is
   * checked, never the values. Throws `EnsembleNotOffered` for an ensemble it does not sample.
   */
  sample(ensemble: EnsembleSpec, size: number, seed: number, count: number): Promise<SquareMatrix[]>;
  /** Releases what the adapter holds (a child process, a file handle). Safe to call twice. */
  close(): Promise<void>;
}

export type AdapterFaultKind =
  | 'crashed'
  | 'timeout'
  | 'malformed-response'
  | 'invalid-value'
  | 'implementation-error'
  | 'unavailable';

/** A fault of the implementation, not of the harness: it becomes a verdict, not a crash. */
export class AdapterFault extends Error {
  override readonly name = 'AdapterFault';
  constructor(
    readonly method: string,
    readonly kind: AdapterFaultKind,
    message: string,
  ) {
    super(message);
  }
}

/**
 * The implementation cannot answer this particular request (an ensemble it does not sample, a case
 * it does not cover, a value a recording does not hold): the checks that need it are skipped, with
 * the message as the reason. Not a fault.
 */
export class NotAvailable extends Error {
  override readonly name: string = 'NotAvailable';
}

/** The implementation does not offer this ensemble; checks that need it are skipped. */
export class EnsembleNotOffered extends NotAvailable {
  override readonly name = 'EnsembleNotOffered';
  constructor(readonly ensemble: string) {
    super(`the implementation does not sample the ensemble ${ensemble}`);
  }
}
