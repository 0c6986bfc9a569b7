/**
 * The combiner's inputs for stacking: each member's output — K class probabilities, or one value —
 * followed by the pass-through numeric features, as one n × p row-major matrix.
 */
import { errors } from '../../errors.js';
import type { Frame } from '../../table/frame.js';
import type { Predictions } from '../model.js';

/** Columns per member: K for classes, 1 for numbers. */
export function memberWidth(pred: Predictions): number {
  return pred.task === 'classification' ? pred.classes.length : 1;
}

/**
 * Write member `j`'s predictions for rows `rows` (or all rows) into `X` (p columns).
 * @example
 * writeMemberColumns(X, p, 0, preds, K, testRows);
 */
export function writeMemberColumns(X: Float64Array, p: number, col: number, pred: Predictions, width: number, rows: ArrayLike<number> | null): void {
  const m = rows ? rows.length : pred.n;
  for (let j = 0; j < m; j++) {
    const i = rows ? rows[j] : j;
    if (width === 1) X[i * p + col] = pred.value[j];
    else for (let k = 0; k < width; k++) X[i * p + col + k] = pred.proba[j * width + k];
  }
}

/**
 * Copy numeric features `names` of `frame` into columns `col..` of `X`.
 * @example
 * writePassThrough(X, p, 6, frame, ['tenure']);
 */
export function writePassThrough(X: Float64Array, p: number, col: number, frame: Frame, names: readonly string[]): void {
  names.forEach((name, j) => {
    const c = frame.columns.find((cc) => cc.name === name);
    if (!c) throw errors.missingColumn(name, 'the table');
    if (c.kind === 'categorical') throw errors.badOption('passThrough', name, 'numeric feature names');
    for (let i = 0; i < frame.nRows; i++) X[i * p + col + j] = c.values[i];
  });
}
