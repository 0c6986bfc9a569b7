/**
 * Row subsets of single columns (a categorical column keeps its dictionary).
 */
import type { Column } from './frame.js';

/**
 * Rows `rows` (indices may repeat) of column `c`, with the same name, kind, dictionary and origin.
 *
 * @example subsetColumn({ name: 'x', kind: 'numeric', values: Float64Array.of(5, 6) }, [1]) // values [6]
 */
export function subsetColumn(c: Column, rows: ArrayLike<number>): Column {
  if (c.kind !== 'categorical') return { ...c, values: Float64Array.from(rows, (r) => c.values[r]) };
  return { ...c, codes: Int32Array.from(rows, (r) => c.codes[r]) };
}
