/**
 * Notebook outputs as report HTML. Per display output the richest safe form is used: a decision record becomes its
 * card; a vega-lite spec becomes an interactive chart (rendered by vega-embed from a JSON copy, so no data value
 * is ever parsed as markup); an SVG or PNG becomes an image (an SVG in an `<img>` cannot run script); HTML from
 * coppice's own displays is kept with any active content removed; else the plain text, escaped.
 */
import { DECISION_MIME, decisionHtml } from './decision-card.js';
import type { DecisionRecord } from './decision-types.js';
import { escapeHtml } from './report-escape.js';

export const VEGA_LITE_MIME = 'application/vnd.vegalite.v5+json';

/** Collects chart specs; returns the id of the element each renders into. */
export interface ChartCollector {
  add(spec: unknown): string;
  readonly specs: readonly { id: string; spec: unknown }[];
}

/**
 * A chart collector numbering elements `chart-1`, `chart-2`, …
 * @example
 * const charts = collectCharts(); const id = charts.add(spec);
 */
export function collectCharts(): ChartCollector {
  const specs: { id: string; spec: unknown }[] = [];
  return {
    specs,
    add(spec) {
      const id = `chart-${specs.length + 1}`;
      specs.push({ id, spec });
      return id;
    },
  };
}

/**
 * Remove active content from HTML: script elements, embeds (iframe, object, embed), event-handler attributes and
 * `javascript:` URLs. Values inside coppice's HTML displays are escaped where they are built; this is a second
 * guard, not a general sanitizer.
 * @example
 * stripActiveHtml('<b onclick="x()">hi</b><script>x()</script>'); // '<b>hi</b>'
 */
export function stripActiveHtml(html: string): string {
  return html
    .replace(/<(script|iframe|object|embed|frameset|template)\b[^>]*>[\s\S]*?<\/\1\s*>/gi, '')
    .replace(/<\/?(script|iframe|object|embed|frameset|frame|template|base|meta|link)\b[^>]*>/gi, '')
    .replace(/\s+on[a-z]+\s*=\s*("[^"]*"|'[^']*'|[^\s>]+)/gi, '')
    .replace(/(href|src|action|formaction|xlink:href)\s*=\s*(["']?)\s*(javascript|vbscript):[^"'>\s]*\2/gi, '$1=$2#$2');
}

function text(value: unknown): string {
  return Array.isArray(value) ? value.join('') : String(value ?? '');
}

function base64(s: string): string {
  return Buffer.from(s, 'utf8').toString('base64');
}

/** One display bundle as HTML. */
export function renderBundle(data: Record<string, unknown>, charts: ChartCollector): string {
  if (data[DECISION_MIME] && typeof data[DECISION_MIME] === 'object') return decisionHtml(data[DECISION_MIME] as DecisionRecord);
  const vl = data[VEGA_LITE_MIME];
  if (vl && typeof vl === 'object') {
    const id = charts.add(vl);
    const fallback = typeof data['image/svg+xml'] === 'string' ? `<noscript><img alt="chart" src="data:image/svg+xml;base64,${base64(text(data['image/svg+xml']))}"></noscript>` : '';
    return `<div class="chart" id="${id}"></div>${fallback}`;
  }
  if (data['text/html'] !== undefined) return `<div class="html-output">${stripActiveHtml(text(data['text/html']))}</div>`;
  if (data['image/svg+xml'] !== undefined) return `<img class="figure" alt="figure" src="data:image/svg+xml;base64,${base64(text(data['image/svg+xml']))}">`;
  if (typeof data['image/png'] === 'string') return `<img class="figure" alt="figure" src="data:image/png;base64,${escapeHtml(text(data['image/png']).replace(/\s/g, ''))}">`;
  if (data['text/markdown'] !== undefined) return `<pre class="text">${escapeHtml(text(data['text/markdown']))}</pre>`;
  if (data['text/plain'] !== undefined) return `<pre class="text">${escapeHtml(text(data['text/plain']))}</pre>`;
  return '';
}

/**
 * A code cell's nbformat outputs as HTML.
 * @example
 * renderOutputs(cell.outputs, charts);
 */
export function renderOutputs(outputs: readonly Record<string, unknown>[], charts: ChartCollector): string {
  return outputs.map((o) => {
    switch (o.output_type) {
      case 'stream':
        return `<pre class="stream ${o.name === 'stderr' ? 'stderr' : ''}">${escapeHtml(text(o.text))}</pre>`;
      case 'error':
        return `<pre class="error">${escapeHtml(`${text(o.ename)}: ${text(o.evalue)}`)}</pre>`;
      case 'display_data':
      case 'execute_result':
        return renderBundle((o.data ?? {}) as Record<string, unknown>, charts);
      default:
        return '';
    }
  }).join('\n');
}
