import type { RunResult } from '../../run-result.js';
import type { CheckAnchor } from './check-table.js';
import { escapeHtml } from './escape-html.js';

function fact(term: string, value: string): string {
  return `<dt>${term}</dt><dd>${escapeHtml(value)}</dd>`;
}

/** More failures than this are left to the table, which lists them first. */
const LISTED_FAILURES = 20;

/** The failed and faulted checks, each with a link to its row and the command that replays it. */
function failureList(anchors: readonly CheckAnchor[]): string {
  const bad = anchors.filter((a) => a.verdict.state === 'fail' || a.verdict.state === 'fault');
  if (bad.length === 0) return '';
  const more = bad.length > LISTED_FAILURES ? `<p>… and ${bad.length - LISTED_FAILURES} more in the table below.</p>` : '';
  const items = bad.slice(0, LISTED_FAILURES).map(
    ({ verdict: v, rowId }) =>
      `<li><span class="badge ${v.state}">${v.state === 'fail' ? 'failed' : 'fault'}</span> <a href="#${rowId}">${escapeHtml(v.id)}</a>` +
      `${v.state === 'fault' ? `<div class="reason">${escapeHtml(v.reason ?? '')}</div>` : ''}<code class="replay">${escapeHtml(v.replay)}</code></li>`,
  );
  return `<h3>Failed and faulted checks</h3><ul class="failures">${items.join('')}</ul>${more}`;
}

/** The head of the page: counts, what ran against what, the false-alarm control and the caveats. */
export function summarySection(result: RunResult, anchors: readonly CheckAnchor[]): string {
  const c = result.counts;
  const s = result.settings;
  const a = result.adapter;
  const headline = [
    `<span class="badge pass">${c.pass} passed</span>`,
    `<span class="badge fail">${c.fail} failed</span>`,
    `<span class="badge skipped">${c.skipped} skipped</span>`,
    `<span class="badge fault">${c.fault} faults</span>`,
  ].join(' ');
  const control = result.falseAlarmControl;
  return `<section id="summary">
<h1>${escapeHtml(result.tool.name)} report: <span class="adapter-name">${escapeHtml(a.name)}</span></h1>
<p class="headline ${c.fail + c.fault > 0 ? 'bad' : 'good'}">${headline}</p>
<dl class="facts">
${fact('Implementation', `${a.name} ${a.version} (${a.kind})`)}
${fact('Offers', a.capabilities.join(', ') || 'nothing')}
${fact('Suites', s.suites.join(', '))}
${fact('Ensembles', s.ensembles.join(', '))}
${fact('Sizes N', s.sizes.join(', '))}
${fact('Ladder', s.ladder.join(', '))}
${fact('Samples', String(s.samples))}
${fact('Seed', String(s.seed))}
${s.only.length > 0 ? fact('Only', s.only.join(' ')) : ''}
${fact('Tool', `${result.tool.name} ${result.tool.version}, report format ${result.formatVersion}`)}
</dl>
<p>${control.statisticalChecks} statistical check${control.statisticalChecks === 1 ? '' : 's'} under family-wise false-alarm control (${escapeHtml(control.method)}) at level ${control.level}; deterministic checks against fixed ratio thresholds.</p>
${failureList(anchors)}
<details class="caveats"><summary>What a pass means</summary><ul>${result.caveats.map((t) => `<li>${escapeHtml(t)}</li>`).join('')}</ul></details>
</section>`;
}
