/**
 * Impurity-based importance: for each feature, the sum over every tree of the gains (weighted impurity
 * decreases) of the nodes that split on it, normalised to sum to 1 (Breiman, Friedman, Olshen & Stone
 * 1984, Classification and Regression Trees, §5.3.4; Breiman 2001, "Random forests", Machine Learning 45:5–32).
 */
import type { ColumnSchema } from '../../table/frame.js';
import { LEAF, type FlatTree } from '../flat-tree.js';

/** One row of an importance table (same shape as the rows of the importance chart). */
export interface ImpurityImportanceRow {
  readonly feature: string;
  /** Share of the total gain, in [0, 1]; the rows sum to 1 (all 0 when no tree has a split). */
  readonly value: number;
}

/**
 * Importance table of `trees` over `features`, largest first (ties in feature order).
 * @example
 * impurityImportance(model.trees, model.features); // [{ feature: 'x4', value: 0.41 }, ...] (the row shape chartImportance draws)
 */
export function impurityImportance(trees: readonly FlatTree[], features: readonly ColumnSchema[]): ImpurityImportanceRow[] {
  const total = new Float64Array(features.length);
  for (const t of trees) {
    for (let n = 0; n < t.nNodes; n++) {
      if (t.kind[n] !== LEAF && t.gain[n] > 0) total[t.feature[n]] += t.gain[n];
    }
  }
  const sum = total.reduce((a, b) => a + b, 0);
  const rows = features.map((f, j) => ({ feature: f.name, value: sum > 0 ? total[j] / sum : 0, j }));
  rows.sort((a, b) => b.value - a.value || a.j - b.j);
  return rows.map(({ feature, value }) => ({ feature, value }));
}
