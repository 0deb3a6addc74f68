import {
  ALL_CAPABILITIES,
  AdapterFault,
  type Adapter,
  type AdapterDescription,
  type Capability,
  type ChainSpec,
} from '../adapter.js';
import type { Complex } from '../../harness/numeric/complex.js';
import type { EnsembleSpec } from '../../harness/numeric/ensemble.js';
import type { SquareMatrix } from '../../harness/numeric/square-matrix.js';
import { BoundedTextLog } from './bounded-text-log.js';
import { JsonRpcClient, type RpcOutcome } from './json-rpc-client.js';
import { resolveProcessAdapterOptions, type ProcessAdapterOptions, type ResolvedProcessAdapterOptions } from './process-adapter-options.js';
import { protocolErrorAsException, protocolResults } from './protocol-results.js';
import { compileProtocolSchemas, isProtocolMethod, resultProblem, type ProtocolMethod } from './protocol-schemas.js';
import { requestParams } from './request-params.js';

const MAX_WARNINGS = 100;
const NOTE_PREFIX = '[rmt-assay] ';

/**
 * An implementation in another process, reached through the JSON-RPC protocol of PROTOCOL.md.
 *
 * Every response is checked against its JSON Schema, then for what a schema cannot say (counts,
 * finite numbers, matrix sizes). A misbehaving program becomes an AdapterFault naming the method;
 * when the conversation cannot go on (crash, timeout, garbled output, wrong id, an over-long line)
 * the program is stopped and the next call starts it anew, with `describe` first, so one bad answer
 * costs one check. Requests are sent one at a time, in call order.
 */
export class ProcessAdapter implements Adapter {
  private client: JsonRpcClient | undefined;
  private readonly stopping = new Set<Promise<unknown>>();
  private queue: Promise<unknown> = Promise.resolve();
  private closed = false;
  private description: AdapterDescription | undefined;
  private readonly stderrAndNotes: BoundedTextLog;
  private readonly warningList: string[] = [];
  private droppedWarnings = 0;

  private constructor(
    readonly command: string,
    private readonly options: ResolvedProcessAdapterOptions,
  ) {
    this.stderrAndNotes = new BoundedTextLog(options.maxLogChars);
  }

  /**
   * Starts `command` through the shell and asks it `describe`. Throws AdapterFault 'unavailable'
   * (method 'describe') when the program does not start or does not answer describe properly.
   */
  static async start(command: string, options?: ProcessAdapterOptions): Promise<ProcessAdapter> {
    compileProtocolSchemas();
    const adapter = new ProcessAdapter(command, resolveProcessAdapterOptions(options));
    try {
      await adapter.enqueue(() => adapter.liveClient('describe'));
    } catch (error) {
      await adapter.close();
      throw error;
    }
    return adapter;
  }

  describe(): Promise<AdapterDescription> {
    if (this.description === undefined) return Promise.reject(new AdapterFault('describe', 'unavailable', 'the program has not described itself'));
    return Promise.resolve(this.description);
  }

  async eigenvalues(matrix: SquareMatrix): Promise<Float64Array> {
    return protocolResults.eigenvalues(await this.resultOf('eigenvalues', requestParams.eigenvalues(matrix)), matrix);
  }

  async resolventTrace(matrix: SquareMatrix, points: readonly Complex[], weight?: SquareMatrix): Promise<Complex[]> {
    return protocolResults.resolventTrace(await this.resultOf('resolvent_trace', requestParams.resolventTrace(matrix, points, weight)), points);
  }

  async chainTrace(matrix: SquareMatrix, points: readonly Complex[], weights: readonly SquareMatrix[]): Promise<Complex> {
    return protocolResults.chainTrace(await this.resultOf('chain_trace', requestParams.chainTrace(matrix, points, weights)));
  }

  async sample(ensemble: EnsembleSpec, size: number, seed: number, count: number): Promise<SquareMatrix[]> {
    return protocolResults.sample(await this.resultOf('sample', requestParams.sample(ensemble, size, seed, count), ensemble), ensemble, size, count);
  }

  async covariance(ensemble: EnsembleSpec, left: ChainSpec, right: ChainSpec): Promise<Complex> {
    return protocolResults.covariance(await this.resultOf('covariance', requestParams.covariance(ensemble, left, right)));
  }

  async sampleStatistics(ensemble: EnsembleSpec, size: number, seed: number, count: number, statistics: readonly ChainSpec[]): Promise<Complex[][]> {
    const params = requestParams.sampleStatistics(ensemble, size, seed, count, statistics);
    return protocolResults.sampleStatistics(await this.resultOf('sample_statistics', params, ensemble), count, statistics.length);
  }

  /**
   * What the program wrote to stderr (the last maxLogChars characters, across restarts), with the
   * adapter's notes: restarts and stdout lines that were not messages, prefixed "[rmt-assay] ".
   */
  log(): string {
    return this.stderrAndNotes.text();
  }

  /** Things the report should show that were not faults: ignored stdout lines, restarts. */
  warnings(): readonly string[] {
    return this.droppedWarnings === 0 ? [...this.warningList] : [`(${this.droppedWarnings} earlier warnings dropped)`, ...this.warningList];
  }

  /** Stops the program (SIGTERM, SIGKILL after the grace period) and waits until it is reaped. */
  async close(): Promise<void> {
    this.closed = true;
    if (this.client !== undefined) this.retire(this.client);
    // A request in flight fails at once (its program is being stopped); wait for it to settle
    // before waiting for the programs, so that nothing is started after close.
    await this.queue;
    await Promise.all([...this.stopping]);
  }

  /** The program's result for `method` (still to be checked against its schema), or its error as an exception. */
  private async resultOf(method: ProtocolMethod, params: object, ensemble?: EnsembleSpec): Promise<unknown> {
    const outcome = await this.request(method, params);
    if (outcome.kind === 'error') throw protocolErrorAsException(method, outcome.code, outcome.message, ensemble);
    return outcome.result;
  }

  private request(method: ProtocolMethod, params: object | undefined): Promise<RpcOutcome> {
    return this.enqueue(async () => {
      const client = await this.liveClient(method);
      try {
        return await client.call(method, params, this.options.timeoutMs);
      } catch (error) {
        if (!(error instanceof AdapterFault) || client.usable) throw error;
        this.retire(client, `${error.kind} in ${method}`);
        throw new AdapterFault(error.method, error.kind, `${error.message}; the program was stopped and the next call starts it anew`);
      }
    });
  }

  /** Runs requests one after another, whatever became of the previous one. */
  private enqueue<T>(task: () => Promise<T>): Promise<T> {
    const run = this.queue.then(task, task);
    this.queue = run.catch(() => undefined);
    return run;
  }

  /** The running program, started (and described) first if there is none or the last one broke. */
  private async liveClient(method: ProtocolMethod): Promise<JsonRpcClient> {
    if (this.closed) throw new AdapterFault(method, 'unavailable', `${method}: the adapter is closed`);
    if (this.client?.usable) return this.client;
    if (this.client !== undefined) this.retire(this.client, 'the program ended');
    await Promise.all([...this.stopping]);
    if (this.closed) throw new AdapterFault(method, 'unavailable', `${method}: the adapter is closed`);
    const restarting = this.description !== undefined;
    if (restarting) this.note(`starting the program again for ${method}: ${this.command}`);
    const client = new JsonRpcClient(this.command, {
      cwd: this.options.cwd,
      env: this.options.env,
      maxResponseBytes: this.options.maxResponseBytes,
      killGraceMs: this.options.killGraceMs,
      log: this.stderrAndNotes,
      onNote: (text) => this.note(text),
      onNoise: (line) => this.note(`stdout line that is not a message, ignored: ${JSON.stringify(line.length > 200 ? `${line.slice(0, 200)}…` : line)}`),
    });
    this.client = client;
    try {
      const outcome = await client.call('describe', undefined, this.options.startTimeoutMs);
      this.description ??= this.describedAs(outcome);
      if (restarting) this.describedAs(outcome);
      return client;
    } catch (error) {
      this.retire(client);
      const why = error instanceof Error ? error.message : String(error);
      throw new AdapterFault(method, 'unavailable', `${method}: the program \`${this.command}\` did not start: ${why}`);
    }
  }

  private describedAs(outcome: RpcOutcome): AdapterDescription {
    if (outcome.kind === 'error') throw protocolErrorAsException('describe', outcome.code, outcome.message);
    const problem = resultProblem('describe', outcome.result);
    if (problem !== undefined) throw new AdapterFault('describe', 'malformed-response', `describe: the result does not have the protocol's shape: ${problem}`);
    const result = outcome.result as { name: string; version: string; capabilities: string[] };
    // A capability counts when the harness knows it and this adapter can carry it over the protocol;
    // the rest (a newer protocol's methods, typos) are noted and ignored.
    const usable = (c: string): c is Capability =>
      (ALL_CAPABILITIES as readonly string[]).includes(c) && isProtocolMethod(c) && c !== 'describe';
    const known = result.capabilities.filter(usable);
    const unknown = result.capabilities.filter((c) => !usable(c) && c !== 'describe');
    if (unknown.length > 0 && this.description === undefined) this.note(`capabilities this harness does not use, ignored: ${unknown.join(', ')}`);
    return { name: result.name, version: result.version, kind: 'process', capabilities: known };
  }

  private retire(client: JsonRpcClient, reason?: string): void {
    if (this.client === client) this.client = undefined;
    if (reason !== undefined) this.note(`stopping the program after ${reason}`);
    const stopped = client.close();
    this.stopping.add(stopped);
    void stopped.then(() => this.stopping.delete(stopped));
  }

  private note(text: string): void {
    this.stderrAndNotes.append(`${NOTE_PREFIX}${text}\n`);
    this.warningList.push(text);
    if (this.warningList.length > MAX_WARNINGS) {
      this.warningList.shift();
      this.droppedWarnings++;
    }
  }
}
