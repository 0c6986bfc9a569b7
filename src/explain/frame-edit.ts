/**
 * Frames with one column changed, for what-if predictions (partial dependence, permutation importance).
 */
import type { Column, Frame } from '../table/frame.js';

/**
 * `frame` with column `j` replaced by `column` (same name and kind); the other columns are shared, not copied.
 * @example
 * withColumn(frame, 2, constantColumn(frame.columns[2], frame.nRows, 0));
 */
export function withColumn(frame: Frame, j: number, column: Column): Frame {
  const columns = frame.columns.slice();
  columns[j] = column;
  return { nRows: frame.nRows, columns, schema: frame.schema };
}

/**
 * Column `col` with every row set to `value` (a number, or a category code).
 * @example
 * constantColumn(frame.columns[0], frame.nRows, 48); // every row 48
 */
export function constantColumn(col: Column, nRows: number, value: number): Column {
  if (col.kind === 'categorical') return { ...col, codes: new Int32Array(nRows).fill(value) };
  return { ...col, values: new Float64Array(nRows).fill(value) };
}

/**
 * Column `col` with its rows reordered: row i takes the value of row `order[i]`.
 * @example
 * permutedColumn(col, Int32Array.of(2, 0, 1));
 */
export function permutedColumn(col: Column, order: Int32Array): Column {
  if (col.kind === 'categorical') return { ...col, codes: Int32Array.from(order, (r) => col.codes[r]) };
  return { ...col, values: Float64Array.from(order, (r) => col.values[r]) };
}
