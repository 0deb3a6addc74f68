import { readFileSync } from 'node:fs';
import { Ajv } from 'ajv';
import type { Complex } from '../../harness/numeric/complex.js';
import type { EnsembleSpec } from '../../harness/numeric/ensemble.js';
import type { SquareMatrix } from '../../harness/numeric/square-matrix.js';
import { NotAvailable, type Adapter, type AdapterDescription, type ChainSpec } from '../adapter.js';
import { paramsProblem, resultProblem } from '../process/protocol-schemas.js';
import { protocolErrorAsException, protocolResults } from '../process/protocol-results.js';
import { requestParams } from '../process/request-params.js';
import { schemaErrorText } from '../process/schema-error-text.js';
import { callKey } from './call-key.js';
import { mapMatrixMembers } from './matrix-store.js';
import recordingSchema from './recording.schema.json' with { type: 'json' };
import type { RecordedCall, RecordedMethod, Recording } from './recording-format.js';

/** A recording that cannot be used: the message names the file and the JSON path of the problem. */
export class RecordingError extends Error {
  override readonly name = 'RecordingError';
}

const validateRecording = new Ajv({ allErrors: false, strict: true, strictRequired: false }).compile(recordingSchema);

/**
 * Results computed elsewhere (an HPC run, a GPU job), checked as if the implementation were here:
 * each call the harness makes is looked up by its method and params in the recording and answered
 * with the recorded result, which goes through the same checks as a live program's answer. A call
 * the recording does not hold is not available: its checks are skipped, saying so.
 */
export class RecordedAdapter implements Adapter {
  private readonly answers = new Map<string, RecordedCall>();

  private constructor(
    private readonly recording: Recording,
    readonly file: string,
  ) {
    for (const call of recording.calls) this.answers.set(callKey(call.method, call.params), call);
  }

  static load(file: string): RecordedAdapter {
    let text: string;
    try {
      text = readFileSync(file, 'utf8');
    } catch (error) {
      throw new RecordingError(`cannot read the recording ${file}: ${(error as NodeJS.ErrnoException).code ?? (error as Error).message}`);
    }
    let value: unknown;
    try {
      value = JSON.parse(text);
    } catch (error) {
      throw new RecordingError(`the recording ${file} is not JSON: ${(error as Error).message}`);
    }
    if (!validateRecording(value)) {
      throw new RecordingError(`the recording ${file} is not valid: ${schemaErrorText(validateRecording.errors ?? [], '')}`);
    }
    const raw = value as unknown as Recording;
    const calls = raw.calls.map((call, i) => resolvedCall(file, raw, call, i));
    return new RecordedAdapter({ ...raw, calls }, file);
  }

  async describe(): Promise<AdapterDescription> {
    return { name: this.recording.implementation.name, version: this.recording.implementation.version, kind: 'recorded', capabilities: this.recording.capabilities };
  }

  private answer(method: RecordedMethod, params: object, ensemble?: EnsembleSpec): unknown {
    const call = this.answers.get(callKey(method, params));
    if (call === undefined) {
      const hint = this.recording.recordedWith ? ` (it was made with: ${this.recording.recordedWith})` : '';
      throw new NotAvailable(`${method}: this input is not in the recording ${this.file}; replay with the options it was made with${hint}`);
    }
    if (call.error !== undefined) throw protocolErrorAsException(method, call.error.code, call.error.message, ensemble);
    return call.result;
  }

  async eigenvalues(matrix: SquareMatrix): Promise<Float64Array> {
    return protocolResults.eigenvalues(this.answer('eigenvalues', requestParams.eigenvalues(matrix)), matrix);
  }

  async resolventTrace(matrix: SquareMatrix, points: readonly Complex[], weight?: SquareMatrix): Promise<Complex[]> {
    return protocolResults.resolventTrace(this.answer('resolvent_trace', requestParams.resolventTrace(matrix, points, weight)), points);
  }

  async chainTrace(matrix: SquareMatrix, points: readonly Complex[], weights: readonly SquareMatrix[]): Promise<Complex> {
    return protocolResults.chainTrace(this.answer('chain_trace', requestParams.chainTrace(matrix, points, weights)));
  }

  async sample(ensemble: EnsembleSpec, size: number, seed: number, count: number): Promise<SquareMatrix[]> {
    return protocolResults.sample(this.answer('sample', requestParams.sample(ensemble, size, seed, count), ensemble), ensemble, size, count);
  }

  async covariance(ensemble: EnsembleSpec, left: ChainSpec, right: ChainSpec): Promise<Complex> {
    return protocolResults.covariance(this.answer('covariance', requestParams.covariance(ensemble, left, right)));
  }

  async sampleStatistics(ensemble: EnsembleSpec, size: number, seed: number, count: number, statistics: readonly ChainSpec[]): Promise<Complex[][]> {
    const params = requestParams.sampleStatistics(ensemble, size, seed, count, statistics);
    return protocolResults.sampleStatistics(this.answer('sample_statistics', params, ensemble), count, statistics.length);
  }

  async close(): Promise<void> {}
}

/** A call with its matrix references resolved, its params and result checked against the protocol's schemas. */
function resolvedCall(file: string, recording: Recording, call: RecordedCall, i: number): RecordedCall {
  const at = `/calls/${i}`;
  const resolve = (section: 'params' | 'result') => (value: unknown, path: string) => {
    if (value === null || typeof value !== 'object' || !('ref' in value)) return value;
    const ref = (value as { ref: unknown }).ref;
    const matrix = Number.isInteger(ref) ? recording.matrices?.[ref as number] : undefined;
    if (matrix === undefined) throw new RecordingError(`the recording ${file} is not valid: at ${at}/${section}${path}: no matrix ${JSON.stringify(ref)} in /matrices`);
    return matrix;
  };
  const params = mapMatrixMembers(call.params, resolve('params'));
  const problem = paramsProblem(call.method, params, `${at}/params`);
  if (problem !== undefined) throw new RecordingError(`the recording ${file} is not valid: ${problem}`);
  if (call.result === undefined) return { ...call, params };
  const result = mapMatrixMembers(call.result, resolve('result'));
  const resultIssue = resultProblem(call.method, result, `${at}/result`);
  if (resultIssue !== undefined) throw new RecordingError(`the recording ${file} is not valid: ${resultIssue}`);
  return { ...call, params, result };
}
