import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { chromium, type Browser, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Exhibit } from '../../../harness/exhibit.js';
import { formatHtmlReport } from '../../../harness/reporters/html-reporter.js';
import { escapeHtml } from '../../../harness/reporters/html/escape-html.js';
import type { RunResult } from '../../../harness/run-result.js';
import { HOSTILE, hostileRun, referenceRun } from './support/report-runs.js';

/** The Debian package's browser; .ci/run installs it where it is missing. */
const CHROMIUM = '/usr/bin/chromium';
const available = existsSync(CHROMIUM);
/** The pages and the screenshots stay here for a person to look at (gitignored). */
const artifacts = join(import.meta.dirname, '..', '..', '..', 'test-artifacts');

let passing: RunResult;
let hostile: RunResult;
let passingPage: string;
let hostilePage: string;
const files = { passing: join(artifacts, 'html-report.html'), hostile: join(artifacts, 'html-report-hostile.html') };

beforeAll(async () => {
  [passing, hostile] = await Promise.all([referenceRun(), hostileRun()]);
  [passingPage, hostilePage] = await Promise.all([formatHtmlReport(passing), formatHtmlReport(hostile)]);
  mkdirSync(artifacts, { recursive: true });
  writeFileSync(files.passing, passingPage);
  writeFileSync(files.hostile, hostilePage);
});

const exhibitsOf = (result: RunResult) => result.suites.flatMap((s) => s.checks).flatMap((c) => (c.exhibit ? [c.exhibit] : []));

describe('escapeHtml', () => {
  it('replaces the five characters that can open markup, end an attribute or start an entity', () => {
    expect(escapeHtml(`<a href="x" title='y'>&amp;</a>`)).toBe('&lt;a href=&quot;x&quot; title=&#39;y&#39;&gt;&amp;amp;&lt;/a&gt;');
    expect(escapeHtml('E⟨H²⟩ = 2 ± 0.1')).toBe('E⟨H²⟩ = 2 ± 0.1');
  });
});

describe('HTML report', () => {
  it('draws every exhibit of the run as an inline SVG picture, one figure each', () => {
    const exhibits = exhibitsOf(passing);
    const figures = [...passingPage.matchAll(/<figure id="plot-\d+" class="plot" data-kind="([a-z-]+)"[^>]*>\s*<svg[^>]*class="marks"/g)];
    expect(figures.map((f) => f[1])).toEqual(exhibits.map((e) => e.kind));
    expect(new Set(figures.map((f) => f[1]))).toEqual(new Set(['spectral-histogram', 'normal-quantiles', 'observed-vs-predicted', 'log-log-decay']));
  });

  it('opens offline: no external resource, and a policy that admits only its own script', () => {
    for (const page of [passingPage, hostilePage]) {
      expect(page).not.toMatch(/<(link|img|iframe|object|embed)\b|<[^>]*\ssrc=/i);
      expect([...page.matchAll(/href="([^"]*)"/g)].map((m) => m[1]).filter((h) => !h.startsWith('#'))).toEqual([]);
      expect(page).not.toMatch(/url\((?!#)/);
      const scripts = [...page.matchAll(/<script>([\s\S]*?)<\/script>/g)].map((m) => m[1]);
      expect(scripts).toHaveLength(1);
      const hash = createHash('sha256').update(scripts[0]).digest('base64');
      expect(page).toContain(`script-src 'sha256-${hash}'`);
      expect(page).toMatch(/<meta http-equiv="Content-Security-Policy" content="default-src 'none';/);
    }
  });

  it('shows every untrusted string as text: no markup from an adapter, a message or a label reaches the page raw', () => {
    for (const raw of ['<script>alert(1)', '<img src=x', '<svg onload', '<i>GUE</i>', '<b>1.0</b>', '<script>alert(3)', 'onerror="alert']) {
      expect(hostilePage).not.toContain(raw);
    }
    for (const text of [HOSTILE.name, HOSTILE.version, HOSTILE.notOffered, HOSTILE.log.trim(), `eigenvalues: ${HOSTILE.fault}`]) {
      expect(hostilePage).toContain(escapeHtml(text));
    }
    // Labels inside the pictures are escaped by the SVG renderer.
    expect(hostilePage).toContain('&lt;svg onload=alert(4)&gt;GOE&amp;lt;');
  });

  it('lists failures first, then faults, skips and passes', () => {
    const states = [...hostilePage.matchAll(/<tr id="check-\d+" class="state-(\w+)"/g)].map((m) => m[1]);
    const order = ['fail', 'fault', 'skipped', 'pass'];
    expect(states).toHaveLength(Object.values(hostile.counts).reduce((a, b) => a + b, 0));
    expect(states.map((s) => order.indexOf(s))).toEqual([...states.map((s) => order.indexOf(s))].sort((a, b) => a - b));
  });

  it('says so instead of drawing when an exhibit has no finite value, and counts what it left out', async () => {
    const [first, ...rest] = passing.suites;
    const withExhibits = (edit: (e: Exhibit) => Exhibit): RunResult => ({
      ...passing,
      suites: [{ ...first, checks: first.checks.map((c) => (c.exhibit ? { ...c, exhibit: edit(c.exhibit) } : c)) }, ...rest],
    });
    const empty = await formatHtmlReport(
      withExhibits((e) => (e.kind === 'spectral-histogram' ? { ...e, density: e.density.map(() => NaN) } : e)),
    );
    expect(empty).toMatch(/data-kind="spectral-histogram"[^>]*>\s*<p class="no-plot">Nothing finite to draw\.<\/p>/);
    const partial = await formatHtmlReport(
      withExhibits((e) => (e.kind === 'log-log-decay' ? { ...e, points: e.points.map((p, i) => (i === 0 ? { ...p, value: Infinity } : p)) } : e)),
    );
    expect(partial).toContain('1 non-finite value left out.');
  });
});

let browser: Browser;

/** A page of the report in the browser, with what it printed to its console and any dialog it opened. */
async function open(which: keyof typeof files): Promise<{ page: Page; errors: string[]; dialogs: string[] }> {
  const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
  const errors: string[] = [];
  const dialogs: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error' || m.type() === 'warning') errors.push(`${m.type()}: ${m.text()}`);
  });
  page.on('pageerror', (e) => errors.push(`page error: ${e.message}`));
  page.on('dialog', (d) => {
    dialogs.push(d.message());
    void d.dismiss();
  });
  await page.goto(pathToFileURL(files[which]).href, { waitUntil: 'load' });
  return { page, errors, dialogs };
}

describe.skipIf(!available)(`HTML report in headless Chromium${available ? '' : ` (skipped: no browser at ${CHROMIUM}; apt-get install chromium)`}`, () => {
  beforeAll(async () => {
    browser = await chromium.launch({
      executablePath: CHROMIUM,
      args: ['--headless', '--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
    });
  });

  afterAll(async () => {
    await browser?.close();
  });

  it('opens without console errors and shows every plot as an SVG with marks; keeps a screenshot', async () => {
    const { page, errors } = await open('passing');
    const figures = await page.$$eval('figure.plot', (all) =>
      all.map((f) => {
        const svg = f.querySelector('svg');
        const box = svg?.getBoundingClientRect();
        return {
          kind: f.getAttribute('data-kind'),
          width: box?.width ?? 0,
          height: box?.height ?? 0,
          // Data marks (bars, points, lines, rules), not axes or legends.
          marks: svg?.querySelectorAll('g.role-mark path, g.role-mark line').length ?? 0,
        };
      }),
    );
    const exhibits = passing.suites.flatMap((s) => s.checks).flatMap((c) => (c.exhibit ? [c.exhibit.kind] : []));
    expect(figures.map((f) => f.kind)).toEqual(exhibits);
    expect(new Set(exhibits).size).toBe(4);
    for (const f of figures) {
      expect(f.width, f.kind ?? '').toBeGreaterThan(200);
      expect(f.height, f.kind ?? '').toBeGreaterThan(150);
      expect(f.marks, f.kind ?? '').toBeGreaterThan(2);
    }
    const screenshot = join(artifacts, 'html-report.png');
    await page.screenshot({ path: screenshot, fullPage: true });
    expect(statSync(screenshot).size).toBeGreaterThan(10_000);
    expect(errors).toEqual([]);
    await page.close();
  });

  it('filters the table and the pictures by suite and by state', async () => {
    const { page, errors } = await open('hostile');
    const visibleRows = () => page.$$eval('#checks tbody tr', (rows) => rows.filter((r) => !r.hidden).map((r) => [r.getAttribute('data-suite'), r.getAttribute('data-state')]));
    expect(await visibleRows()).toHaveLength(Object.values(hostile.counts).reduce((a, b) => a + b, 0));
    await page.selectOption('#state-filter', 'fault');
    expect((await visibleRows()).map(([, state]) => state)).toEqual(Array(hostile.counts.fault).fill('fault'));
    expect(await page.textContent('#shown-count')).toBe(`${hostile.counts.fault} of ${Object.values(hostile.counts).reduce((a, b) => a + b, 0)} checks shown`);
    await page.selectOption('#state-filter', 'fail');
    await page.selectOption('#suite-filter', 'power-traces');
    const failedPowerTraces = hostile.suites.find((s) => s.name === 'power-traces')!.checks.filter((c) => c.state === 'fail');
    expect(await visibleRows()).toEqual(failedPowerTraces.map(() => ['power-traces', 'fail']));
    const shownFigures = await page.$$eval('figure.plot', (all) => all.filter((f) => !f.hidden).map((f) => f.getAttribute('data-suite')));
    expect(shownFigures.length).toBeGreaterThan(0);
    expect(new Set(shownFigures)).toEqual(new Set(['power-traces']));
    await page.screenshot({ path: join(artifacts, 'html-report-hostile.png'), fullPage: true });
    expect(errors).toEqual([]);
    await page.close();
  });

  it('shows markup and script from an adapter, its messages, its log and the labels as text, and runs none of it', async () => {
    const { page, errors, dialogs } = await open('hostile');
    expect(dialogs).toEqual([]);
    expect(await page.$$eval('script', (s) => s.length)).toBe(1);
    // No element the untrusted strings would have made: <img>, <i>, <b>, an <svg> outside a figure, an event handler.
    expect(await page.$$eval('img, i, b, [onerror], [onload], body > svg, section > svg', (found) => found.length)).toBe(0);
    expect(await page.textContent('h1 .adapter-name')).toBe(HOSTILE.name);
    expect(await page.textContent('title')).toContain(HOSTILE.name);
    const reasons = await page.$$eval('#checks td.reason', (cells) => cells.map((c) => c.textContent));
    expect(reasons).toContain(`eigenvalues: ${HOSTILE.fault}`);
    expect(reasons).toContain(HOSTILE.notOffered);
    expect(await page.textContent('#adapter-log pre')).toBe(HOSTILE.log);
    const captions = await page.$$eval('figcaption strong', (all) => all.map((c) => c.textContent ?? ''));
    expect(captions.some((c) => c.includes(HOSTILE.label))).toBe(true);
    const pointLabels = await page.$$eval('figure[data-kind="observed-vs-predicted"] svg text', (all) => all.map((t) => t.textContent ?? ''));
    expect(pointLabels).toContain(`Var Tr H^2 (${HOSTILE.label})`);
    expect(errors).toEqual([]);
    await page.close();
  });
});
