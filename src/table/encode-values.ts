/**
 * Plain values into typed arrays: numbers (NaN = missing), category codes (-1 = missing) and instants.
 * Each encoder reads rows `rows` of `values` (all when null) and refuses a value it cannot represent with
 * an error naming the column, the row's index in `values`, and the value.
 */
import { errors } from '../errors.js';
import { parseIsoDate } from './iso-date.js';
import { isNumberText } from './text-values.js';
import { isMissingValue } from './value-counts.js';

/**
 * Numbers from numbers, bigints, booleans (0/1) and number texts; missing → NaN. ±Infinity, other texts,
 * Dates and objects are refused (rows are 0-based).
 *
 * @example encodeNumbers('x', [1, null, '2.5', true]) // Float64Array [1, NaN, 2.5, 1]
 */
export function encodeNumbers(name: string, values: ArrayLike<unknown>, rows: ArrayLike<number> | null = null): Float64Array {
  const n = rows ? rows.length : values.length;
  const out = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    const i = rows ? rows[j] : j;
    const v = values[i];
    let x: number;
    if (isMissingValue(v)) x = NaN;
    else if (typeof v === 'number') x = v;
    else if (typeof v === 'bigint') x = Number(v);
    else if (typeof v === 'boolean') x = v ? 1 : 0;
    else if (typeof v === 'string' && isNumberText(v)) x = Number(v.trim());
    else throw errors.badValue(name, i, v, 'a number or a missing value');
    if (x === Infinity || x === -Infinity) throw errors.badValue(name, i, v, 'a finite number (NaN or null for missing)');
    out[j] = x;
  }
  return out;
}


/**
 * The text a value is known by as a category (dates at midnight UTC as `YYYY-MM-DD`); objects are refused.
 *
 * @example categoryText('opened', 0, new Date(0)) // '1970-01-01'
 */
export function categoryText(name: string, row: number, v: unknown): string {
  if (typeof v === 'string') return v;
  if (typeof v === 'number' || typeof v === 'bigint' || typeof v === 'boolean') return String(v);
  if (v instanceof Date) {
    const iso = v.toISOString();
    return iso.endsWith('T00:00:00.000Z') ? iso.slice(0, 10) : iso;
  }
  throw errors.badValue(name, row, v, 'a number, text, boolean or date');
}

/**
 * Category codes and a dictionary sorted by string value (code-unit order); missing → -1.
 *
 * @example encodeCategories('c', ['b', 'a', null, 'b']) // { codes: [1, 0, -1, 1], categories: ['a', 'b'] }
 */
export function encodeCategories(
  name: string, values: ArrayLike<unknown>, rows: ArrayLike<number> | null = null,
): { codes: Int32Array; categories: string[] } {
  const n = rows ? rows.length : values.length;
  const texts = new Array<string | null>(n);
  const distinct = new Set<string>();
  for (let j = 0; j < n; j++) {
    const i = rows ? rows[j] : j;
    const v = values[i];
    if (isMissingValue(v)) { texts[j] = null; continue; }
    const t = categoryText(name, i, v);
    texts[j] = t;
    distinct.add(t);
  }
  const categories = [...distinct].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
  const index = new Map(categories.map((c, k) => [c, k] as const));
  const codes = new Int32Array(n);
  for (let i = 0; i < n; i++) {
    const t = texts[i];
    codes[i] = t === null ? -1 : index.get(t)!;
  }
  return { codes, categories };
}

/**
 * Instants (ms since 1970-01-01T00:00Z) from Dates and ISO date texts; missing → NaN. Other values are refused.
 *
 * @example encodeInstants('d', ['1970-01-02', null]) // Float64Array [86400000, NaN]
 */
export function encodeInstants(name: string, values: ArrayLike<unknown>, rows: ArrayLike<number> | null = null): Float64Array {
  const n = rows ? rows.length : values.length;
  const out = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    const i = rows ? rows[j] : j;
    const v = values[i];
    if (isMissingValue(v)) { out[j] = NaN; continue; }
    const t = v instanceof Date ? v.getTime() : typeof v === 'string' ? parseIsoDate(v) : NaN;
    if (Number.isNaN(t)) throw errors.badValue(name, i, v, 'a date or an ISO date text (YYYY-MM-DD)');
    out[j] = t;
  }
  return out;
}

