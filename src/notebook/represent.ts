/**
 * Pick the rich representation of a value: a chart (vega-lite spec), a fitted model, a table (arquero
 * table, row objects, Frame) — or none, when plain text is right.
 */
import type { DisplayMessage, MimeBundle } from './display-types.js';
import { chartBundle, isChartSpec } from './chart-bundle.js';
import { isModelValue, modelBundle } from './model-bundle.js';
import { tableBundle } from './table-bundle.js';
import { isTableLike } from './table-rows.js';

export type ValueKind = 'chart' | 'model' | 'table' | 'text';

/** Which representation `value` gets. */
export function kindOfValue(value: unknown): ValueKind {
  if (isChartSpec(value)) return 'chart';
  if (isModelValue(value)) return 'model';
  if (isTableLike(value)) return 'table';
  return 'text';
}

export interface RepresentOptions {
  /** A caption (tables) or name (models). __Default:__ none. */
  readonly title?: string;
  /** Table rows shown. __Default:__ 20. */
  readonly rows?: number;
}

/**
 * The mime bundle for `value`, or null for plain values (the caller prints them as text).
 * @example
 * await bundleFor([{ a: 1 }]); // { 'text/html': '<div class="coppice-table">…', 'text/plain': '…' }
 */
export function bundleFor(value: unknown, options: RepresentOptions = {}): MimeBundle | Promise<MimeBundle> | null {
  switch (kindOfValue(value)) {
    case 'chart': return chartBundle(value as Parameters<typeof chartBundle>[0]);
    case 'model': return modelBundle(value as Parameters<typeof modelBundle>[0], options.title);
    case 'table': return tableBundle(value, options);
    default: return null;
  }
}

/** A display message for a cell's last value, or null when plain text is right. */
export function representValue(value: unknown): DisplayMessage | Promise<DisplayMessage> | null {
  const b = bundleFor(value);
  if (b === null) return null;
  const wrap = (data: MimeBundle): DisplayMessage => ({ data, metadata: {}, transient: {} });
  return b instanceof Promise ? b.then(wrap) : wrap(b);
}
