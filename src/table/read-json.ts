/**
 * JSON text holding an array of records into an arquero table.
 */
import type { ColumnTable } from 'arquero';
import { errors, show } from '../errors.js';
import { tableFromValues, type CellOptions } from './columns-table.js';

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/**
 * Parse JSON text that holds an array of records (objects) into a table. Columns are the union of the
 * records' keys in first-seen order; a key absent from a record is missing there. Values must be numbers,
 * strings, booleans or null; nested objects and arrays are refused (the error names column and record).
 * `path` is only used in error messages.
 *
 * Options: `missingText` (__Default:__ `['']`), `keepText` (__Default:__ `[]`).
 *
 * @example readJsonText('[{"a":1},{"a":null,"b":"x"}]', 'inline.json').columnNames() // ['a', 'b']
 */
export function readJsonText(text: string, path: string, options: CellOptions = {}): ColumnTable {
  let data: unknown;
  try {
    data = JSON.parse(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
  } catch (e) {
    throw errors.badFile(path, `invalid JSON (${(e as Error).message})`);
  }
  if (!Array.isArray(data)) throw errors.badFile(path, 'expected a JSON array of records');
  const index = new Map<string, number>();
  const names: string[] = [];
  const values: unknown[][] = [];
  const n = data.length;
  for (let r = 0; r < n; r++) {
    const rec: unknown = data[r];
    if (!isRecord(rec)) throw errors.badFile(path, `record ${r} is ${show(rec)}, not an object`);
    for (const key of Object.keys(rec)) {
      const v = rec[key];
      if (v !== null && typeof v === 'object') {
        throw errors.badFile(path, `record ${r}, column ${show(key)}: nested value ${show(v)} (expected a number, string, boolean or null)`);
      }
      let k = index.get(key);
      if (k === undefined) {
        k = names.length;
        index.set(key, k);
        names.push(key);
        values.push(new Array<unknown>(n).fill(null));
      }
      values[k][r] = v;
    }
  }
  return tableFromValues(names, values, options);
}
