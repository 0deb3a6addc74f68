import type { RunResult } from '../run-result.js';
import type { CheckVerdict } from '../verdict.js';
import { evidenceLines } from './evidence-lines.js';
import { shortNumber } from './format-quantity.js';
import type { Reporter, TextSink } from './reporter.js';

export interface TerminalStyle {
  /** Colour and an in-place progress bar (a TTY outside CI); plain lines otherwise. */
  readonly interactive: boolean;
  /** List every passing check, not only the counts. */
  readonly verbose: boolean;
}

const colours = { red: 31, green: 32, yellow: 33, dim: 2, bold: 1 } as const;

function painter(interactive: boolean) {
  return (colour: keyof typeof colours, text: string) => (interactive ? `\u001b[${colours[colour]}m${text}\u001b[0m` : text);
}

/**
 * Text from an implementation, made harmless for a terminal: control characters other than tab and
 * line feed (an escape sequence could recolour, move the cursor or retitle the window) are shown
 * as \uXXXX.
 */
function inert(text: string): string {
  return text.replace(/[\u0000-\u0008\u000B-\u001F\u007F-\u009F]/g, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);
}

/** A duration in seconds as a person reads it: "45 s", "3 min 20 s", "2 h 5 min". */
function readableDuration(seconds: number): string {
  if (!Number.isFinite(seconds)) return '? s';
  const s = Math.max(0, Math.ceil(seconds));
  if (s < 60) return `${s} s`;
  if (s < 3600) return `${Math.floor(s / 60)} min ${s % 60} s`;
  return `${Math.floor(s / 3600)} h ${Math.floor((s % 3600) / 60)} min`;
}

/**
 * The evidence of a failed check. Sources and methods shared with an earlier failure in the same
 * summary are printed once and then referred to, so a run with many failures stays readable.
 */
function describeEvidence(v: CheckVerdict, seen: Set<string>): string[] {
  const once = (text: string) => {
    if (seen.has(text)) return 'as above';
    seen.add(text);
    return text;
  };
  return evidenceLines(v, once).map((line) => `  ${inert(line)}`);
}

/** The readable summary: failures first with everything needed to judge and replay them. */
export function formatTerminalSummary(result: RunResult, style: TerminalStyle): string {
  const paint = painter(style.interactive);
  const all = result.suites.flatMap((s) => s.checks);
  const lines: string[] = [''];
  const seen = new Set<string>();
  for (const v of all.filter((c) => c.state === 'fail')) {
    lines.push(`${paint('red', 'FAILED ')} ${inert(v.id)}`, `  ${inert(v.title)}`, ...describeEvidence(v, seen));
    if (v.path) lines.push(`  path       ${inert(v.path)}`);
    lines.push(`  replay     ${inert(v.replay)}`, '');
  }
  for (const v of all.filter((c) => c.state === 'fault')) {
    lines.push(`${paint('red', 'FAULT  ')} ${inert(v.id)}`, `  ${inert(v.reason ?? '')}`, `  replay     ${inert(v.replay)}`, '');
  }
  const skippedReasons = new Map<string, number>();
  for (const v of all.filter((c) => c.state === 'skipped')) skippedReasons.set(v.reason ?? '', (skippedReasons.get(v.reason ?? '') ?? 0) + 1);
  for (const [reason, n] of skippedReasons) lines.push(`${paint('yellow', 'SKIPPED')} ${n} check${n === 1 ? '' : 's'}: ${inert(reason)}`);
  if (style.verbose) {
    for (const v of all.filter((c) => c.state === 'pass')) {
      const e = v.evidence;
      const detail = e?.kind === 'statistical' ? `z-excess ${shortNumber(e.zScore)}` : e ? `ratio ${shortNumber(e.ratio)}` : '';
      lines.push(`${paint('green', 'passed ')} ${inert(v.id)}  ${paint('dim', detail)}`);
    }
  }
  const c = result.counts;
  const headline = `${c.pass} passed, ${c.fail} failed, ${c.skipped} skipped, ${c.fault} faults`;
  lines.push(
    '',
    paint(c.fail + c.fault > 0 ? 'red' : 'green', paint('bold', headline)),
    `${result.falseAlarmControl.statisticalChecks} statistical check${result.falseAlarmControl.statisticalChecks === 1 ? '' : 's'} under Holm's family-wise control at level ${result.falseAlarmControl.level}; deterministic checks against fixed ratio thresholds.`,
    paint('dim', 'What a pass means: ' + result.caveats.join(' ')),
    '',
  );
  return lines.join('\n');
}

/** Progress while the run goes, then the summary. */
export function terminalReporter(sink: TextSink, style: TerminalStyle, now: () => number = Date.now): Reporter {
  let started = 0;
  let lastPlainReport = 0;
  return {
    onRunStart({ adapter, totalChecks }) {
      started = now();
      sink.write(inert(`rmt-assay · ${adapter.name} ${adapter.version} (${adapter.kind}) · offers ${adapter.capabilities.join(', ') || 'nothing'} · ${totalChecks} checks`) + '\n');
    },
    onCheckFinished(_outcome, finished, total) {
      const elapsed = (now() - started) / 1000;
      const left = finished > 0 ? (elapsed * (total - finished)) / finished : NaN;
      if (style.interactive) {
        const width = 30;
        const filled = Math.round((width * finished) / total);
        sink.write(`\r[${'#'.repeat(filled)}${'.'.repeat(width - filled)}] ${finished}/${total} checks, about ${readableDuration(left)} left   `);
        if (finished === total) sink.write('\n');
      } else if (finished === total || finished - lastPlainReport >= Math.max(1, Math.ceil(total / 4))) {
        lastPlainReport = finished;
        sink.write(`${finished}/${total} checks done (${elapsed.toFixed(1)} s)\n`);
      }
    },
    onRunEnd(result) {
      sink.write(formatTerminalSummary(result, style));
    },
  };
}
