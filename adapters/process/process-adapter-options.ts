/** What a user may set for a process adapter; every field is optional. */
export interface ProcessAdapterOptions {
  /** Longest wait for one response, in milliseconds (default 60 000). */
  readonly timeoutMs?: number;
  /** Longest wait for `describe` when the program starts or restarts (default 60 000). */
  readonly startTimeoutMs?: number;
  /** Longest response line, in bytes (default 256 MiB). */
  readonly maxResponseBytes?: number;
  /** How much of stderr is kept for log(), in characters (default 64 KiB). */
  readonly maxLogChars?: number;
  /** Between SIGTERM and SIGKILL when the program is stopped, in milliseconds (default 2 000). */
  readonly killGraceMs?: number;
  /** Working directory of the program (default: this process's). */
  readonly cwd?: string;
  /** The program's whole environment, as for child_process.spawn (default: this process's). */
  readonly env?: NodeJS.ProcessEnv;
}

/** The options with every default filled in, resolved once. */
export interface ResolvedProcessAdapterOptions {
  readonly timeoutMs: number;
  readonly startTimeoutMs: number;
  readonly maxResponseBytes: number;
  readonly maxLogChars: number;
  readonly killGraceMs: number;
  readonly cwd: string | undefined;
  readonly env: NodeJS.ProcessEnv | undefined;
}

export const PROCESS_ADAPTER_DEFAULTS = {
  timeoutMs: 60_000,
  startTimeoutMs: 60_000,
  maxResponseBytes: 256 * 1024 * 1024,
  maxLogChars: 64 * 1024,
  killGraceMs: 2_000,
} as const;

export function resolveProcessAdapterOptions(options: ProcessAdapterOptions = {}): ResolvedProcessAdapterOptions {
  const positive = (name: keyof typeof PROCESS_ADAPTER_DEFAULTS): number => {
    const value = options[name] ?? PROCESS_ADAPTER_DEFAULTS[name];
    if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`process adapter option ${name} must be a positive number, not ${value}`);
    return value;
  };
  return {
    timeoutMs: positive('timeoutMs'),
    startTimeoutMs: positive('startTimeoutMs'),
    maxResponseBytes: positive('maxResponseBytes'),
    maxLogChars: positive('maxLogChars'),
    killGraceMs: positive('killGraceMs'),
    cwd: options.cwd,
    env: options.env,
  };
}
