import { describe, expect, it } from 'vitest';
import { compareRuns } from '../../src/notebook/compare-runs.js';
import { renderReport } from '../../src/notebook/report-html.js';
import { stripActiveHtml } from '../../src/notebook/report-outputs.js';
import type { NotebookDocument } from '../../src/notebook/runner-notebook.js';
import { boundExtract, decision, runRecord } from './record-fixtures.js';

const evil = '<script>alert("x")</script>';

function notebook(): NotebookDocument {
  return {
    nbformat: 4, nbformat_minor: 5, metadata: { kernelspec: { name: 'coppice' } },
    cells: [
      { cell_type: 'markdown', metadata: {}, source: ['# Parcels\n', `A label ${evil}`] },
      {
        cell_type: 'code', metadata: {}, execution_count: 1, source: 'const a = "<b>";\nshow(a)',
        outputs: [
          { output_type: 'stream', name: 'stdout', text: `printed ${evil}\n` },
          { output_type: 'display_data', metadata: {}, data: {
            'application/vnd.vegalite.v5+json': { $schema: 'https://vega.github.io/schema/vega-lite/v5.json', data: { values: [{ depot: evil, n: 1 }] }, mark: 'bar', encoding: { x: { field: 'depot', type: 'nominal' }, y: { field: 'n', type: 'quantitative' } } },
            'image/svg+xml': '<svg xmlns="http://www.w3.org/2000/svg"></svg>', 'text/plain': 'chart',
          } },
          { output_type: 'display_data', metadata: {}, data: { 'text/html': `<table><tr><td onclick="steal()">1</td></tr></table>${evil}`, 'text/plain': 'table' } },
          { output_type: 'error', ename: 'Error', evalue: evil, traceback: [] },
        ],
      },
    ],
  };
}

describe('renderReport(input)', () => {
  const record = runRecord('R2', {
    extracts: [boundExtract('parcels', { depot: ['a', evil] })], affectsPeople: ['pricing'],
    decisions: [{ ...decision(`Pick ${evil}`, [['c', false]]), affects: ['pricing'] }],
  });
  const base = runRecord('R1', { extracts: [boundExtract('parcels', { depot: ['a', 'b'] })] });
  const html = renderReport({ notebook: notebook(), record, comparison: compareRuns(base, record), title: `T ${evil}` });

  it('is self-contained: vega, vega-lite and vega-embed inline, nothing fetched', () => {
    expect(html).toMatch(/^<!DOCTYPE html>/);
    expect(html).not.toMatch(/<script[^>]+src=/i);
    expect(html).not.toMatch(/<link[^>]+href=/i);
    expect(html).not.toContain('sourceMappingURL');
    expect(html).toContain('vegaEmbed');
    expect(html.match(/<script>/g)?.length).toBe(4); // three libraries + the embedding code
  });

  it('never lets a value from data or the notebook become markup', () => {
    // the only <script> elements are the four the report itself writes plus the JSON data element
    expect(html.split('<script').length - 1).toBe(5);
    expect(html).not.toContain('alert("x")</script>');
    expect(html).toContain('&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt;');
    expect(html).not.toContain('onclick');
    expect(html).toContain('\\u003cscript\\u003e'); // inside the chart JSON
  });

  it('collapses code cells, shows the charts, the decision and the comparison', () => {
    expect(html).toContain('<details><summary><span class="count">[1]</span>');
    expect(html).toContain('<div class="chart" id="chart-1"></div>');
    expect(html).toContain('What changed since the previous run');
    expect(html).toContain('column depot has new categories');
    expect(html).toContain('class="coppice-decision"');
  });

  it('states the cautions once when the use affects people, and not otherwise', () => {
    expect(html.split('Before using this model on people').length - 1).toBe(1);
    expect(html).toContain('protected attributes');
    const plain = renderReport({ notebook: notebook(), record: runRecord('R3'), comparison: null });
    expect(plain).not.toContain('Before using this model on people');
    expect(plain).not.toContain('What changed since the previous run');
  });
});

describe('stripActiveHtml(html)', () => {
  it('removes scripts, embeds, handlers and script URLs and keeps the rest', () => {
    expect(stripActiveHtml('<b onclick="x()">hi</b><script>x()</script>')).toBe('<b>hi</b>');
    expect(stripActiveHtml('<a href="javascript:x()">a</a>')).toBe('<a href="#">a</a>');
    expect(stripActiveHtml('<iframe src="x"></iframe><td>1</td>')).toBe('<td>1</td>');
    expect(stripActiveHtml('<img src="data:image/png;base64,AAA">')).toBe('<img src="data:image/png;base64,AAA">');
  });
});
