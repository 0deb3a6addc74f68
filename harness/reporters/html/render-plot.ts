import type { TopLevelSpec } from 'vega-lite';

/**
 * A Vega-Lite specification rendered to an SVG document in Node, without a browser or a canvas:
 * Vega-Lite compiles it to Vega, and a headless Vega view (renderer 'none') writes the scene as
 * SVG text. The result needs no script to display, so the page that embeds it opens offline.
 * Vega is loaded on first use: a run without an HTML report does not pay its start-up time.
 */
export async function renderPlotSvg(spec: TopLevelSpec): Promise<string> {
  const [{ parse, View }, { compile }] = await Promise.all([import('vega'), import('vega-lite')]);
  const view = new View(parse(compile(spec).spec), { renderer: 'none' });
  try {
    return await view.toSVG();
  } finally {
    view.finalize();
  }
}
