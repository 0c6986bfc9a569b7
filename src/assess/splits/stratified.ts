import { errors } from '../../errors.js';
import { createRng, shuffleInPlace, type Rng } from '../../util/rng.js';
import { sortedRows, complementOf, type Fold, type KeySource, type SplitData } from './fold.js';
import { checkFoldCount, classCodesOf, resolveKeyIds, rowCountOf } from './resolve.js';

export interface StratifiedOptions {
  /** Number of folds. __Default:__ 5. */
  readonly k?: number;
  /** Strata: a column name or one value per row. __Default:__ the class target of a dataset. */
  readonly strata?: KeySource;
  /** Seed of the shuffle within each stratum. __Default:__ 0. */
  readonly seed?: number;
}

/**
 * Stratified k-fold split: within each class (stratum) rows are shuffled and dealt to the folds in turn,
 * so every fold holds within one row of (class count) / k rows of each class, and fold sizes differ by at
 * most one.
 *
 * @param data - a dataset with a class target, or a frame / row count with `strata` given.
 * @example
 * const folds = splitStratified(churn, { k: 5, seed: 7 });
 */
export function splitStratified(data: SplitData, options: StratifiedOptions = {}): Fold[] {
  const n = rowCountOf(data);
  const k = options.k ?? 5;
  checkFoldCount(k, n, 'rows');
  const strata = strataOf(data, options.strata);
  const rows = new Int32Array(n);
  for (let i = 0; i < n; i++) rows[i] = i;
  return stratifiedRows(rows, strata, k, createRng(options.seed ?? 0), n);
}

/** Stratum of each row: the given key source, else the class target; an error when neither exists. */
export function strataOf(data: SplitData, strata: KeySource | undefined): Int32Array {
  if (strata !== undefined) return resolveKeyIds(data, strata, 'strata').ids;
  const codes = classCodesOf(data);
  if (!codes) throw errors.badOption('strata', undefined, 'a column or values to stratify by (the data has no class target)');
  return codes;
}

/** Core: deal each stratum's shuffled rows to folds 0..k-1 in turn, continuing across strata. */
export function stratifiedRows(rows: Int32Array, strata: Int32Array, k: number, rng: Rng, n: number): Fold[] {
  const byStratum = new Map<number, number[]>();
  for (const r of rows) {
    const s = strata[r];
    const list = byStratum.get(s);
    if (list) list.push(r); else byStratum.set(s, [r]);
  }
  const fold = new Int32Array(n);
  let next = 0;
  for (const s of [...byStratum.keys()].sort((a, b) => a - b)) {
    for (const r of shuffleInPlace(rng, byStratum.get(s) as number[])) { fold[r] = next; next = (next + 1) % k; }
  }
  const folds: Fold[] = [];
  for (let f = 0; f < k; f++) {
    const test = sortedRows(rows.filter((r) => fold[r] === f));
    folds.push({ fold: f, train: complementOf(rows, test, n), test });
  }
  return folds;
}
