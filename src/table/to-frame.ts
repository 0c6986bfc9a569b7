/**
 * Any accepted input (arquero table, row objects, Frame) into a Frame of typed columns.
 */
import type { Column, Frame } from './frame.js';
import { encodeColumn } from './encode-column.js';
import { chosenColumns, forcedKinds, type ToFrameOptions } from './frame-options.js';
import { makeFrame } from './make-frame.js';
import { subsetColumn } from './subset-column.js';
import { isFrame, rawTable, type RawTable, type TableInput } from './raw-table.js';
import { chooseKind, countValues } from './value-counts.js';

/**
 * Frame columns for `names` of `raw`, restricted to `rows` (all when null): kinds, dictionaries and errors
 * concern the kept rows only (errors name the row's index in the input). Columns of a Frame input that
 * are not forced to another kind are reused as they are (keeping dictionaries and date origins).
 *
 * @example const raw = rawTable(rows); frameColumns(rows, raw, raw.names, {}, [0, 2]) // columns of rows 0 and 2
 */
export function frameColumns(
  input: TableInput, raw: RawTable, names: readonly string[], options: ToFrameOptions, rows: ArrayLike<number> | null,
): Column[] {
  const forced = forcedKinds(raw.names, options);
  const existing = isFrame(input) ? new Map(input.columns.map((c) => [c.name, c] as const)) : null;
  const out: Column[] = [];
  for (const name of names) {
    const kept = existing?.get(name);
    if (kept && !forced.has(name)) {
      out.push(rows ? subsetColumn(kept, rows) : kept);
      continue;
    }
    const values = raw.values(name);
    const counted = rows ? Array.from(rows, (r) => values[r]) : values;
    out.push(...encodeColumn(name, values, chooseKind(countValues(counted), forced.get(name)).kind, rows));
  }
  return out;
}

/**
 * Build a Frame from an arquero table, an array of row objects, or a Frame.
 *
 * Typing, per column (judged on all values): numbers → numeric (null, undefined, '' and NaN are missing as
 * NaN; ±Infinity is an error naming column and 0-based row); texts → categorical with a dictionary sorted
 * by string value (missing → -1); booleans → kind 'boolean' (0/1); Dates, or texts that all read as ISO
 * dates → numeric part columns `<col>.year`, `.month`, `.day`, `.weekday` (1 = Monday … 7 = Sunday),
 * `.dayOfYear`, `.epochDays` (+ `.hour` when some time of day is not midnight), read in UTC. A column
 * mixing numbers and texts becomes categorical (`glance` notes it). An all-missing column is numeric NaN.
 *
 * Options:
 * - `columns`: columns to keep, in order. __Default:__ all.
 * - `categorical`, `numeric`, `dates`: force those columns' kind. __Default:__ `[]` each.
 *
 * @example
 * const frame = toFrame([{ region: 'north', spend: 12.5 }, { region: 'south', spend: null }]);
 * frame.columns[0] // { name: 'region', kind: 'categorical', codes: Int32Array [0, 1], categories: ['north', 'south'] }
 */
export function toFrame(input: TableInput, options: ToFrameOptions = {}): Frame {
  const raw = rawTable(input);
  const names = chosenColumns(raw.names, options);
  return makeFrame(raw.nRows, frameColumns(input, raw, names, options, null));
}
