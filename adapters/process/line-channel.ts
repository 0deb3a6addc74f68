/**
 * Splits a byte stream into lines (LF, with an optional CR before it), holding at most `maxLineBytes`
 * bytes of an unfinished line. A line that grows past the bound is reported once through
 * `onOversize` and its bytes are discarded up to the next newline, so an enormous or endless
 * response costs bounded memory.
 */
export interface LineHandlers {
  onLine(line: string): void;
  /** The current line passed `maxLineBytes` bytes without a newline. */
  onOversize(bytesSoFar: number): void;
}

const NEWLINE = 0x0a;
const CARRIAGE_RETURN = 0x0d;

export class LineChannel {
  private parts: Buffer[] = [];
  private bytes = 0;
  private discarding = false;

  constructor(
    private readonly maxLineBytes: number,
    private readonly handlers: LineHandlers,
  ) {
    if (!(maxLineBytes > 0)) throw new RangeError(`a line bound must be positive, not ${maxLineBytes}`);
  }

  feed(chunk: Buffer): void {
    let start = 0;
    while (start < chunk.length) {
      const newline = chunk.indexOf(NEWLINE, start);
      const end = newline === -1 ? chunk.length : newline;
      this.take(chunk.subarray(start, end));
      if (newline === -1) return;
      this.finishLine();
      start = newline + 1;
    }
  }

  /** The stream ended: an unfinished last line is delivered as a line. */
  end(): void {
    if (this.bytes > 0 && !this.discarding) this.finishLine();
    this.reset();
  }

  private take(piece: Buffer): void {
    if (this.discarding || piece.length === 0) return;
    if (this.bytes + piece.length > this.maxLineBytes) {
      const seen = this.bytes + piece.length;
      this.reset();
      this.discarding = true;
      this.handlers.onOversize(seen);
      return;
    }
    this.parts.push(piece);
    this.bytes += piece.length;
  }

  private finishLine(): void {
    if (this.discarding) {
      this.reset();
      return;
    }
    let line = Buffer.concat(this.parts, this.bytes);
    this.reset();
    if (line.length > 0 && line[line.length - 1] === CARRIAGE_RETURN) line = line.subarray(0, line.length - 1);
    this.handlers.onLine(line.toString('utf8'));
  }

  private reset(): void {
    this.parts = [];
    this.bytes = 0;
    this.discarding = false;
  }
}
