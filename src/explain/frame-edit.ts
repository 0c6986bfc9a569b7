/**
 * Frames with one column changed, for what-if predictions (partial dependence, permutation importance).
 */
import type { Column, Frame } from '../table/frame.js';

/** `frame` with column `j` replaced by `column` (same name and kind); the other columns are shared, not copied. */
export function withColumn(frame: Frame, j: number, column: Column): Frame {
  const columns = frame.columns.slice();
  columns[j] = column;
  return { nRows: frame.nRows, columns, schema: frame.schema };
}

/** Column `col` with every row set to `value` (a number, or a category code). */
export function constantColumn(col: Column, nRows: number, value: number): Column {
  if (col.kind === 'categorical') return { ...col, codes: new Int32Array(nRows).fill(value) };
  return { ...col, values: new Float64Array(nRows).fill(value) };
}

/** Column `col` with its rows reordered: row i takes the value of row `order[i]`. */
export function permutedColumn(col: Column, order: Int32Array): Column {
  if (col.kind === 'categorical') return { ...col, codes: Int32Array.from(order, (r) => col.codes[r]) };
  return { ...col, values: Float64Array.from(order, (r) => col.values[r]) };
}
