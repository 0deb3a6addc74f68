import { fileSink } from './file-sink.js';
import { htmlReporter } from './html-reporter.js';
import { jsonReporter } from './json-reporter.js';
import { junitReporter } from './junit-reporter.js';
import type { Reporter, TextSink } from './reporter.js';

/** A report format: what it is for, and how to build its reporter over a sink. */
export interface ReportFormat {
  readonly description: string;
  create(sink: TextSink): Reporter;
}

/**
 * Every file report by its format's name. Each reporter receives only the result model and writes
 * only to the sink it is given; the caller decides where that goes (the CLI: one file per format).
 */
export const REPORT_FORMATS = new Map<string, ReportFormat>([
  ['json', { description: 'the whole result model as JSON, versioned, with a published JSON Schema', create: jsonReporter }],
  ['junit', { description: 'JUnit XML for CI: one testsuite per suite, one testcase per check', create: junitReporter }],
  ['html', { description: 'a self-contained HTML page with the summary, a filterable table and plots', create: htmlReporter }],
]);

/** The reporter of the format named `format`, writing to `file`. */
export function fileReporter(format: string, file: string): Reporter {
  const entry = REPORT_FORMATS.get(format);
  if (entry === undefined) throw new RangeError(`no report format '${format}' (known: ${[...REPORT_FORMATS.keys()].join(', ')})`);
  return entry.create(fileSink(file));
}
