import type { BaselineFile } from './baseline-file.js';

const isNumberList = (v: unknown): v is number[] => Array.isArray(v) && v.every((x) => typeof x === 'number');
const isPairList = (v: unknown): v is number[][] => Array.isArray(v) && v.length > 0 && v.every(isNumberList);

/**
 * The baseline as JSON text for a repository: indented objects, but each list of numbers (or of
 * [re, im] pairs) on one line, so a recorded spectrum is one line of a diff rather than hundreds.
 * Numbers are written in full (the shortest text that reads back to the same double).
 */
export function baselineToJson(baseline: BaselineFile): string {
  const inline = new Map<string, string>();
  const text = JSON.stringify(
    baseline,
    (_key, value: unknown) => {
      if (isNumberList(value) || isPairList(value)) {
        const marker = `@@inline-${inline.size}@@`;
        inline.set(marker, JSON.stringify(value));
        return marker;
      }
      return value;
    },
    2,
  );
  return text.replace(/"(@@inline-\d+@@)"/g, (_m, marker: string) => inline.get(marker)!) + '\n';
}
