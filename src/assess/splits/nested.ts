import { errors } from '../../errors.js';
import { derive } from '../../util/rng.js';
import type { Fold, SplitData, SplitPlan } from './fold.js';
import { splitSubset } from './plan.js';
import { rowCountOf } from './resolve.js';

export interface NestedOptions {
  /** How the test folds are made. __Default:__ `{ method: 'folds', k: 5 }`. */
  readonly outer?: SplitPlan;
  /** How each outer training part is split into train and watch rows. __Default:__ `{ method: 'holdout', testFraction: 0.25 }`. */
  readonly inner?: SplitPlan;
  /** Seed; the outer split and each inner split get their own derived stream. __Default:__ 0. */
  readonly seed?: number;
}

/**
 * Nested split: outer folds give the test rows; within each outer training part an inner split sets aside
 * `watch` rows for a learner that uses held-out data itself (pruning, early stopping, choosing settings).
 * One fold per (outer, inner) pair: `train` and `watch` come from the outer training part only, so the
 * test rows are never seen before the final score. Checked: a fold whose test rows reach train or watch
 * throws. See `describeFolds` for the table of which rows each stage sees.
 *
 * @param data - a dataset, frame or row count.
 * @example
 * const folds = splitNested(claims, { outer: { method: 'folds', k: 5 }, inner: { method: 'holdout', testFraction: 0.2 } });
 * // folds[i]: { fold, inner, train, watch, test }
 */
export function splitNested(data: SplitData, options: NestedOptions = {}): Fold[] {
  const n = rowCountOf(data);
  const seed = options.seed ?? 0;
  const rows = new Int32Array(n);
  for (let i = 0; i < n; i++) rows[i] = i;
  const outer = splitSubset(data, options.outer ?? { method: 'folds', k: 5 }, rows, derive(seed, 1));
  const out: Fold[] = [];
  for (const o of outer) {
    const inner = splitSubset(data, options.inner ?? { method: 'holdout', testFraction: 0.25 }, o.train, derive(seed, 2, o.fold));
    for (const [j, f] of inner.entries()) out.push({ fold: o.fold, inner: j, train: f.train, watch: f.test, test: o.test });
  }
  checkNoLeak(out, n);
  return out;
}

/**
 * Throw when any fold's test rows also appear in its train or watch rows, or watch overlaps train.
 *
 * @param folds - folds from any splitter.
 * @param nRows - number of rows of the data.
 * @example
 * checkNoLeak(splitNested(1000), 1000); // passes silently
 */
export function checkNoLeak(folds: readonly Fold[], nRows: number): void {
  const mark = new Uint8Array(nRows);
  for (const f of folds) {
    mark.fill(0);
    for (const r of f.test) mark[r] = 1;
    const count = (rows: Int32Array, bit: number): number => {
      let c = 0;
      for (const r of rows) { if (mark[r] & bit) c++; }
      return c;
    };
    const inTrain = count(f.train, 1);
    if (inTrain > 0) throw errors.rowLeak(f.fold, 'train', inTrain);
    if (f.watch) {
      const inWatch = count(f.watch, 1);
      if (inWatch > 0) throw errors.rowLeak(f.fold, 'watch', inWatch);
      for (const r of f.train) mark[r] |= 2;
      const both = count(f.watch, 2);
      if (both > 0) throw errors.badOption('watch', `${both} row(s)`, 'watch rows disjoint from train rows');
    }
  }
}
