import type { RunResult } from '../run-result.js';
import type { CheckVerdict } from '../verdict.js';
import { shortNumber, shortQuantity } from './format-quantity.js';
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
 * The evidence of a failed check. Sources and methods shared with an earlier failure in the same
 * summary are printed once and then referred to, so a run with many failures stays readable.
 */
function describeEvidence(v: CheckVerdict, seen: Set<string>): string[] {
  const once = (text: string) => {
    if (seen.has(text)) return 'as above';
    seen.add(text);
    return text;
  };
  const e = v.evidence;
  if (e === undefined) return [];
  if (e.kind === 'statistical') {
    return [
      `  observed   ${shortQuantity(e.observed, 8)}`,
      `  expected   ${shortQuantity(e.expected, 8)}`,
      `  source     ${once(e.expectedSource)}`,
      `  error bar  ±${shortQuantity(e.standardError, 3)} (${once(e.standardErrorMethod)})`,
      `  allowance  ${shortNumber(e.allowance)} (${once(e.allowanceReason)})`,
      `  excess     ${shortNumber(e.zScore)} standard errors beyond the allowance; p = ${shortNumber(e.pValue)}, Holm-adjusted ${shortNumber(v.adjustedPValue ?? NaN)}`,
    ];
  }
  return [
    `  observed   ${shortQuantity(e.observed, 12)}`,
    `  expected   ${shortQuantity(e.expected, 12)}`,
    `  source     ${once(e.expectedSource)}`,
    `  ratio      ${shortNumber(e.ratio)} against threshold ${e.threshold} (${once(e.toleranceReason)})`,
    ...(e.worstInput ? [`  input      ${e.worstInput}`] : []),
  ];
}

/** The readable summary: failures first with everything needed to judge and replay them. */
export function formatTerminalSummary(result: RunResult, style: TerminalStyle): string {
  const paint = painter(style.interactive);
  const all = result.suites.flatMap((s) => s.checks);
  const lines: string[] = [''];
  const seen = new Set<string>();
  for (const v of all.filter((c) => c.state === 'fail')) {
    lines.push(`${paint('red', 'FAILED ')} ${v.id}`, `  ${v.title}`, ...describeEvidence(v, seen));
    if (v.path) lines.push(`  path       ${v.path}`);
    lines.push(`  replay     ${v.replay}`, '');
  }
  for (const v of all.filter((c) => c.state === 'fault')) {
    lines.push(`${paint('red', 'FAULT  ')} ${v.id}`, `  ${v.reason}`, `  replay     ${v.replay}`, '');
  }
  const skippedReasons = new Map<string, number>();
  for (const v of all.filter((c) => c.state === 'skipped')) skippedReasons.set(v.reason ?? '', (skippedReasons.get(v.reason ?? '') ?? 0) + 1);
  for (const [reason, n] of skippedReasons) lines.push(`${paint('yellow', 'SKIPPED')} ${n} check${n === 1 ? '' : 's'}: ${reason}`);
  if (style.verbose) {
    for (const v of all.filter((c) => c.state === 'pass')) {
      const e = v.evidence;
      const detail = e?.kind === 'statistical' ? `z-excess ${shortNumber(e.zScore)}` : e ? `ratio ${shortNumber(e.ratio)}` : '';
      lines.push(`${paint('green', 'passed ')} ${v.id}  ${paint('dim', detail)}`);
    }
  }
  const c = result.counts;
  const headline = `${c.pass} passed, ${c.fail} failed, ${c.skipped} skipped, ${c.fault} faults`;
  lines.push(
    '',
    paint(c.fail + c.fault > 0 ? 'red' : 'green', paint('bold', headline)),
    `${result.falseAlarmControl.statisticalChecks} statistical checks under Holm's family-wise control at level ${result.falseAlarmControl.level}; deterministic checks against fixed ratio thresholds.`,
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
      sink.write(`rmt-assay · ${adapter.name} ${adapter.version} (${adapter.kind}) · offers ${adapter.capabilities.join(', ') || 'nothing'} · ${totalChecks} checks\n`);
    },
    onCheckFinished(_outcome, finished, total) {
      const elapsed = (now() - started) / 1000;
      const left = finished > 0 ? (elapsed * (total - finished)) / finished : NaN;
      if (style.interactive) {
        const width = 30;
        const filled = Math.round((width * finished) / total);
        sink.write(`\r[${'#'.repeat(filled)}${'.'.repeat(width - filled)}] ${finished}/${total} checks, about ${Math.ceil(left)} s left   `);
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
