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
 * - covariance:      the limiting covariance the implementation claims for the Tr statistics of two
 *                    chains (`Adapter.covariance`).
 * - sample_statistics: per-sample normalised chain traces of matrices the implementation draws and
 *                    never hands over (`Adapter.sampleStatistics`).
 */
export type Capability = 'eigenvalues' | 'resolvent_trace' | 'chain_trace' | 'sample' | 'covariance' | 'sample_statistics';

export const ALL_CAPABILITIES: readonly Capability[] = [
  'eigenvalues',
  'resolvent_trace',
  'chain_trace',
  'sample',
  'covariance',
  'sample_statistics',
];

/**
 * A chain G(z1)A1 G(z2)A2 ⋯ G(zk)Ak: the spectral parameters and one weight per parameter (the
 * identity for an unweighted resolvent). No points is the empty chain, whose normalised trace is
 * ⟨I⟩ = 1 and whose Tr statistic (N⟨I⟩ minus its mean) is 0.
 */
export interface ChainSpec {
  readonly points: readonly Complex[];
  readonly weights: readonly SquareMatrix[];
}

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
  /**
   * The limiting bilinear covariance lim_{N→∞} Cov(Tr(left) − E, Tr(right) − E) (no conjugation)
   * that the implementation claims for the Tr statistics of two chains of `ensemble`; the weights'
   * size is the N at which their normalised traces are taken. Throws `NotAvailable` for a case it
   * does not offer. Optional: called only when the description declares 'covariance'.
   */
  covariance?(ensemble: EnsembleSpec, left: ChainSpec, right: ChainSpec): Promise<Complex>;
  /**
   * `count` samples of `ensemble` at size N drawn by the implementation under `seed` (only the
   * distribution is checked); for each sample, for each chain in order, the normalised trace
   * ⟨G(z1)A1 ⋯ G(zk)Ak⟩ as chain_trace returns it (1 for the empty chain). The harness multiplies
   * by N and centres. Throws `EnsembleNotOffered` for an ensemble it does not sample. Optional:
   * called only when the description declares 'sample_statistics'.
   */
  sampleStatistics?(
    ensemble: EnsembleSpec,
    size: number,
    seed: number,
    count: number,
    statistics: readonly ChainSpec[],
  ): Promise<Complex[][]>;
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
