import type { Exhibit } from '../exhibit.js';
import type { RunResult } from '../run-result.js';
import { checkTable, STATE_LABELS, type CheckAnchor } from './html/check-table.js';
import { escapeHtml } from './html/escape-html.js';
import { exhibitPlotSpec, type PlotSpec } from './html/plot-specs.js';
import { renderPlotSvg } from './html/render-plot.js';
import { reportPage } from './html/report-page.js';
import { summarySection } from './html/summary-section.js';
import type { Reporter, TextSink } from './reporter.js';

const PICTURE_NOTES: Readonly<Record<Exhibit['kind'], string>> = {
  'spectral-histogram': 'Empirical spectral density (bars) against the semicircle density ρ(x) = √(4 − x²)/(2π).',
  'normal-quantiles': 'Normal quantile plot: Gaussian fluctuations lie on the dashed line y = x.',
  'observed-vs-predicted': 'Observed against predicted, bars ±1 standard error; agreement lies on the dashed line.',
  'log-log-decay': 'Log–log decay with the weighted least-squares line; bars ±1 standard error (delta method).',
};

function coverageNote(exhibit: Exhibit, plot: PlotSpec): string {
  const notes: string[] = [];
  if (exhibit.kind === 'log-log-decay') notes.push(`Fitted slope ${Number(exhibit.slope.toPrecision(4))}.`);
  if (exhibit.kind === 'normal-quantiles' && plot.pointsDrawn < exhibit.standardised.length - plot.pointsLeftOut) {
    notes.push(`${plot.pointsDrawn} evenly spaced order statistics of ${exhibit.standardised.length - plot.pointsLeftOut} drawn.`);
  }
  if (plot.pointsLeftOut > 0) notes.push(`${plot.pointsLeftOut} non-finite value${plot.pointsLeftOut === 1 ? '' : 's'} left out.`);
  return notes.join(' ');
}

async function figure(anchor: CheckAnchor & { readonly plotId: string }, exhibit: Exhibit): Promise<string> {
  const v = anchor.verdict;
  const plot = exhibitPlotSpec(exhibit);
  const picture = plot.pointsDrawn > 0 ? await renderPlotSvg(plot.spec) : '<p class="no-plot">Nothing finite to draw.</p>';
  return `<figure id="${anchor.plotId}" class="plot" data-kind="${exhibit.kind}" data-suite="${escapeHtml(v.suite)}" data-state="${v.state}">
${picture}
<figcaption><span class="badge ${v.state}">${STATE_LABELS[v.state]}</span> <strong>${escapeHtml(exhibit.label)}</strong><br>
${PICTURE_NOTES[exhibit.kind]} ${escapeHtml(coverageNote(exhibit, plot))}<br>
<a href="#${anchor.rowId}"><code>${escapeHtml(v.id)}</code></a></figcaption>
</figure>`;
}

/**
 * The result model as one self-contained HTML page: the summary, a table of every check with
 * filters by suite and state, and a picture of every exhibit a check attached (spectral histogram
 * against the semicircle, normal quantile plot, observed against predicted, log–log decay), drawn
 * with Vega-Lite and embedded as SVG. Every string from the model is escaped.
 */
export async function formatHtmlReport(result: RunResult): Promise<string> {
  let plots = 0;
  const anchors = result.suites
    .flatMap((s) => s.checks)
    .map((verdict, i): CheckAnchor => ({ verdict, rowId: `check-${i}`, ...(verdict.exhibit ? { plotId: `plot-${plots++}` } : {}) }));
  const figures: string[] = [];
  for (const anchor of anchors) {
    const exhibit = anchor.verdict.exhibit;
    if (exhibit !== undefined && anchor.plotId !== undefined) figures.push(await figure({ ...anchor, plotId: anchor.plotId }, exhibit));
  }
  const suites = result.suites.map((s) => `<dt>${escapeHtml(s.name)}</dt><dd>${escapeHtml(s.description)}</dd>`).join('');
  const sections = [
    summarySection(result, anchors),
    `<section id="pictures"><h2>Pictures</h2>${figures.length > 0 ? `<div class="figures">${figures.join('\n')}</div>` : '<p>No check of this run attached a picture.</p>'}</section>`,
    checkTable(result, anchors),
    `<section id="suites"><h2>Suites</h2><dl>${suites}</dl></section>`,
    ...(result.adapterLog === '' ? [] : [`<section id="adapter-log"><h2>The implementation's own output</h2><pre>${escapeHtml(result.adapterLog)}</pre></section>`]),
  ];
  return reportPage(`${result.tool.name} report: ${result.adapter.name}`, sections);
}

/** Writes the HTML report to `sink` when the run ends. */
export function htmlReporter(sink: TextSink): Reporter {
  return {
    async onRunEnd(result) {
      sink.write(await formatHtmlReport(result));
    },
  };
}
