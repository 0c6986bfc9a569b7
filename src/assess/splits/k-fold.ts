import { createRng, shuffleInPlace, type Rng } from '../../util/rng.js';
import { sortedRows, complementOf, type Fold, type SplitData } from './fold.js';
import { checkFoldCount, rowCountOf } from './resolve.js';

export interface FoldsOptions {
  /** Number of folds. __Default:__ 5. */
  readonly k?: number;
  /** Shuffle rows before cutting them into folds; false keeps contiguous blocks in row order. __Default:__ true. */
  readonly shuffle?: boolean;
  /** Seed of the shuffle. __Default:__ 0. */
  readonly seed?: number;
}

/**
 * k-fold split: rows (shuffled, seeded) cut into k blocks whose sizes differ by at most one; fold i
 * tests on block i and trains on the rest. Every row is tested exactly once.
 *
 * @param data - a dataset, frame, or row count.
 * @example
 * const folds = splitFolds(10, { k: 5, seed: 1 });
 * folds[0].test.length; // 2
 */
export function splitFolds(data: SplitData, options: FoldsOptions = {}): Fold[] {
  const n = rowCountOf(data);
  const k = options.k ?? 5;
  checkFoldCount(k, n, 'rows');
  const rows = new Int32Array(n);
  for (let i = 0; i < n; i++) rows[i] = i;
  return foldRows(rows, k, options.shuffle ?? true ? createRng(options.seed ?? 0) : null, n);
}

/** Core: cut `rows` into k near-equal blocks (after a shuffle when `rng` is given). */
export function foldRows(rows: Int32Array, k: number, rng: Rng | null, n: number): Fold[] {
  const order = Int32Array.from(rows);
  if (rng) shuffleInPlace(rng, order);
  const folds: Fold[] = [];
  for (let f = 0; f < k; f++) {
    const start = Math.floor((f * order.length) / k), end = Math.floor(((f + 1) * order.length) / k);
    const test = sortedRows(order.subarray(start, end));
    folds.push({ fold: f, train: complementOf(rows, test, n), test });
  }
  return folds;
}
