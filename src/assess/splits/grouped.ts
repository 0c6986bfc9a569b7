import { createRng, shuffleInPlace, type Rng } from '../../util/rng.js';
import { sortedRows, complementOf, type Fold, type KeySource, type SplitData } from './fold.js';
import { checkFoldCount, resolveKeyIds, rowCountOf } from './resolve.js';

export interface GroupedOptions {
  /** Number of folds. __Default:__ 5. */
  readonly k?: number;
  /** The group of each row (customer, policy, store): a column name or one value per row. Required. */
  readonly groups: KeySource;
  /** Seed that orders groups of equal size. __Default:__ 0. */
  readonly seed?: number;
}

/**
 * Grouped k-fold split: all rows of a group land in the same fold, so a model is never tested on a group
 * it was fitted on. Groups are placed largest first, each into the fold with the fewest rows so far
 * (greedy longest-processing-time balancing, Graham 1969, "Bounds on multiprocessing timing anomalies",
 * SIAM J. Appl. Math. 17(2):416–429); equal-size groups are ordered at random (seeded).
 *
 * @param data - a dataset, frame or row count; `groups` names a column of it or gives values.
 * @example
 * const folds = splitGrouped(claims, { k: 4, groups: 'policyId' });
 */
export function splitGrouped(data: SplitData, options: GroupedOptions): Fold[] {
  const n = rowCountOf(data);
  const k = options.k ?? 5;
  const { ids, count } = resolveKeyIds(data, options.groups, 'groups');
  checkFoldCount(k, count, 'distinct groups');
  const rows = new Int32Array(n);
  for (let i = 0; i < n; i++) rows[i] = i;
  return groupedRows(rows, ids, k, createRng(options.seed ?? 0), n);
}

/** Core: balance the groups present in `rows` over k folds by row count. */
export function groupedRows(rows: Int32Array, groups: Int32Array, k: number, rng: Rng, n: number): Fold[] {
  const members = new Map<number, number[]>();
  for (const r of rows) {
    const list = members.get(groups[r]);
    if (list) list.push(r); else members.set(groups[r], [r]);
  }
  const keys = shuffleInPlace(rng, [...members.keys()].sort((a, b) => a - b));
  const size = (g: number): number => (members.get(g) as number[]).length;
  const order = keys.map((g, j) => ({ g, j })).sort((a, b) => size(b.g) - size(a.g) || a.j - b.j);
  const load = new Array<number>(k).fill(0);
  const tests: number[][] = Array.from({ length: k }, () => []);
  for (const { g } of order) {
    let f = 0;
    for (let j = 1; j < k; j++) if (load[j] < load[f]) f = j;
    load[f] += size(g);
    tests[f].push(...(members.get(g) as number[]));
  }
  return tests.map((t, f) => {
    const test = sortedRows(t);
    return { fold: f, train: complementOf(rows, test, n), test };
  });
}
