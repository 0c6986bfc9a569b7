/**
 * The HTML report in a real browser (Debian's Chromium through playwright-core): every chart renders, nothing is
 * logged as an error, nothing is fetched from the network, and a category label `<script>` shows as text.
 */
import { existsSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { chromium, type Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { chartBundle } from '../../src/notebook/chart-bundle.js';
import { chartDrift, chartImportance } from '../../src/charts/index.js';
import { compareRuns } from '../../src/notebook/compare-runs.js';
import { comparisonCharts } from '../../src/notebook/report-comparison-charts.js';
import { renderReport } from '../../src/notebook/report-html.js';
import type { NotebookDocument } from '../../src/notebook/runner-notebook.js';
import { boundExtract, decision, runRecord } from '../notebook/record-fixtures.js';

const CHROMIUM = '/usr/bin/chromium';
const ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
  '--disable-background-networking', '--disable-component-update', '--disable-sync'];
const EVIL = '<script>window.__pwned = 1</script>';

let browser: Browser;
let reportUrl: string;

beforeAll(async () => {
  const km = Array.from({ length: 200 }, (_, i) => i % 50);
  const base = runRecord('spring', {
    extracts: [boundExtract('pallets', { crop: km.map((i) => (i % 3 ? 'kale' : 'leek')), km })],
    metrics: [{ name: 'mae', value: 1.1, higherIsBetter: false }],
  });
  const current = runRecord('summer', {
    extracts: [boundExtract('pallets', { crop: km.map((i) => (i % 3 ? 'kale' : EVIL)), km: km.map((x) => x + 20) })],
    metrics: [{ name: 'mae', value: 1.7, higherIsBetter: false }],
    decisions: [decision('Keep the model', [['mae <= 1.5', false]])], affectsPeople: ['pricing'],
  });
  const comparison = compareRuns(base, current);
  const importance = chartBundle(chartImportance([{ feature: EVIL, value: 0.6 }, { feature: 'km', value: 0.4 }]));
  const notebook: NotebookDocument = {
    nbformat: 4, nbformat_minor: 5, metadata: {},
    cells: [
      { cell_type: 'markdown', metadata: {}, source: `# Report check\n\nA label ${EVIL} in prose.` },
      { cell_type: 'code', metadata: {}, execution_count: 1, source: 'show(chart)', outputs: [
        { output_type: 'display_data', metadata: {}, data: await importance },
        { output_type: 'display_data', metadata: {}, data: await chartBundle(chartDrift([{ feature: 'km', psi: 0.3 }, { feature: EVIL, psi: 0.05 }])) },
      ] },
    ],
  };
  const html = renderReport({ notebook, record: current, comparison, comparisonCharts: comparisonCharts(comparison) });
  const dir = mkdtempSync(join(tmpdir(), 'coppice-report-e2e-'));
  writeFileSync(join(dir, 'report.html'), html);
  reportUrl = pathToFileURL(join(dir, 'report.html')).href;
  browser = await chromium.launch({ executablePath: CHROMIUM, args: ARGS });
});

afterAll(async () => { await browser?.close(); });

describe('report.html in Chromium', () => {
  it('renders every chart with no console errors or network requests, and shows <script> labels as text', async () => {
    expect(existsSync(CHROMIUM)).toBe(true);
    const page = await browser.newPage();
    const problems: string[] = [];
    const requests: string[] = [];
    page.on('console', (m) => { if (m.type() === 'error' || m.type() === 'warning') problems.push(`${m.type()}: ${m.text()}`); });
    page.on('pageerror', (e) => problems.push(`pageerror: ${e.message}`));
    page.on('request', (r) => { if (!r.url().startsWith('file:') && !r.url().startsWith('data:')) requests.push(r.url()); });
    await page.goto(reportUrl);
    const charts = await page.locator('div.chart').count();
    expect(charts).toBe(4); // two notebook charts + drift and metric-change charts of the comparison
    // Runs in the page: `document` there is the browser's (this file is type-checked without the DOM library).
    await page.waitForFunction(`[...document.querySelectorAll('div.chart')].every((d) => d.querySelector('svg, canvas'))`, null, { timeout: 30_000 });
    const drawn = await page.locator('div.chart svg, div.chart canvas').count();
    expect(drawn).toBeGreaterThanOrEqual(charts);
    expect(await page.evaluate('window.__pwned')).toBeUndefined();
    const text = await page.locator('main').innerText();
    expect(text).toContain('<script>window.__pwned = 1</script>'); // the label, shown as text
    const svgText = await page.locator('div.chart svg text').allTextContents();
    expect(svgText.some((t) => t.includes('<script>'))).toBe(true); // and inside a chart as an axis label
    expect(problems).toEqual([]);
    expect(requests).toEqual([]);
    await page.close();
  });
});
