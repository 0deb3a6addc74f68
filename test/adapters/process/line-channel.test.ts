import { describe, expect, it } from 'vitest';
import { BoundedTextLog } from '../../../adapters/process/bounded-text-log.js';
import { LineChannel } from '../../../adapters/process/line-channel.js';

function collect(maxLineBytes: number) {
  const lines: string[] = [];
  const oversize: number[] = [];
  const channel = new LineChannel(maxLineBytes, { onLine: (l) => lines.push(l), onOversize: (b) => oversize.push(b) });
  return { channel, lines, oversize };
}

describe('LineChannel', () => {
  it('splits lines across chunk boundaries, drops CR before LF and keeps UTF-8 intact', () => {
    const { channel, lines } = collect(1024);
    const text = Buffer.from('{"a":1}\r\nnoise ⟨G⟩\n\n{"b":', 'utf8');
    // Cut inside the multi-byte character '⟨' to show that bytes are joined before decoding.
    const cut = text.indexOf(Buffer.from('⟨')) + 1;
    channel.feed(text.subarray(0, cut));
    channel.feed(text.subarray(cut));
    channel.feed(Buffer.from('2}\n'));
    expect(lines).toEqual(['{"a":1}', 'noise ⟨G⟩', '', '{"b":2}']);
  });

  it('delivers an unfinished last line when the stream ends', () => {
    const { channel, lines } = collect(1024);
    channel.feed(Buffer.from('last words'));
    channel.end();
    expect(lines).toEqual(['last words']);
  });

  it('reports an over-long line once, discards it, and reads the next line', () => {
    const { channel, lines, oversize } = collect(10);
    channel.feed(Buffer.from('0123456'));
    channel.feed(Buffer.from('789abcdef'));
    channel.feed(Buffer.from('more and more'));
    channel.feed(Buffer.from('\nok\n'));
    expect(oversize).toEqual([16]);
    expect(lines).toEqual(['ok']);
  });
});

describe('BoundedTextLog', () => {
  it('keeps the last characters and marks that older text was dropped', () => {
    const log = new BoundedTextLog(8);
    for (const piece of ['abc', 'def', 'ghi', 'jkl']) log.append(piece);
    expect(log.text()).toBe('[… earlier output dropped; the last 8 characters follow]\nefghijkl');
    expect(log.tail(3)).toBe('…jkl');
  });

  it('keeps everything below the bound unmarked', () => {
    const log = new BoundedTextLog(100);
    log.append('one\n');
    log.append('two\n');
    expect(log.text()).toBe('one\ntwo\n');
  });
});
