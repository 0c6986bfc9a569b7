/** Row subsets of targets and predictions (the assess layer's counterpart of `takeDataset`). */
import type { Predictions } from '../learn/model.js';
import type { Target } from '../table/frame.js';

/**
 * The target values or codes of rows `rows` (indices may repeat).
 * @example
 * takeTarget({ kind: 'number', name: 'cost', values: Float64Array.of(5, 6, 7) }, [2, 0]); // values 7, 5
 */
export function takeTarget(t: Target, rows: ArrayLike<number>): Target {
  if (t.kind === 'class') return { ...t, codes: Int32Array.from({ length: rows.length }, (_, i) => t.codes[rows[i]]) };
  return { ...t, values: Float64Array.from({ length: rows.length }, (_, i) => t.values[rows[i]]) };
}

/**
 * Predictions for rows `rows` (indices may repeat).
 * @example
 * takePredictions(predictions, [0, 5, 9]).n; // 3
 */
export function takePredictions(p: Predictions, rows: ArrayLike<number>): Predictions {
  const k = p.task === 'classification' ? p.classes.length : 0;
  const value = Float64Array.from({ length: rows.length }, (_, i) => p.value[rows[i]]);
  const hasProba = k > 0 && p.proba.length === p.n * k;
  const proba = new Float64Array(hasProba ? rows.length * k : 0);
  if (hasProba) for (let i = 0; i < rows.length; i++) proba.set(p.proba.subarray(rows[i] * k, rows[i] * k + k), i * k);
  return { ...p, n: rows.length, value, proba };
}
