import { appendFileSync, mkdirSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import type { TextSink } from './reporter.js';

/**
 * A text sink that is a file: the first write replaces whatever the file held (creating its
 * directory if need be), later writes append. Nothing is created until something is written, so
 * a run that stops early leaves no empty report behind.
 */
export function fileSink(file: string): TextSink {
  let started = false;
  return {
    write(text: string) {
      if (!started) {
        mkdirSync(dirname(file), { recursive: true });
        writeFileSync(file, text);
        started = true;
      } else {
        appendFileSync(file, text);
      }
    },
  };
}
