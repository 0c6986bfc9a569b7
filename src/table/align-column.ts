/**
 * One model feature re-read from a new table: the column it gives and what went wrong, never an error.
 */
import type { Column, ColumnSchema } from './frame.js';
import { datePart } from './date-parts.js';
import { categoryText } from './encode-values.js';
import { parseIsoDate } from './iso-date.js';
import { countValues, describeValues, isMissingValue } from './value-counts.js';

/** What happened to one feature column. */
export type AlignIssue =
  | { readonly type: 'ok' }
  | { readonly type: 'missing'; readonly rows: number }
  | { readonly type: 'typeChanged'; readonly found: string; readonly rows: number }
  | { readonly type: 'unseen'; readonly rows: number; readonly distinct: number; readonly examples: readonly string[] }
  | { readonly type: 'invalid'; readonly rows: number; readonly examples: readonly string[] };

const MAX_EXAMPLES = 5;

function allMissing(schema: ColumnSchema, n: number): Column {
  if (schema.kind === 'categorical') {
    return { name: schema.name, kind: 'categorical', codes: new Int32Array(n).fill(-1), categories: schema.categories ?? [] };
  }
  return { name: schema.name, kind: schema.kind, values: new Float64Array(n).fill(NaN), ...(schema.origin ? { origin: schema.origin } : {}) };
}

/** Column treated as missing because its values are of another type than the model's. */
function typeChanged(schema: ColumnSchema, values: ArrayLike<unknown>): [Column, AlignIssue] {
  const c = countValues(values);
  return [allMissing(schema, values.length), { type: 'typeChanged', found: describeValues(c), rows: c.n - c.missing }];
}

function alignNumbers(schema: ColumnSchema, values: ArrayLike<unknown>): [Column, AlignIssue] {
  const c = countValues(values);
  if (c.strings + c.dates + c.other > 0) return typeChanged(schema, values);
  const out = new Float64Array(values.length);
  const bad = new Set<string>();
  let badRows = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    let x = isMissingValue(v) ? NaN : Number(v);
    const fine = Number.isNaN(x) || (Number.isFinite(x) && (schema.kind !== 'boolean' || x === 0 || x === 1));
    if (!fine) { badRows++; if (bad.size < MAX_EXAMPLES) bad.add(String(v)); x = NaN; }
    out[i] = x;
  }
  const kind = schema.kind === 'boolean' ? 'boolean' : 'numeric';
  const column: Column = { name: schema.name, kind, values: out, ...(schema.origin ? { origin: schema.origin } : {}) };
  return [column, badRows ? { type: 'invalid', rows: badRows, examples: [...bad] } : { type: 'ok' }];
}

function alignDatePart(schema: ColumnSchema, values: ArrayLike<unknown>): [Column, AlignIssue] {
  const c = countValues(values);
  if (c.dates + c.isoStrings !== c.n - c.missing) return typeChanged(schema, values);
  const part = schema.origin!.part;
  const out = new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    const t = isMissingValue(v) ? NaN : v instanceof Date ? v.getTime() : parseIsoDate(String(v));
    out[i] = datePart(t, part);
  }
  return [{ name: schema.name, kind: 'numeric', values: out, origin: schema.origin! }, { type: 'ok' }];
}

function alignCategories(schema: ColumnSchema, values: ArrayLike<unknown>): [Column, AlignIssue] {
  const categories = schema.categories ?? [];
  const index = new Map(categories.map((k, i) => [k, i] as const));
  const codes = new Int32Array(values.length);
  const unseen = new Set<string>();
  let unseenRows = 0, badRows = 0;
  const bad = new Set<string>();
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (isMissingValue(v)) { codes[i] = -1; continue; }
    let text: string;
    try { text = categoryText(schema.name, i, v); } catch { badRows++; if (bad.size < MAX_EXAMPLES) bad.add(String(v)); codes[i] = -1; continue; }
    const k = index.get(text);
    if (k === undefined) { unseenRows++; unseen.add(text); codes[i] = -1; } else codes[i] = k;
  }
  const column: Column = { name: schema.name, kind: 'categorical', codes, categories };
  if (badRows) return [column, { type: 'invalid', rows: badRows, examples: [...bad] }];
  if (unseenRows) return [column, { type: 'unseen', rows: unseenRows, distinct: unseen.size, examples: [...unseen].slice(0, MAX_EXAMPLES) }];
  return [column, { type: 'ok' }];
}

/**
 * Re-read feature `schema` from `values` (null when the table lacks the column): categories are coded with
 * the model's dictionary (unseen → -1), a date part is computed from its date column, and a column that is
 * absent, of another type, or holds values the kind cannot take becomes missing in the affected rows.
 * `fromSource` says `values` are the date column a part comes from; `nRows` sizes an absent column.
 *
 * @example alignColumn({ name: 'tier', kind: 'categorical', categories: ['a', 'b'] }, ['b', 'z'], false, 2)
 * // [{ codes: Int32Array [1, -1], ... }, { type: 'unseen', rows: 1, distinct: 1, examples: ['z'] }]
 */
export function alignColumn(schema: ColumnSchema, values: ArrayLike<unknown> | null, fromSource: boolean, nRows: number): [Column, AlignIssue] {
  if (values === null) return [allMissing(schema, nRows), { type: 'missing', rows: nRows }];
  if (fromSource) return alignDatePart(schema, values);
  if (schema.kind === 'categorical') return alignCategories(schema, values);
  return alignNumbers(schema, values);
}
