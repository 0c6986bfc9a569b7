/**
 * A table as a mime bundle: an HTML table (every value escaped; long tables cut with a note saying how
 * many rows are shown) and an aligned plain-text table.
 */
import type { MimeBundle } from './display-types.js';
import { formatCell } from './format-cell.js';
import { escapeHtml } from './html-escape.js';
import { sliceTable } from './table-rows.js';

export interface TableDisplayOptions {
  /** Rows shown before the table is cut. __Default:__ 20. */
  readonly rows?: number;
  /** A caption above the table. __Default:__ none. */
  readonly title?: string;
}

/**
 * The bundle for an arquero table, array of row objects, or Frame.
 * @example
 * tableBundle([{ model: 'tree', auc: 0.81 }], { title: 'holdout' })['text/html'];
 */
export function tableBundle(table: unknown, options: TableDisplayOptions = {}): MimeBundle {
  const limit = options.rows ?? 20;
  const slice = sliceTable(table, limit);
  const cells = slice.rows.map((r) => r.map(formatCell));
  const numeric = slice.columns.map((_, j) => slice.rows.length > 0 && slice.rows.every((r) => r[j] == null || typeof r[j] === 'number'));
  const note = slice.total > slice.rows.length ? `${slice.rows.length} of ${slice.total} rows shown` : `${slice.total} row${slice.total === 1 ? '' : 's'}`;
  const align = (j: number) => (numeric[j] ? ' style="text-align:right"' : '');
  const html = [
    '<div class="coppice-table">',
    options.title ? `<div><strong>${escapeHtml(options.title)}</strong></div>` : '',
    '<table>',
    `<thead><tr>${slice.columns.map((c, j) => `<th${align(j)}>${escapeHtml(c)}</th>`).join('')}</tr></thead>`,
    `<tbody>${cells.map((r) => `<tr>${r.map((v, j) => `<td${align(j)}>${escapeHtml(v)}</td>`).join('')}</tr>`).join('')}</tbody>`,
    '</table>',
    `<div><small>${escapeHtml(note)} × ${slice.columns.length} column${slice.columns.length === 1 ? '' : 's'}</small></div>`,
    '</div>',
  ].join('');
  const widths = slice.columns.map((c, j) => Math.max(c.length, ...cells.map((r) => r[j].length)));
  const line = (r: readonly string[]) => r.map((v, j) => (numeric[j] ? v.padStart(widths[j]) : v.padEnd(widths[j]))).join('  ').trimEnd();
  const text = [
    ...(options.title ? [options.title] : []),
    line(slice.columns),
    ...cells.map(line),
    `(${note})`,
  ].join('\n');
  return { 'text/html': html, 'text/plain': text };
}
