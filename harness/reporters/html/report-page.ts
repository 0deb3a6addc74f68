import { createHash } from 'node:crypto';
import { escapeHtml } from './escape-html.js';

const STYLE = `
:root { --pass: #2e7d32; --fail: #c62828; --fault: #6a1b9a; --skipped: #8d6e00; --line: #ddd; }
body { font: 14px/1.45 system-ui, sans-serif; margin: 1.5rem auto; max-width: 1400px; padding: 0 1rem; color: #222; }
h1 { font-size: 1.5rem; margin: 0 0 .5rem; } h2 { font-size: 1.2rem; margin-top: 2rem; border-bottom: 1px solid var(--line); }
h3 { font-size: 1rem; }
code, pre { font: 12px/1.4 ui-monospace, monospace; }
pre { white-space: pre-wrap; word-break: break-word; margin: .4rem 0; }
.badge { display: inline-block; padding: 0 .45em; border-radius: 3px; color: white; font-weight: 600; white-space: nowrap; }
.badge.pass { background: var(--pass); } .badge.fail { background: var(--fail); }
.badge.fault { background: var(--fault); } .badge.skipped { background: var(--skipped); }
.headline { font-size: 1.1rem; }
.facts { display: grid; grid-template-columns: max-content 1fr; gap: .1rem 1rem; }
.facts dt { font-weight: 600; } .facts dd { margin: 0; }
.failures li { margin-bottom: .4rem; } .failures code.replay { display: block; color: #555; }
.filters { display: flex; gap: 1.5rem; align-items: center; margin: .5rem 0; }
.table-wrap { overflow-x: auto; }
table { border-collapse: collapse; width: 100%; font-size: 13px; }
th, td { border-bottom: 1px solid var(--line); padding: .3rem .4rem; text-align: left; vertical-align: top; }
th { background: #f5f5f5; position: sticky; top: 0; }
td.num { font-variant-numeric: tabular-nums; overflow-wrap: anywhere; min-width: 5em; }
td.params { font-size: 12px; color: #444; }
code.id { color: #555; font-size: 11px; }
tr.state-fail { background: #fdecea; } tr.state-fault { background: #f3e5f5; }
.figures { display: flex; flex-wrap: wrap; gap: 1.5rem; }
figure { margin: 0; max-width: 520px; }
figure svg { max-width: 100%; height: auto; }
figcaption { font-size: 12px; color: #333; }
[hidden] { display: none !important; }
`;

/**
 * Shows only the rows and pictures of the chosen suite and state. The page's only script; the
 * Content-Security-Policy admits it by its hash and nothing else.
 */
const FILTER_SCRIPT = `
(function () {
  var suite = document.getElementById('suite-filter');
  var state = document.getElementById('state-filter');
  var shown = document.getElementById('shown-count');
  function apply() {
    var rows = 0, visible = 0;
    document.querySelectorAll('[data-suite][data-state]').forEach(function (el) {
      var ok = (suite.value === '' || el.getAttribute('data-suite') === suite.value) && (state.value === '' || el.getAttribute('data-state') === state.value);
      el.hidden = !ok;
      if (el.tagName === 'TR') { rows++; if (ok) visible++; }
    });
    shown.textContent = visible + ' of ' + rows + ' checks shown';
  }
  suite.addEventListener('change', apply);
  state.addEventListener('change', apply);
  apply();
})();
`;

const SCRIPT_HASH = createHash('sha256').update(FILTER_SCRIPT).digest('base64');

/**
 * The page around the report's sections: one file with its style, its pictures (inline SVG) and
 * its filter script inside, so it opens offline. The Content-Security-Policy forbids every other
 * script, connection and external resource, a second guard behind the escaping of every string.
 */
export function reportPage(title: string, sections: readonly string[]): string {
  const policy = `default-src 'none'; style-src 'unsafe-inline'; img-src data:; script-src 'sha256-${SCRIPT_HASH}'; base-uri 'none'; form-action 'none'`;
  return `<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta http-equiv="Content-Security-Policy" content="${policy}">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)}</title>
<style>${STYLE}</style>
</head>
<body>
${sections.join('\n')}
<script>${FILTER_SCRIPT}</script>
</body>
</html>
`;
}
