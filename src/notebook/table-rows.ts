/**
 * Read any table-like value coppice displays — an arquero table, an array of row objects, or a Frame —
 * as column names plus the first rows, without copying the whole table.
 */
import type { Frame } from '../table/frame.js';

/** A table cut to at most `limit` rows for display. */
export interface TableSlice {
  readonly columns: readonly string[];
  readonly rows: readonly (readonly unknown[])[];
  /** Rows in the whole table. */
  readonly total: number;
}

interface ArqueroLike {
  numRows(): number;
  columnNames(): string[];
  objects(options?: { limit?: number }): Record<string, unknown>[];
}

/** True for an arquero table (duck-typed, so any copy of arquero works). */
export function isArqueroTable(x: unknown): x is ArqueroLike {
  const t = x as Partial<ArqueroLike> | null;
  return t != null && typeof t === 'object' && typeof t.numRows === 'function' && typeof t.columnNames === 'function' && typeof t.objects === 'function';
}

/** True for a coppice Frame. */
export function isFrameValue(x: unknown): x is Frame {
  const f = x as Partial<Frame> | null;
  return f != null && typeof f === 'object' && typeof f.nRows === 'number' && Array.isArray(f.columns) && f.schema != null;
}

/** True for a non-empty array of plain row objects. */
export function isRowArray(x: unknown): x is readonly Record<string, unknown>[] {
  return Array.isArray(x) && x.length > 0 && x.every((r) => r != null && typeof r === 'object' && !Array.isArray(r) && Object.getPrototypeOf(r) === Object.prototype);
}

/** True when `sliceTable` can read `x`. */
export function isTableLike(x: unknown): boolean {
  return isArqueroTable(x) || isFrameValue(x) || isRowArray(x);
}

/**
 * The column names and first `limit` rows of `x`.
 * @example
 * sliceTable([{ a: 1 }, { a: 2, b: 'x' }], 1); // { columns: ['a', 'b'], rows: [[1, undefined]], total: 2 }
 */
export function sliceTable(x: unknown, limit: number): TableSlice {
  if (isArqueroTable(x)) {
    const columns = x.columnNames();
    const objects = x.objects({ limit });
    return { columns, rows: objects.map((o) => columns.map((c) => o[c])), total: x.numRows() };
  }
  if (isFrameValue(x)) {
    const n = Math.min(limit, x.nRows);
    const rows: unknown[][] = [];
    for (let i = 0; i < n; i++) {
      rows.push(x.columns.map((c) => {
        if (c.kind === 'categorical') return c.codes[i] < 0 ? null : c.categories[c.codes[i]];
        const v = c.values[i];
        return Number.isNaN(v) ? null : c.kind === 'boolean' ? v === 1 : v;
      }));
    }
    return { columns: x.columns.map((c) => c.name), rows, total: x.nRows };
  }
  if (isRowArray(x)) {
    const names = new Set<string>();
    for (const r of x) for (const k of Object.keys(r)) names.add(k);
    const columns = [...names];
    return { columns, rows: x.slice(0, limit).map((r) => columns.map((c) => r[c])), total: x.length };
  }
  return { columns: [], rows: [], total: 0 };
}
