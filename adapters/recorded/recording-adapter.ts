import { writeFileSync } from 'node:fs';
import type { Complex } from '../../harness/numeric/complex.js';
import type { EnsembleSpec } from '../../harness/numeric/ensemble.js';
import type { SquareMatrix } from '../../harness/numeric/square-matrix.js';
import { AdapterFault, EnsembleNotOffered, NotAvailable, type Adapter, type AdapterDescription, type ChainSpec } from '../adapter.js';
import { PROTOCOL_ERROR_CODES } from '../process/protocol-error-codes.js';
import { protocolResultOf } from '../process/protocol-results.js';
import { requestParams } from '../process/request-params.js';
import { MatrixStore } from './matrix-store.js';
import { RECORDING_FORMAT, RECORDING_FORMAT_VERSION, type RecordedCall, type RecordedMethod, type Recording } from './recording-format.js';

/**
 * Any adapter, with every call it answers written down: `rmt-assay check --record-to FILE`.
 * The recording can be checked again later with `--recorded FILE` (the same options give the same
 * inputs), or serve as a list of inputs that a program elsewhere (an HPC job) answers with its own
 * results before the check.
 */
export class RecordingAdapter implements Adapter {
  private readonly calls: RecordedCall[] = [];
  private readonly store = new MatrixStore();

  constructor(private readonly inner: Adapter) {}

  describe(): Promise<AdapterDescription> {
    return this.inner.describe();
  }

  private async recorded<T>(method: RecordedMethod, params: Record<string, unknown>, call: () => Promise<T>, toResult: (value: T) => Record<string, unknown>): Promise<T> {
    const stored = this.store.withRefs(params);
    try {
      const value = await call();
      this.calls.push({ method, params: stored, result: this.store.withRefs(toResult(value)) });
      return value;
    } catch (error) {
      const code =
        error instanceof EnsembleNotOffered
          ? PROTOCOL_ERROR_CODES.ensembleNotOffered
          : error instanceof NotAvailable
            ? PROTOCOL_ERROR_CODES.notAvailable
            : error instanceof AdapterFault
              ? PROTOCOL_ERROR_CODES.computationFailed
              : undefined;
      if (code !== undefined) this.calls.push({ method, params: stored, error: { code, message: (error as Error).message } });
      throw error;
    }
  }

  eigenvalues(matrix: SquareMatrix): Promise<Float64Array> {
    return this.recorded('eigenvalues', requestParams.eigenvalues(matrix), () => this.inner.eigenvalues(matrix), protocolResultOf.eigenvalues);
  }

  resolventTrace(matrix: SquareMatrix, points: readonly Complex[], weight?: SquareMatrix): Promise<Complex[]> {
    return this.recorded(
      'resolvent_trace',
      requestParams.resolventTrace(matrix, points, weight),
      () => this.inner.resolventTrace(matrix, points, weight),
      protocolResultOf.resolventTrace,
    );
  }

  chainTrace(matrix: SquareMatrix, points: readonly Complex[], weights: readonly SquareMatrix[]): Promise<Complex> {
    return this.recorded(
      'chain_trace',
      requestParams.chainTrace(matrix, points, weights),
      () => this.inner.chainTrace(matrix, points, weights),
      protocolResultOf.chainTrace,
    );
  }

  sample(ensemble: EnsembleSpec, size: number, seed: number, count: number): Promise<SquareMatrix[]> {
    return this.recorded(
      'sample',
      requestParams.sample(ensemble, size, seed, count) as unknown as Record<string, unknown>,
      () => this.inner.sample(ensemble, size, seed, count),
      protocolResultOf.sample,
    );
  }

  covariance(ensemble: EnsembleSpec, left: ChainSpec, right: ChainSpec): Promise<Complex> {
    return this.recorded(
      'covariance',
      requestParams.covariance(ensemble, left, right) as unknown as Record<string, unknown>,
      () => this.inner.covariance!(ensemble, left, right),
      protocolResultOf.covariance,
    );
  }

  sampleStatistics(ensemble: EnsembleSpec, size: number, seed: number, count: number, statistics: readonly ChainSpec[]): Promise<Complex[][]> {
    return this.recorded(
      'sample_statistics',
      requestParams.sampleStatistics(ensemble, size, seed, count, statistics) as unknown as Record<string, unknown>,
      () => this.inner.sampleStatistics!(ensemble, size, seed, count, statistics),
      protocolResultOf.sampleStatistics,
    );
  }

  /** The recording so far. */
  async recording(recordedWith: string): Promise<Recording> {
    const d = await this.inner.describe();
    return {
      format: RECORDING_FORMAT,
      formatVersion: RECORDING_FORMAT_VERSION,
      implementation: { name: d.name, version: d.version },
      capabilities: d.capabilities,
      recordedWith,
      matrices: this.store.matrices,
      calls: this.calls,
    };
  }

  async save(file: string, recordedWith: string): Promise<void> {
    writeFileSync(file, JSON.stringify(await this.recording(recordedWith)) + '\n');
  }

  close(): Promise<void> {
    return this.inner.close();
  }
}
