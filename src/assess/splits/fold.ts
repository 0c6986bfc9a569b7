/**
 * Shared types of the splitters. A split is a list of folds; each fold names the rows a model is fitted
 * on (`train`) and the rows it is scored on (`test`), as sorted row indices. Nested splits add `watch`:
 * rows held out of `train` inside the outer training part, for learners that use held-out data
 * themselves (pruning, early stopping), never overlapping `test`.
 */
import type { Dataset, Frame } from '../../table/frame.js';

export interface Fold {
  /** Fold number, 0-based (the outer fold in nested splits). */
  readonly fold: number;
  readonly train: Int32Array;
  readonly test: Int32Array;
  /** Nested splits only: the inner held-out rows, disjoint from train and test. */
  readonly watch?: Int32Array;
  /** Nested splits only: the inner fold number within the outer fold. */
  readonly inner?: number;
}

/** What the splitters take: a dataset, a frame, or just a row count. */
export type SplitData = Dataset | Frame | number;

/**
 * A per-row key (stratum, group or time): a column name of the data's features, or one value per row.
 * Numbers, strings and dates are accepted; null, undefined and NaN mean missing.
 */
export type KeySource = string | ArrayLike<number | string | Date | null | undefined>;

/** A splitting method and its settings, for `splitRows` and the two levels of `splitNested`. */
export type SplitPlan =
  | { readonly method: 'holdout'; readonly testFraction?: number; readonly strata?: KeySource | false }
  | { readonly method: 'folds'; readonly k?: number; readonly shuffle?: boolean }
  | { readonly method: 'stratified'; readonly k?: number; readonly strata?: KeySource }
  | { readonly method: 'grouped'; readonly k?: number; readonly groups: KeySource }
  | { readonly method: 'time'; readonly k?: number; readonly order: KeySource };

/** Sorted copy of row indices as an Int32Array. */
export function sortedRows(rows: ArrayLike<number>): Int32Array {
  return Int32Array.from(rows).sort();
}

/** The rows of `rows` not in `exclude` (both as index lists), sorted. */
export function complementOf(rows: Int32Array, exclude: ArrayLike<number>, n: number): Int32Array {
  const mark = new Uint8Array(n);
  for (let i = 0; i < exclude.length; i++) mark[exclude[i]] = 1;
  const out: number[] = [];
  for (let i = 0; i < rows.length; i++) if (!mark[rows[i]]) out.push(rows[i]);
  return Int32Array.from(out).sort();
}
