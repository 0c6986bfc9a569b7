import { errors } from '../../errors.js';
import { createRng, type Rng } from '../../util/rng.js';
import type { Fold, SplitData, SplitPlan } from './fold.js';
import { groupedRows } from './grouped.js';
import { checkFraction, holdoutRows } from './holdout.js';
import { foldRows } from './k-fold.js';
import { checkFoldCount, classCodesOf, resolveKeyIds, resolveOrder, rowCountOf } from './resolve.js';
import { stratifiedRows, strataOf } from './stratified.js';
import { timeRows } from './time-ordered.js';

/**
 * Split by a plan object — the same methods as `splitHoldout`, `splitFolds`, `splitStratified`,
 * `splitGrouped` and `splitByTime`, chosen by `plan.method`. Used where a split is a setting (cross-
 * validation, search, nested splits).
 *
 * @param data - a dataset, frame or row count.
 * @param plan - method and its settings; `k` defaults to 5, `testFraction` to 0.25.
 * @param seed - seed of every random choice. __Default:__ 0.
 * @example
 * splitRows(claims, { method: 'grouped', k: 5, groups: 'policyId' }, 11);
 */
export function splitRows(data: SplitData, plan: SplitPlan, seed = 0): Fold[] {
  const n = rowCountOf(data);
  const rows = new Int32Array(n);
  for (let i = 0; i < n; i++) rows[i] = i;
  return splitSubset(data, plan, rows, createRng(seed));
}

/** Core: apply `plan` to the subset `rows` of `data` (keys are looked up by original row index). */
export function splitSubset(data: SplitData, plan: SplitPlan, rows: Int32Array, rng: Rng): Fold[] {
  const n = rowCountOf(data);
  switch (plan.method) {
    case 'holdout': {
      const fraction = plan.testFraction ?? 0.25;
      checkFraction(fraction);
      if (rows.length < 2) throw errors.badOption('rows', rows.length, 'at least 2 rows for a holdout split');
      const s = plan.strata;
      const strata = s === false ? null : s !== undefined ? resolveKeyIds(data, s, 'strata').ids : classCodesOf(data);
      return [holdoutRows(rows, strata, fraction, rng, n)];
    }
    case 'folds': {
      const k = plan.k ?? 5;
      checkFoldCount(k, rows.length, 'rows');
      return foldRows(rows, k, plan.shuffle ?? true ? rng : null, n);
    }
    case 'stratified': {
      const k = plan.k ?? 5;
      checkFoldCount(k, rows.length, 'rows');
      return stratifiedRows(rows, strataOf(data, plan.strata), k, rng, n);
    }
    case 'grouped': {
      const k = plan.k ?? 5;
      const { ids } = resolveKeyIds(data, plan.groups, 'groups');
      checkFoldCount(k, new Set(Array.from(rows, (r) => ids[r])).size, 'distinct groups');
      return groupedRows(rows, ids, k, rng, n);
    }
    case 'time':
      return timeRows(rows, resolveOrder(data, plan.order, 'order'), plan.k ?? 5);
    default:
      throw errors.badOption('method', (plan as { method: unknown }).method, "'holdout', 'folds', 'stratified', 'grouped' or 'time'");
  }
}
