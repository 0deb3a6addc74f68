import type { RunResult } from '../run-result.js';
import type { Reporter, TextSink } from './reporter.js';

/**
 * The whole result model as JSON, for machines. Non-finite numbers, which JSON cannot hold, are
 * written as the strings "NaN", "Infinity" and "-Infinity"; −0 as "-0".
 */
export function resultToJson(result: RunResult): string {
  return JSON.stringify(
    result,
    (_key, value) => {
      if (typeof value === 'number' && (!Number.isFinite(value) || Object.is(value, -0))) {
        return Object.is(value, -0) ? '-0' : String(value);
      }
      return value;
    },
    2,
  );
}

/**
 * Writes the report when the run ends, in one piece, to `sink` (a file, for the CLI). Its shape
 * is published as schemas/run-result.schema.json (`formatVersion` says which version).
 */
export function jsonReporter(sink: TextSink): Reporter {
  return {
    onRunEnd(result) {
      sink.write(resultToJson(result) + '\n');
    },
  };
}
