/**
 * Delimited text (CSV, TSV) into an arquero table, with strict field counts and whole-column typing.
 */
import type { ColumnTable } from 'arquero';
import { parseDelimited } from './parse-delimited.js';
import { tableFromTexts, type CellOptions } from './columns-table.js';

/**
 * Parse CSV or TSV text into a table. Every record must have the header's field count (an error names
 * the line and both counts); columns are typed on all their cells: booleans, numbers, ISO dates (as
 * Dates, read as UTC when no offset is given) or text. `path` is only used in error messages.
 *
 * Options: `missingText` (__Default:__ `['']`), `keepText` (__Default:__ `[]`).
 *
 * @example readDelimitedText('a,b\n1,x\n', ',', 'inline.csv').array('a') // [1]
 */
export function readDelimitedText(text: string, delimiter: string, path: string, options: CellOptions = {}): ColumnTable {
  const { header, columns } = parseDelimited(text, delimiter, path);
  return tableFromTexts(header, columns, options);
}
