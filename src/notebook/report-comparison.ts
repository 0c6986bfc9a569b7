/**
 * The report section comparing this run with the previous one: schema changes, drift per column, metric deltas,
 * prediction shift and decision checks, as escaped HTML tables plus the charts given.
 */
import { describeSchemaChange } from './compare-schema.js';
import type { RunComparison } from './compare-runs.js';
import { exitCodeReason, meanText } from './compare-text.js';
import { escapeHtml } from './report-escape.js';
import type { ChartCollector } from './report-outputs.js';

function num(x: number | null): string {
  if (x === null) return '–';
  if (!Number.isFinite(x)) return String(x);
  const a = Math.abs(x);
  return a !== 0 && (a < 1e-3 || a >= 1e6) ? x.toExponential(2) : String(Number(x.toPrecision(4)));
}

function badge(kind: string, text: string): string {
  return `<span class="badge ${escapeHtml(kind)}">${escapeHtml(text)}</span>`;
}

function table(head: readonly string[], rows: readonly string[][]): string {
  return `<table class="data"><thead><tr>${head.map((h) => `<th>${escapeHtml(h)}</th>`).join('')}</tr></thead>`
    + `<tbody>${rows.map((r) => `<tr>${r.map((c) => `<td>${c}</td>`).join('')}</tr>`).join('')}</tbody></table>`;
}

/** A chart to place in the comparison section. */
export interface ComparisonChart {
  readonly title: string;
  readonly spec: unknown;
}

/**
 * HTML for the comparison section.
 * @example
 * renderComparison(comparison, charts, [{ title: 'Drift', spec }]);
 */
export function renderComparison(c: RunComparison, charts: ChartCollector, extraCharts: readonly ComparisonChart[] = []): string {
  const out: string[] = [];
  out.push(`<p>Compared with run <code>${escapeHtml(c.baseline.id)}</code>. `
    + `${badge(c.exitCode === 0 ? 'ok' : 'bad', `exit code ${c.exitCode}`)} ${escapeHtml(exitCodeReason(c.exitCode))}.</p>`);
  if (c.checks.length) {
    out.push(`<h3>Decision checks — ${c.failingChecks} of ${c.checks.length} fail</h3>`);
    out.push(table(['now', 'check', 'seen', 'before', 'decision'], c.checks.map((k) => [
      k.now ? badge('ok', 'holds') : badge('bad', 'fails'), `<code>${escapeHtml(k.label)}</code>`, escapeHtml(k.detail),
      k.before === null ? 'new' : k.before ? 'held' : 'failed', escapeHtml(k.decision),
    ])));
  }
  for (const e of c.extracts) {
    out.push(`<h3>Extract ${escapeHtml(e.name)}: ${e.baselineRows} → ${e.currentRows} rows${e.sameData ? ' (same data)' : ''}</h3>`);
    if (e.baselineSource !== e.currentSource) out.push(`<p class="muted">Source ${escapeHtml(e.baselineSource)} → ${escapeHtml(e.currentSource)}</p>`);
    out.push(e.schema.length
      ? `<p><strong>Schema changes</strong></p><ul>${e.schema.map((s) => `<li>${escapeHtml(describeSchemaChange(s))}</li>`).join('')}</ul>`
      : '<p>Schema unchanged.</p>');
    if (e.drift.length) {
      out.push('<p><strong>Drift by population stability index</strong> (bands: below 0.1 stable, 0.1–0.25 moderate, above 0.25 major — common practice)</p>');
      out.push(table(['column', 'kind', 'PSI', 'band', 'mean before', 'mean now'], e.drift.map((d) => [
        escapeHtml(d.column), escapeHtml(d.kind), num(d.psi),
        badge(d.band === 'stable' ? 'ok' : d.band === 'moderate' ? 'warn' : 'bad', d.flagged || d.band === 'stable' ? d.band : `${d.band} (date)`),
        meanText(d.baselineMean, d.kind), meanText(d.currentMean, d.kind),
      ])));
    }
  }
  if (c.metrics.length) {
    out.push('<h3>Metrics</h3>');
    out.push(table(['metric', 'before', 'now', 'change', ''], c.metrics.map((m) => [
      escapeHtml(m.name), num(m.baseline), num(m.current), m.delta === null ? '' : num(m.delta),
      badge(m.verdict === 'worse' ? 'bad' : m.verdict === 'better' || m.verdict === 'same' ? 'ok' : 'warn', m.verdict),
    ])));
  }
  if (c.predictions.length) {
    out.push('<h3>Predictions on the new data</h3>');
    out.push(table(['predictions', 'mean before', 'mean now', 'PSI', 'band'], c.predictions.map((p) => [
      escapeHtml(p.name), num(p.baselineMean), num(p.currentMean), num(p.psi), p.band ? badge(p.band === 'stable' ? 'ok' : p.band === 'moderate' ? 'warn' : 'bad', p.band) : '',
    ])));
  }
  for (const ch of extraCharts) out.push(`<h3>${escapeHtml(ch.title)}</h3><div class="chart" id="${charts.add(ch.spec)}"></div>`);
  if (c.failure) out.push(`<p class="error">The run failed at cell ${c.failure.count}: ${escapeHtml(`${c.failure.name}: ${c.failure.message}`)}</p>`);
  return out.join('\n');
}
