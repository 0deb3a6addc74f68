import { spawn, type ChildProcess } from 'node:child_process';
import { LineChannel } from './line-channel.js';

/** How a program ended: an exit code, a signal, or a failure to spawn at all. */
export interface ExitInfo {
  readonly code: number | null;
  readonly signal: NodeJS.Signals | null;
  /** Set when the operating system could not start the shell (e.g. a missing working directory). */
  readonly spawnError?: string;
}

export interface ChildProgramOptions {
  readonly cwd?: string;
  readonly env?: NodeJS.ProcessEnv;
  /** Longest stdout line kept (bytes); a longer one is reported and discarded. */
  readonly maxLineBytes: number;
  /** Receives everything the program writes to stderr. */
  readonly onStderr: (text: string) => void;
}

export interface ChildProgramHandlers {
  onLine(line: string): void;
  onOversizeLine(bytesSoFar: number): void;
  /** The program ended; called once, after every complete stdout line has been delivered. */
  onExit(info: ExitInfo): void;
}

/**
 * Once the program has exited, how long to wait for its pipes to reach their end before reporting
 * the exit (a helper process may hold a pipe open; the last output is normally already in flight).
 */
const PIPE_DRAIN_MS = 250;

/**
 * A user's program started from a command line through the shell (`sh -c COMMAND`), with stdin,
 * stdout and stderr as pipes. It runs in its own process group, so that stopping it also stops
 * what the shell started (a wrapper script, `cd dir && python3 …`), and stopping is SIGTERM to the
 * group, then SIGKILL after a grace period; the group is swept with SIGKILL once its leader has
 * exited, so no helper outlives it. `exited` settles only when the leader has been reaped, so
 * awaiting `terminate()` leaves no zombie and no open handle.
 */
export class ChildProgram {
  readonly exited: Promise<ExitInfo>;
  private exitInfo: ExitInfo | undefined;
  private readonly child: ChildProcess;

  private constructor(command: string, options: ChildProgramOptions, handlers: ChildProgramHandlers) {
    this.child = spawn(command, {
      shell: true,
      detached: true,
      cwd: options.cwd,
      env: options.env,
      stdio: ['pipe', 'pipe', 'pipe'],
      windowsHide: true,
    });
    const lines = new LineChannel(options.maxLineBytes, {
      onLine: (line) => handlers.onLine(line),
      onOversize: (bytes) => handlers.onOversizeLine(bytes),
    });
    // The exit is reported once both output pipes have ended (so the last line and the last words
    // on stderr are in), or PIPE_DRAIN_MS after the exit if a helper keeps a pipe open.
    let openPipes = 2;
    let exitSeen: ExitInfo | undefined;
    let resolveExited!: (info: ExitInfo) => void;
    this.exited = new Promise((resolve) => (resolveExited = resolve));
    const report = (info: ExitInfo): void => {
      if (this.exitInfo !== undefined) return;
      this.exitInfo = info;
      handlers.onExit(info);
      resolveExited(info);
    };
    const pipeEnded = (): void => {
      openPipes--;
      if (openPipes === 0 && exitSeen !== undefined) report(exitSeen);
    };
    this.child.stdout?.on('data', (chunk: Buffer) => lines.feed(chunk));
    this.child.stdout?.on('end', () => {
      lines.end();
      pipeEnded();
    });
    this.child.stderr?.on('end', pipeEnded);
    this.child.stderr?.setEncoding('utf8');
    this.child.stderr?.on('data', (text: string) => options.onStderr(text));
    // A write to a program that has exited fails with EPIPE; the exit itself is what gets reported.
    this.child.stdin?.on('error', () => undefined);
    this.child.stdout?.on('error', () => undefined);
    this.child.stderr?.on('error', () => undefined);
    this.child.on('error', (error: Error) => {
      // Only a failure to spawn ends the program here; a failed kill() is no exit.
      if (this.child.pid === undefined) report({ code: null, signal: null, spawnError: error.message });
    });
    this.child.on('exit', (code, signal) => {
      exitSeen = { code, signal };
      if (openPipes === 0) report(exitSeen);
      else setTimeout(() => report(exitSeen as ExitInfo), PIPE_DRAIN_MS).unref();
    });
  }

  static spawn(command: string, options: ChildProgramOptions, handlers: ChildProgramHandlers): ChildProgram {
    return new ChildProgram(command, options, handlers);
  }

  get hasExited(): boolean {
    return this.exitInfo !== undefined;
  }

  /** Writes one line to the program's stdin. */
  writeLine(line: string): void {
    const stdin = this.child.stdin;
    if (this.exitInfo !== undefined || stdin === null || stdin.destroyed || !stdin.writable) return;
    stdin.write(line + '\n');
  }

  /**
   * Closes stdin, sends SIGTERM to the program's group, SIGKILL after `graceMs`, and resolves once
   * the program has been reaped and its pipes are closed. Safe to call more than once.
   */
  async terminate(graceMs: number): Promise<ExitInfo> {
    if (this.exitInfo === undefined && this.child.pid !== undefined) {
      this.child.stdin?.end();
      this.signalGroup('SIGTERM');
      const kill = setTimeout(() => this.signalGroup('SIGKILL'), graceMs);
      try {
        await this.exited;
      } finally {
        clearTimeout(kill);
      }
    }
    const info = await this.exited;
    this.signalGroup('SIGKILL');
    this.child.stdin?.destroy();
    this.child.stdout?.destroy();
    this.child.stderr?.destroy();
    return info;
  }

  private signalGroup(signal: NodeJS.Signals): void {
    const pid = this.child.pid;
    if (pid === undefined) return;
    try {
      // A negative pid addresses the process group the detached child leads.
      process.kill(-pid, signal);
    } catch {
      // ESRCH: the group is already gone.
    }
  }
}
