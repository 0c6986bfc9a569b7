/**
 * The HTML report of a run: one self-contained file (vega, vega-lite and vega-embed inlined; no network) with the
 * notebook's narrative, its outputs and interactive charts, the decision cards, the comparison with the previous
 * run, and the run's details. Code cells are collapsed. Every value taken from data or the notebook is escaped.
 */
import type { RunComparison } from './compare-runs.js';
import { decisionHtml } from './decision-card.js';
import type { RunRecord } from './record-file.js';
import { chartScripts } from './report-assets.js';
import { cautionsHtml, usesAffectingPeople } from './report-cautions.js';
import { renderComparison, type ComparisonChart } from './report-comparison.js';
import { escapeHtml, scriptJson } from './report-escape.js';
import { renderMarkdown } from './report-markdown.js';
import { collectCharts, renderOutputs } from './report-outputs.js';
import { REPORT_STYLE } from './report-style.js';
import type { NotebookDocument } from './runner-notebook.js';
import { cellSource } from './runner-notebook.js';

export interface ReportInput {
  readonly notebook: NotebookDocument;
  readonly record: RunRecord;
  readonly comparison: RunComparison | null;
  /** Shown as the page title. __Default:__ the notebook's file name. */
  readonly title?: string;
  /** Charts for the comparison section. __Default:__ `[]`. */
  readonly comparisonCharts?: readonly ComparisonChart[];
}

const EMBED = `(function () {
  var el = document.getElementById('coppice-charts');
  var charts = el ? JSON.parse(el.textContent || '[]') : [];
  charts.forEach(function (c) {
    var target = document.getElementById(c.id);
    if (!target) return;
    vegaEmbed(target, c.spec, { actions: false, renderer: 'svg' }).catch(function (e) {
      target.textContent = 'This chart could not be drawn: ' + (e && e.message ? e.message : e);
    });
  });
})();`;

function runDetails(r: RunRecord): string {
  const rows = (cells: string[][]) => cells.map((c) => `<tr>${c.map((x) => `<td>${x}</td>`).join('')}</tr>`).join('');
  const parts = ['<h2 id="run-details">Run details</h2>'];
  parts.push(`<table class="data"><tbody>${rows([
    ['run', `<code>${escapeHtml(r.id)}</code>`], ['status', escapeHtml(r.status)],
    ['started', escapeHtml(r.started)], ['duration', `${escapeHtml((r.ms / 1000).toFixed(1))} s`],
    ['notebook', `${escapeHtml(r.notebook.path)} <span class="muted">(${escapeHtml(r.notebook.fingerprint)})</span>`],
    ['versions', escapeHtml(Object.entries(r.versions).map(([k, v]) => `${k} ${v}`).join(', '))],
  ])}</tbody></table>`);
  if (r.extracts.length) {
    parts.push('<h3>Extracts</h3><table class="data"><thead><tr><th>name</th><th>source</th><th>rows</th><th>columns</th><th>fingerprint</th></tr></thead><tbody>');
    parts.push(rows(r.extracts.map((e) => [escapeHtml(e.name), `${escapeHtml(e.source)}${e.overridden ? ' <span class="muted">(bound for this run)</span>' : ''}`,
      String(e.rows), String(e.columns.length), `<code>${escapeHtml(e.fingerprint)}</code>`])));
    parts.push('</tbody></table>');
  }
  if (r.models.length) {
    parts.push('<h3>Models</h3><table class="data"><thead><tr><th>name</th><th>kind</th><th>task</th><th>seed</th><th>data fingerprint</th></tr></thead><tbody>');
    parts.push(rows(r.models.map((m) => [escapeHtml(m.name), escapeHtml(m.kind), escapeHtml(m.task), escapeHtml(m.seed), `<code>${escapeHtml(m.dataFingerprint ?? '')}</code>`])));
    parts.push('</tbody></table>');
  }
  parts.push('<h3>Cells</h3><table class="data"><thead><tr><th>cell</th><th>time</th><th></th></tr></thead><tbody>');
  parts.push(rows(r.cells.map((c) => [`[${c.count}]`, `${escapeHtml(c.ms)} ms`, c.ok ? '' : '<span class="badge bad">failed</span>'])));
  parts.push('</tbody></table>');
  return parts.join('\n');
}

/**
 * Build the report HTML.
 * @example
 * writeAtomic('report.html', renderReport({ notebook: executed, record, comparison }));
 */
export function renderReport(input: ReportInput): string {
  const { notebook, record, comparison } = input;
  const title = input.title ?? record.notebook.path.split('/').pop() ?? 'notebook';
  const charts = collectCharts();
  const body: string[] = [];
  body.push(`<header><h1>${escapeHtml(title)}</h1><p class="muted">Run <code>${escapeHtml(record.id)}</code> · `
    + `${record.status === 'ok' ? '<span class="badge ok">completed</span>' : '<span class="badge bad">failed</span>'} · `
    + `finished ${escapeHtml(record.finished)} · <a href="#run-details">run details</a></p></header>`);
  if (record.failure) {
    body.push(`<p class="error">The run stopped at cell [${record.failure.count}] (<code>${escapeHtml(record.failure.firstLine)}</code>): `
      + `${escapeHtml(`${record.failure.name}: ${record.failure.message}`)}</p>`);
  }
  const uses = usesAffectingPeople(record);
  if (uses.length) body.push(cautionsHtml(uses));
  if (comparison) body.push(`<section class="comparison"><h2>What changed since the previous run</h2>${renderComparison(comparison, charts, input.comparisonCharts ?? [])}</section>`);
  if (record.decisions.length) body.push(`<section><h2>Decisions</h2>${record.decisions.map(decisionHtml).join('\n')}</section>`);
  body.push('<section class="notebook"><h2>Notebook</h2>');
  for (const cell of notebook.cells) {
    if (cell.cell_type === 'markdown') body.push(`<div class="markdown">${renderMarkdown(cellSource(cell))}</div>`);
    else if (cell.cell_type === 'code') {
      const n = cell.execution_count ?? ' ';
      const code = cellSource(cell);
      const first = code.split('\n').find((l) => l.trim() !== '') ?? '';
      body.push(`<div class="cell"><details><summary><span class="count">[${escapeHtml(n)}]</span> <code>${escapeHtml(first.slice(0, 90))}</code></summary>`
        + `<pre class="code"><code>${escapeHtml(code)}</code></pre></details>`
        + `<div class="outputs">${renderOutputs(cell.outputs ?? [], charts)}</div></div>`);
    }
  }
  body.push('</section>');
  body.push(runDetails(record));
  return `<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="generator" content="coppice">
<title>${escapeHtml(title)} — coppice report</title>
<style>${REPORT_STYLE}</style>
${chartScripts()}
</head>
<body>
<main>
${body.join('\n')}
</main>
<script type="application/json" id="coppice-charts">${scriptJson(charts.specs)}</script>
<script>${EMBED}</script>
</body>
</html>
`;
}
