import { sortedRows, type Fold, type KeySource, type SplitData } from './fold.js';
import { checkFoldCount, resolveOrder, rowCountOf } from './resolve.js';

export interface TimeOptions {
  /** Number of test blocks (folds). __Default:__ 5. */
  readonly k?: number;
  /** The time of each row: a numeric or date column name, or one number/date per row. Required. */
  readonly order: KeySource;
}

/**
 * Time-ordered split with an expanding window: rows sorted by `order` are cut into k + 1 blocks of about
 * equal size; fold i trains on blocks 0..i (the past) and tests on block i + 1 (the next period). Rows
 * with the same time always stay in the same block, so no fold trains on part of a period and tests on
 * the rest. Deterministic: no seed.
 *
 * @param data - a dataset, frame or row count; `order` names a column of it or gives values.
 * @example
 * const folds = splitByTime(demand, { k: 4, order: 'week' });
 * // folds[0]: train on the first fifth of weeks, test on the second fifth
 */
export function splitByTime(data: SplitData, options: TimeOptions): Fold[] {
  const n = rowCountOf(data);
  const k = options.k ?? 5;
  const order = resolveOrder(data, options.order, 'order');
  const rows = new Int32Array(n);
  for (let i = 0; i < n; i++) rows[i] = i;
  return timeRows(rows, order, k);
}

/** Core: expanding-window folds over `rows` sorted by `order`. */
export function timeRows(rows: Int32Array, order: Float64Array, k: number): Fold[] {
  const sorted = Int32Array.from(rows).sort((a, b) => order[a] - order[b] || a - b);
  // Period boundaries: positions where the time changes. Each block end is the boundary nearest to an
  // equal-rows target, leaving enough boundaries for the blocks still to come.
  const cuts: number[] = [];
  for (let j = 1; j < sorted.length; j++) if (order[sorted[j]] !== order[sorted[j - 1]]) cuts.push(j);
  checkFoldCount(k, cuts.length, 'distinct times minus one');
  const ends: number[] = [];
  let from = 0;
  for (let b = 1; b <= k; b++) {
    const target = (b * sorted.length) / (k + 1);
    const last = cuts.length - (k - b) - 1;
    let best = from;
    for (let j = from + 1; j <= last; j++) if (Math.abs(cuts[j] - target) < Math.abs(cuts[best] - target)) best = j;
    ends.push(cuts[best]);
    from = best + 1;
  }
  ends.push(sorted.length);
  const folds: Fold[] = [];
  for (let f = 0; f < k; f++) {
    folds.push({ fold: f, train: sortedRows(sorted.subarray(0, ends[f])), test: sortedRows(sorted.subarray(ends[f], ends[f + 1])) });
  }
  return folds;
}
