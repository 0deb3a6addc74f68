/**
 * The tail of a text stream, at most `maxChars` characters: what a program wrote to stderr (and
 * the adapter's notes about it), kept for the report. Older text is dropped from the front; a
 * marker says that it was.
 */
export class BoundedTextLog {
  private chunks: string[] = [];
  private length = 0;
  private dropped = false;

  constructor(private readonly maxChars: number) {
    if (!(maxChars > 0)) throw new RangeError(`a log needs a positive size, not ${maxChars}`);
  }

  append(text: string): void {
    if (text.length === 0) return;
    this.chunks.push(text);
    this.length += text.length;
    // Trimming at twice the bound keeps appends amortised O(1) however small the chunks are.
    if (this.length > 2 * this.maxChars) this.trim();
  }

  /** The kept text, starting with a marker line when older text was dropped. */
  text(): string {
    if (this.length > this.maxChars) this.trim();
    const body = this.chunks.join('');
    return this.dropped ? `[… earlier output dropped; the last ${this.maxChars} characters follow]\n${body}` : body;
  }

  /** The last `chars` characters, for a fault message. */
  tail(chars: number): string {
    if (this.length > this.maxChars) this.trim();
    const body = this.chunks.join('');
    return body.length <= chars ? body : `…${body.slice(body.length - chars)}`;
  }

  private trim(): void {
    const body = this.chunks.join('');
    this.chunks = [body.slice(body.length - this.maxChars)];
    this.length = this.maxChars;
    this.dropped = true;
  }
}
