/**
 * A glance at a table as a bundle: one row per column (kind, missing, distinct, range, mean, most
 * common values, notes), from the table layer's `glance`.
 */
import { glance } from '../table/glance.js';
import type { TableInput } from '../table/raw-table.js';
import type { MimeBundle } from './display-types.js';
import { tableBundle } from './table-bundle.js';
import { sliceTable } from './table-rows.js';

/**
 * The glance bundle for an arquero table, row objects or a Frame.
 * @example
 * glanceBundle(penguins)['text/plain']; // '344 rows × 7 columns\ncolumn  kind  missing ...'
 */
export function glanceBundle(table: unknown, title?: string): MimeBundle {
  const rows = glance(table as TableInput);
  const total = sliceTable(table, 0).total;
  return tableBundle(rows as unknown as Record<string, unknown>[], { rows: rows.length, title: title ?? `${total} rows × ${rows.length} columns` });
}
