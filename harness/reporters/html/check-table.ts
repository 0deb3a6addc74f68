import type { RunResult } from '../../run-result.js';
import type { CheckVerdict, VerdictState } from '../../verdict.js';
import { evidenceLines } from '../evidence-lines.js';
import { shortNumber, shortQuantity } from '../format-quantity.js';
import { escapeHtml } from './escape-html.js';

/** Failures first, then faults, skips and passes; within a state, the run's order. */
const STATE_ORDER: readonly VerdictState[] = ['fail', 'fault', 'skipped', 'pass'];
export const STATE_LABELS: Readonly<Record<VerdictState, string>> = { fail: 'failed', fault: 'fault', skipped: 'skipped', pass: 'passed' };

/** A check as the page refers to it: its anchor, and the anchor of its picture if it has one. */
export interface CheckAnchor {
  readonly verdict: CheckVerdict;
  readonly rowId: string;
  readonly plotId?: string;
}

function parametersText(v: CheckVerdict): string {
  return Object.entries(v.parameters)
    .map(([key, value]) => `${key}=${value}`)
    .join(', ');
}

/** The measured columns: observed, expected, error bar (or ratio), allowance (or threshold), p. */
function measuredCells(v: CheckVerdict): string {
  const e = v.evidence;
  if (e === undefined) return `<td colspan="5" class="reason">${escapeHtml(v.reason ?? '')}</td>`;
  const cells =
    e.kind === 'statistical'
      ? [shortQuantity(e.observed, 8), shortQuantity(e.expected, 8), `±${shortQuantity(e.standardError, 3)}`, shortNumber(e.allowance), shortNumber(v.adjustedPValue ?? NaN)]
      : [shortQuantity(e.observed, 12), shortQuantity(e.expected, 12), `ratio ${shortNumber(e.ratio)}`, `threshold ${e.threshold}`, '—'];
  return cells.map((c) => `<td class="num">${escapeHtml(c)}</td>`).join('');
}

function detailText(v: CheckVerdict): string {
  const lines = [
    v.title,
    ...evidenceLines(v),
    ...(v.path ? [`path       ${v.path}`] : []),
    ...(v.reason && v.evidence === undefined ? [`reason     ${v.reason}`] : []),
    ...(v.faultKind ? [`fault      ${v.faultKind} in ${v.faultMethod ?? 'unknown method'}`] : []),
    `replay     ${v.replay}`,
  ];
  return lines.join('\n');
}

function row(a: CheckAnchor): string {
  const v = a.verdict;
  const plot = a.plotId === undefined ? '' : ` <a class="plot-link" href="#${a.plotId}">picture</a>`;
  return [
    `<tr id="${a.rowId}" class="state-${v.state}" data-suite="${escapeHtml(v.suite)}" data-state="${v.state}">`,
    `<td><span class="badge ${v.state}">${STATE_LABELS[v.state]}</span></td>`,
    `<td>${escapeHtml(v.suite)}</td>`,
    `<td><div class="title">${escapeHtml(v.title)}</div><code class="id">${escapeHtml(v.id)}</code>${plot}</td>`,
    `<td class="params">${escapeHtml(parametersText(v))}</td>`,
    measuredCells(v),
    `<td><details><summary>details</summary><pre>${escapeHtml(detailText(v))}</pre></details></td>`,
    '</tr>',
  ].join('');
}

/** The filters (suite, state) and the table of every check, failures first. */
export function checkTable(result: RunResult, anchors: readonly CheckAnchor[]): string {
  const ordered = STATE_ORDER.flatMap((state) => anchors.filter((a) => a.verdict.state === state));
  const suiteOptions = result.suites.map((s) => `<option value="${escapeHtml(s.name)}">${escapeHtml(s.name)}</option>`).join('');
  const stateOptions = STATE_ORDER.map((s) => `<option value="${s}">${STATE_LABELS[s]} (${result.counts[s]})</option>`).join('');
  return `<section id="checks-section">
<h2>Checks</h2>
<form class="filters" aria-label="filter the checks">
<label>Suite <select id="suite-filter"><option value="">all suites</option>${suiteOptions}</select></label>
<label>State <select id="state-filter"><option value="">all states</option>${stateOptions}</select></label>
<output id="shown-count">${anchors.length} of ${anchors.length} checks shown</output>
</form>
<div class="table-wrap">
<table id="checks">
<thead><tr><th>State</th><th>Suite</th><th>Check</th><th>Parameters</th><th>Observed</th><th>Expected</th><th>Error bar</th><th>Allowance</th><th>p (Holm)</th><th></th></tr></thead>
<tbody>
${ordered.map(row).join('\n')}
</tbody>
</table>
</div>
</section>`;
}
