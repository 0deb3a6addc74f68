import type { TopLevelSpec } from 'vega-lite';
import { semicircleDensity } from '../../../reference-values/semicircle-law.js';
import { upperNormalQuantile } from '../../estimators/normal-tail.js';
import type { Exhibit } from '../../exhibit.js';

/** A Vega-Lite picture of an exhibit, and how many of its values were left out as non-finite. */
export interface PlotSpec {
  readonly spec: TopLevelSpec;
  readonly pointsDrawn: number;
  readonly pointsLeftOut: number;
}

const WIDTH = 420;
const HEIGHT = 260;
/** More points than this in a quantile plot are thinned to evenly spaced order statistics. */
const MAX_QUANTILE_POINTS = 400;
const OBSERVED = '#4c78a8';
const THEORY = '#e45756';

const finite = (...xs: number[]) => xs.every(Number.isFinite);

function frame(layers: unknown[], extra: Record<string, unknown> = {}): TopLevelSpec {
  return {
    width: WIDTH,
    height: HEIGHT,
    background: 'white',
    // No ARIA attributes per mark: the figure around the picture carries its description.
    config: { font: 'sans-serif', aria: false, legend: { orient: 'top', labelLimit: 0 } },
    layer: layers,
    ...extra,
  } as TopLevelSpec;
}

/** A colour legend entry for a layer, so every picture says which marks are data and which theory. */
const legendColour = (name: string, colours: readonly [string, string], names: readonly [string, string]) => ({
  datum: name,
  scale: { domain: [...names], range: [...colours] },
});

/** Bars of the observed density per bin, with the semicircle density ρ(x) = √(4 − x²)/(2π) over them. */
function spectralHistogram(e: Extract<Exhibit, { kind: 'spectral-histogram' }>): PlotSpec {
  const names = ['observed density', 'semicircle ρ(x)'] as const;
  const colours = [OBSERVED, THEORY] as const;
  const all = e.density.map((density, k) => ({ from: e.binEdges[k], to: e.binEdges[k + 1], density }));
  const bars = all.filter((b) => finite(b.from, b.to, b.density));
  const lo = Math.min(...e.binEdges.filter(Number.isFinite), -2);
  const hi = Math.max(...e.binEdges.filter(Number.isFinite), 2);
  const steps = 240;
  // The curve's grid includes ±2 exactly, where the density meets zero with a vertical tangent.
  const xs = [...Array.from({ length: steps + 1 }, (_, k) => lo + ((hi - lo) * k) / steps), -2, 2].sort((a, b) => a - b);
  const curve = xs.map((x) => ({ x, density: semicircleDensity(x) }));
  return {
    pointsDrawn: bars.length,
    pointsLeftOut: all.length - bars.length,
    spec: frame([
      {
        data: { values: bars },
        mark: { type: 'rect', opacity: 0.75, stroke: 'white', strokeWidth: 0.5 },
        encoding: {
          x: { field: 'from', type: 'quantitative', title: 'eigenvalue', scale: { domain: [lo, hi] } },
          x2: { field: 'to' },
          y: { field: 'density', type: 'quantitative', title: 'density' },
          y2: { datum: 0 },
          color: legendColour(names[0], colours, names),
        },
      },
      {
        data: { values: curve },
        mark: { type: 'line', strokeWidth: 2 },
        encoding: { x: { field: 'x', type: 'quantitative' }, y: { field: 'density', type: 'quantitative' }, color: legendColour(names[1], colours, names) },
      },
    ]),
  };
}

/** Order statistics of the standardised values against standard normal quantiles (Blom's plotting positions), with y = x. */
function normalQuantiles(e: Extract<Exhibit, { kind: 'normal-quantiles' }>): PlotSpec {
  const names = ['standardised fluctuations', 'standard normal (y = x)'] as const;
  const colours = [OBSERVED, THEORY] as const;
  const sorted = e.standardised.filter((x) => Number.isFinite(x)).sort((a, b) => a - b);
  const n = sorted.length;
  // Blom (1958): (i − 3/8)/(n + 1/4) approximates the mean normal order statistic's probability.
  const quantile = (i: number) => -upperNormalQuantile((i + 1 - 0.375) / (n + 0.25));
  const step = n > MAX_QUANTILE_POINTS ? (n - 1) / (MAX_QUANTILE_POINTS - 1) : 1;
  const indices = n > MAX_QUANTILE_POINTS ? Array.from({ length: MAX_QUANTILE_POINTS }, (_, k) => Math.round(k * step)) : sorted.map((_, i) => i);
  const points = indices.map((i) => ({ normal: quantile(i), observed: sorted[i] }));
  const reach = Math.max(1, ...points.map((p) => Math.max(Math.abs(p.normal), Math.abs(p.observed))));
  return {
    pointsDrawn: points.length,
    pointsLeftOut: e.standardised.length - n,
    spec: frame([
      {
        data: { values: [{ x: -reach, y: -reach }, { x: reach, y: reach }] },
        mark: { type: 'line', strokeDash: [6, 4] },
        encoding: {
          x: { field: 'x', type: 'quantitative', title: 'standard normal quantile' },
          y: { field: 'y', type: 'quantitative', title: 'standardised value' },
          color: legendColour(names[1], colours, names),
        },
      },
      {
        data: { values: points },
        mark: { type: 'point', filled: true, size: 18, opacity: 0.8 },
        encoding: { x: { field: 'normal', type: 'quantitative' }, y: { field: 'observed', type: 'quantitative' }, color: legendColour(names[0], colours, names) },
      },
    ]),
  };
}

/** Observed against predicted values, each with a ±1 standard error bar, and the line observed = predicted. */
function observedVsPredicted(e: Extract<Exhibit, { kind: 'observed-vs-predicted' }>): PlotSpec {
  const names = ['observed ± 1 standard error', 'observed = predicted'] as const;
  const colours = [OBSERVED, THEORY] as const;
  const points = e.points
    .filter((p) => finite(p.observed, p.predicted, p.standardError))
    .map((p) => ({ label: p.label, predicted: p.predicted, observed: p.observed, low: p.observed - p.standardError, high: p.observed + p.standardError }));
  const values = points.flatMap((p) => [p.predicted, p.low, p.high]);
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  const x = { field: 'predicted', type: 'quantitative', title: 'predicted', scale: { zero: false } };
  const layers: unknown[] = [
    {
      data: { values: [{ x: lo, y: lo }, { x: hi, y: hi }] },
      mark: { type: 'line', strokeDash: [6, 4] },
      encoding: { x: { field: 'x', type: 'quantitative', scale: { zero: false } }, y: { field: 'y', type: 'quantitative', scale: { zero: false } }, color: legendColour(names[1], colours, names) },
    },
    { data: { values: points }, mark: { type: 'rule', strokeWidth: 1.5 }, encoding: { x, y: { field: 'low', type: 'quantitative' }, y2: { field: 'high' }, color: legendColour(names[0], colours, names) } },
    {
      data: { values: points },
      mark: { type: 'point', filled: true, size: 40 },
      encoding: { x, y: { field: 'observed', type: 'quantitative', title: 'observed', scale: { zero: false } }, color: legendColour(names[0], colours, names) },
    },
  ];
  // Names beside the points only while they stay legible.
  if (points.length <= 12) {
    layers.push({ data: { values: points }, mark: { type: 'text', align: 'left', dx: 6, dy: -6, fontSize: 10, color: '#333' }, encoding: { x, y: { field: 'observed', type: 'quantitative' }, text: { field: 'label' } } });
  }
  return { pointsDrawn: points.length, pointsLeftOut: e.points.length - points.length, spec: frame(layers) };
}

/**
 * The mean over N on log–log axes with the fitted line log value = intercept + slope · log N.
 * Bars are ±1 standard error carried to the log scale by the delta method (value · e^{±se/value}),
 * the weights the fit used.
 */
function logLogDecay(e: Extract<Exhibit, { kind: 'log-log-decay' }>): PlotSpec {
  const names = ['mean ± 1 standard error', `fitted slope ${Number(e.slope.toPrecision(3))}`] as const;
  const colours = [OBSERVED, THEORY] as const;
  const points = e.points
    .filter((p) => finite(p.n, p.value, p.standardError) && p.n > 0 && p.value > 0)
    .map((p) => ({ n: p.n, value: p.value, low: p.value * Math.exp(-p.standardError / p.value), high: p.value * Math.exp(p.standardError / p.value) }));
  const ns = points.map((p) => p.n);
  const line = finite(e.slope, e.intercept) && ns.length > 0 ? [Math.min(...ns), Math.max(...ns)].map((n) => ({ n, value: Math.exp(e.intercept + e.slope * Math.log(n)) })) : [];
  // Domains a little wider than the data, not rounded out to whole decades.
  const margin = 1.25;
  const lows = points.map((p) => p.low).concat(line.map((p) => p.value));
  const highs = points.map((p) => p.high).concat(line.map((p) => p.value));
  const x = { field: 'n', type: 'quantitative', title: 'matrix size N (log scale)', scale: { type: 'log', nice: false, domain: [Math.min(...ns) / margin, Math.max(...ns) * margin] } };
  const y = { type: 'quantitative', scale: { type: 'log', nice: false, domain: [Math.min(...lows) / margin, Math.max(...highs) * margin] } };
  return {
    pointsDrawn: points.length,
    pointsLeftOut: e.points.length - points.length,
    spec: frame([
      { data: { values: line }, mark: { type: 'line', strokeDash: [6, 4] }, encoding: { x, y: { ...y, field: 'value' }, color: legendColour(names[1], colours, names) } },
      { data: { values: points }, mark: { type: 'rule', strokeWidth: 1.5 }, encoding: { x, y: { ...y, field: 'low' }, y2: { field: 'high' }, color: legendColour(names[0], colours, names) } },
      {
        data: { values: points },
        mark: { type: 'point', filled: true, size: 50 },
        encoding: { x, y: { ...y, field: 'value', title: 'value (log scale)' }, color: legendColour(names[0], colours, names) },
      },
    ]),
  };
}

/** The picture of an exhibit, by its kind. */
export function exhibitPlotSpec(exhibit: Exhibit): PlotSpec {
  switch (exhibit.kind) {
    case 'spectral-histogram':
      return spectralHistogram(exhibit);
    case 'normal-quantiles':
      return normalQuantiles(exhibit);
    case 'observed-vs-predicted':
      return observedVsPredicted(exhibit);
    case 'log-log-decay':
      return logLogDecay(exhibit);
  }
}
