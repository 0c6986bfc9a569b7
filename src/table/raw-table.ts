/**
 * One read-only view over the inputs the table layer accepts: an arquero table, an array of row objects,
 * or a Frame (decoded back to plain values). Columns are fetched lazily and cached.
 */
import type { Table } from 'arquero';
import { errors } from '../errors.js';
import type { Column, Frame } from './frame.js';

/** An arquero table, an array of row objects, or a Frame. */
export type TableInput = Table | readonly object[] | Frame;

/** Column names, row count and each column's values (row order as the input presents it). */
export interface RawTable {
  readonly nRows: number;
  readonly names: readonly string[];
  /** Values of column `name` (must be one of `names`). */
  values(name: string): ArrayLike<unknown>;
}

/**
 * True when `x` is a Frame (has `nRows`, `columns` and `schema`).
 *
 * @example isFrame(toFrame([{ a: 1 }])) // true
 */
export function isFrame(x: unknown): x is Frame {
  const f = x as Frame;
  return typeof f === 'object' && f !== null && typeof f.nRows === 'number' && Array.isArray(f.columns) && typeof f.schema === 'object';
}

function isArqueroTable(x: unknown): x is Table {
  const t = x as Table;
  return typeof t === 'object' && t !== null && typeof t.columnNames === 'function' && typeof t.numRows === 'function' && typeof t.array === 'function';
}

function decode(c: Column): unknown[] {
  if (c.kind === 'categorical') return Array.from(c.codes, (k) => (k < 0 ? null : c.categories[k]));
  if (c.kind === 'boolean') return Array.from(c.values, (v) => (Number.isNaN(v) ? null : v !== 0));
  return Array.from(c.values);
}

function cached(nRows: number, names: readonly string[], load: (name: string) => ArrayLike<unknown>): RawTable {
  const cache = new Map<string, ArrayLike<unknown>>();
  return {
    nRows,
    names,
    values(name) {
      let v = cache.get(name);
      if (!v) { v = load(name); cache.set(name, v); }
      return v;
    },
  };
}

/**
 * A RawTable over any accepted input. Row objects give columns in first-seen key order; a key absent from
 * a row is missing (undefined) there.
 *
 * @example rawTable([{ a: 1 }, { a: 2, b: 'x' }]).names // ['a', 'b']
 */
export function rawTable(input: TableInput): RawTable {
  if (isFrame(input)) {
    const byName = new Map(input.columns.map((c) => [c.name, c] as const));
    return cached(input.nRows, input.columns.map((c) => c.name), (name) => decode(byName.get(name)!));
  }
  if (isArqueroTable(input)) {
    return cached(input.numRows(), input.columnNames(), (name) => input.array(name) as ArrayLike<unknown>);
  }
  if (!Array.isArray(input)) throw errors.badOption('input', input, 'an arquero table, an array of row objects or a Frame');
  const rows = input as readonly unknown[];
  const names: string[] = [];
  const seen = new Set<string>();
  rows.forEach((row, r) => {
    if (typeof row !== 'object' || row === null || Array.isArray(row)) throw errors.badRow(r, row);
    for (const k of Object.keys(row)) if (!seen.has(k)) { seen.add(k); names.push(k); }
  });
  const recs = rows as readonly Record<string, unknown>[];
  return cached(recs.length, names, (name) => recs.map((row) => row[name]));
}
