import { errors } from '../../errors.js';
import { createRng, shuffleInPlace, type Rng } from '../../util/rng.js';
import { sortedRows, complementOf, type Fold, type KeySource, type SplitData } from './fold.js';
import { classCodesOf, resolveKeyIds, rowCountOf } from './resolve.js';

export interface HoldoutOptions {
  /** Share of rows held out for testing, strictly between 0 and 1. __Default:__ 0.25. */
  readonly testFraction?: number;
  /**
   * Keep the class (stratum) shares in both parts: a column name or per-row values, or false for a plain
   * random split. __Default:__ the class target when the data is a dataset with one, otherwise false.
   */
  readonly strata?: KeySource | false;
  /** Seed of the shuffle. __Default:__ 0. */
  readonly seed?: number;
}

/**
 * Holdout split: one fold testing on round(n × testFraction) rows (at least 1, at most n − 1), chosen at
 * random (seeded). Stratified, each stratum gives its share of test rows, rounded by largest remainder so
 * the total is exact.
 *
 * @param data - a dataset, frame, or row count (at least 2 rows).
 * @example
 * const [fold] = splitHoldout(claims, { testFraction: 0.2, seed: 3 });
 * fold.train.length + fold.test.length === claims.features.nRows; // true
 */
export function splitHoldout(data: SplitData, options: HoldoutOptions = {}): Fold[] {
  const n = rowCountOf(data);
  const fraction = options.testFraction ?? 0.25;
  checkFraction(fraction);
  if (n < 2) throw errors.badOption('rows', n, 'at least 2 rows for a holdout split');
  const source = options.strata;
  const strata = source === false ? null : source !== undefined ? resolveKeyIds(data, source, 'strata').ids : classCodesOf(data);
  const rows = new Int32Array(n);
  for (let i = 0; i < n; i++) rows[i] = i;
  return [holdoutRows(rows, strata, fraction, createRng(options.seed ?? 0), n)];
}

/** Throw unless 0 < fraction < 1. */
export function checkFraction(fraction: number): void {
  if (!(fraction > 0 && fraction < 1)) throw errors.badOption('testFraction', fraction, 'a number strictly between 0 and 1');
}

/** Core: hold out a share of `rows`, per stratum when `strata` is given. */
export function holdoutRows(rows: Int32Array, strata: Int32Array | null, fraction: number, rng: Rng, n: number): Fold {
  const total = Math.min(Math.max(Math.round(rows.length * fraction), 1), rows.length - 1);
  const groups = new Map<number, number[]>();
  for (const r of rows) {
    const s = strata ? strata[r] : 0;
    const list = groups.get(s);
    if (list) list.push(r); else groups.set(s, [r]);
  }
  const keys = [...groups.keys()].sort((a, b) => a - b);
  const quota = keys.map((s) => ((groups.get(s) as number[]).length * total) / rows.length);
  const take = quota.map(Math.floor);
  let left = total - take.reduce((a, b) => a + b, 0);
  const byRemainder = keys.map((_, j) => j).sort((a, b) => quota[b] - take[b] - (quota[a] - take[a]) || a - b);
  for (const j of byRemainder) { if (left === 0) break; take[j]++; left--; }
  const test: number[] = [];
  keys.forEach((s, j) => test.push(...shuffleInPlace(rng, groups.get(s) as number[]).slice(0, take[j])));
  const testRows = sortedRows(test);
  return { fold: 0, train: complementOf(rows, testRows, n), test: testRows };
}
