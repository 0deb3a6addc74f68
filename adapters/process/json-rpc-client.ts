import { AdapterFault } from '../adapter.js';
import { BoundedTextLog } from './bounded-text-log.js';
import { ChildProgram, type ExitInfo } from './child-program.js';
import { responseEnvelopeProblem } from './protocol-schemas.js';

/** What a well-formed response said: a result, or a JSON-RPC error object. */
export type RpcOutcome =
  | { readonly kind: 'result'; readonly result: unknown }
  | { readonly kind: 'error'; readonly code: number; readonly message: string; readonly data?: unknown };

export interface JsonRpcClientOptions {
  readonly cwd?: string;
  readonly env?: NodeJS.ProcessEnv;
  readonly maxResponseBytes: number;
  readonly killGraceMs: number;
  /** Shared across restarts: the program's stderr and the client's notes. */
  readonly log: BoundedTextLog;
  /** A line of stdout that is not a message (PROTOCOL.md, "Output that is not a message"). */
  readonly onNoise: (line: string) => void;
  /** Something the report should show that is not a fault of a call (an exit between calls). */
  readonly onNote: (text: string) => void;
}

interface Pending {
  readonly id: number;
  readonly method: string;
  readonly timer: NodeJS.Timeout;
  readonly timeoutMs: number;
  readonly noise: string[];
  resolve(outcome: RpcOutcome): void;
  reject(error: Error): void;
}

const EXCERPT_CHARS = 160;
const STDERR_TAIL_CHARS = 600;

/**
 * JSON-RPC 2.0 over a child program's stdin/stdout, one request in flight at a time.
 *
 * Rules (PROTOCOL.md): a stdout line whose first non-blank character is `{` is a message; any other
 * line is noise, logged and otherwise ignored. A message that is not JSON, not a response envelope,
 * or answers another id, an over-long line, a timeout and an exit are faults after which the
 * conversation cannot be trusted: the client stops the program and becomes unusable (`usable` is
 * false), and its owner starts a new one. A well-formed response is handed back as it is, result
 * or error; checking the result is the owner's job.
 */
export class JsonRpcClient {
  private readonly program: ChildProgram;
  /** This program's own stderr, for fault messages (the shared log also holds older programs'). */
  private readonly stderrTail = new BoundedTextLog(STDERR_TAIL_CHARS);
  private nextId = 1;
  private pending: Pending | undefined;
  private broken: string | undefined;
  private stopping: Promise<ExitInfo> | undefined;

  constructor(command: string, private readonly options: JsonRpcClientOptions) {
    this.program = ChildProgram.spawn(
      command,
      {
        cwd: options.cwd,
        env: options.env,
        maxLineBytes: options.maxResponseBytes,
        onStderr: (text) => {
          options.log.append(text);
          this.stderrTail.append(text);
        },
      },
      {
        onLine: (line) => this.onLine(line),
        onOversizeLine: (bytes) => this.onOversize(bytes),
        onExit: (info) => this.onExit(info),
      },
    );
  }

  /** False once a fault has made the conversation untrustworthy or the program has ended. */
  get usable(): boolean {
    return this.broken === undefined;
  }

  /** Sends `method` with `params` (omitted when undefined) and waits at most `timeoutMs`. */
  call(method: string, params: object | undefined, timeoutMs: number): Promise<RpcOutcome> {
    if (this.pending !== undefined) {
      return Promise.reject(new Error(`JsonRpcClient: ${method} called while ${this.pending.method} is pending`));
    }
    if (this.broken !== undefined) {
      return Promise.reject(new AdapterFault(method, 'crashed', `${method}: ${this.broken}`));
    }
    const id = this.nextId++;
    const line = JSON.stringify(params === undefined ? { jsonrpc: '2.0', id, method } : { jsonrpc: '2.0', id, method, params });
    return new Promise<RpcOutcome>((resolve, reject) => {
      const timer = setTimeout(() => this.onTimeout(), timeoutMs);
      this.pending = { id, method, timer, timeoutMs, noise: [], resolve, reject };
      this.program.writeLine(line);
    });
  }

  /** Stops the program (SIGTERM, then SIGKILL after the grace period); a pending call fails. */
  close(reason = 'the adapter was closed'): Promise<ExitInfo> {
    if (this.pending !== undefined) this.fail('unavailable', `${reason} while ${this.pending.method} was pending`);
    this.broken ??= reason;
    this.stopping ??= this.program.terminate(this.options.killGraceMs);
    return this.stopping;
  }

  /** A failure of our own while reading a line fails the pending call instead of escaping. */
  private onLine(line: string): void {
    try {
      this.readLine(line);
    } catch (error) {
      const pending = this.pending;
      this.breakDown(`internal error while reading a response: ${(error as Error).message}`);
      pending?.reject(error as Error);
    }
  }

  private readLine(line: string): void {
    const text = line.trim();
    if (text === '') return;
    if (!text.startsWith('{')) {
      this.pending?.noise.push(line);
      this.options.onNoise(line);
      return;
    }
    const pending = this.pending;
    if (pending === undefined) {
      const reason = `the program sent a message while no request was pending: ${excerpt(text)}`;
      this.options.onNote(`${reason}; it is stopped and started again for the next call`);
      this.breakDown(reason);
      return;
    }
    let message: unknown;
    try {
      message = JSON.parse(text, overflowAsWireInfinity);
    } catch (error) {
      const hint = /\b(NaN|Infinity)\b/.test(text)
        ? ' (JSON has no NaN or Infinity: send them as the strings "NaN", "Infinity", "-Infinity")'
        : '';
      this.fail('malformed-response', `the response to ${pending.method} is not valid JSON${hint}: ${(error as Error).message}; the line begins ${excerpt(text)}`);
      return;
    }
    const problem = responseEnvelopeProblem(message);
    if (problem !== undefined) {
      this.fail('malformed-response', `the response to ${pending.method} is not a JSON-RPC 2.0 response: ${problem}; the line begins ${excerpt(text)}`);
      return;
    }
    const response = message as { id: number | null; result?: unknown; error?: { code: number; message: string; data?: unknown } };
    const isErrorForUnreadRequest = response.id === null && response.error !== undefined;
    if (response.id !== pending.id && !isErrorForUnreadRequest) {
      this.fail('malformed-response', `the response to ${pending.method} (request id ${pending.id}) carries id ${JSON.stringify(response.id)}`);
      return;
    }
    this.settle();
    if (response.error !== undefined) {
      const { code, message: text, data } = response.error;
      pending.resolve({ kind: 'error', code, message: text, data });
    } else {
      pending.resolve({ kind: 'result', result: response.result });
    }
  }

  private onOversize(bytes: number): void {
    const method = this.pending?.method ?? 'an unrequested message';
    this.fail('malformed-response', `the response to ${method} passed the limit of ${this.options.maxResponseBytes} bytes (maxResponseBytes) at ${bytes} bytes without ending; it was discarded`);
  }

  private onTimeout(): void {
    const pending = this.pending;
    if (pending === undefined) return;
    const noise = pending.noise.length === 0 ? '' : `; meanwhile it wrote ${pending.noise.length} line(s) that are not messages, the last: ${excerpt(pending.noise[pending.noise.length - 1])}`;
    this.fail('timeout', `no response to ${pending.method} within ${pending.timeoutMs} ms (timeoutMs)${noise}`);
  }

  private onExit(info: ExitInfo): void {
    const ending = describeExit(info);
    const stderr = this.stderrTail.tail(STDERR_TAIL_CHARS).trim().replace(/\s*\n\s*/g, ' | ');
    const detail = stderr === '' ? '' : `; its stderr ends: ${stderr}`;
    if (this.pending !== undefined) {
      this.fail('crashed', `the program ${ending} while computing ${this.pending.method}${detail}`);
    } else if (this.broken === undefined) {
      this.broken = `the program ${ending}${detail}`;
      this.options.onNote(`the program ${ending} between calls${detail}`);
    }
  }

  /** A fault that ends the conversation: the pending call fails and the program is stopped. */
  private fail(kind: 'malformed-response' | 'timeout' | 'crashed' | 'unavailable', message: string): void {
    const pending = this.pending;
    this.breakDown(message);
    if (pending !== undefined) pending.reject(new AdapterFault(pending.method, kind, message));
  }

  private breakDown(reason: string): void {
    this.settle();
    this.broken ??= reason;
    if (!this.program.hasExited) this.stopping ??= this.program.terminate(this.options.killGraceMs);
  }

  private settle(): void {
    if (this.pending !== undefined) clearTimeout(this.pending.timer);
    this.pending = undefined;
  }
}

/**
 * JSON.parse reads a literal beyond the float64 range (1e999) as ±Infinity, which ajv's "number"
 * rejects; turning it into the wire's "Infinity" string lets the adapter report it as the invalid
 * value it is rather than as a malformed response.
 */
function overflowAsWireInfinity(_key: string, value: unknown): unknown {
  if (typeof value === 'number' && !Number.isFinite(value)) return value > 0 ? 'Infinity' : '-Infinity';
  return value;
}

function describeExit(info: ExitInfo): string {
  if (info.spawnError !== undefined) return `could not be started (${info.spawnError})`;
  if (info.signal !== null) return `was killed by ${info.signal}`;
  if (info.code === 127) return 'exited with code 127 (command not found?)';
  return `exited with code ${info.code}`;
}

function excerpt(text: string): string {
  const flat = text.replace(/\s+/g, ' ');
  return `'${flat.length <= EXCERPT_CHARS ? flat : `${flat.slice(0, EXCERPT_CHARS)}…`}'`;
}
