import { errors } from '../../errors.js';
import { checkCodes, checkLength, checkNotEmpty, checkWeights, type Weights } from './check.js';

/** One cell of a confusion matrix. */
export interface ConfusionCell {
  readonly actual: string;
  readonly predicted: string;
  /** Rows (or total weight, when weighted) with this actual and predicted class. */
  readonly count: number;
  /** `count` over the total of its actual class (0 when that class has no rows): the row-normalised view. */
  readonly shareOfActual: number;
}

export interface ConfusionOptions {
  /** Class labels indexed by code. __Default:__ the codes as strings, "0", "1", ... */
  readonly classes?: readonly string[];
  /** Per-row weights. __Default:__ all 1. */
  readonly weights?: Weights;
}

/**
 * Confusion matrix as a tidy table: one row per (actual, predicted) pair of classes, K × K rows in code
 * order (actual major), zeros included so a chart draws every cell.
 *
 * @param actual - actual class codes.
 * @param predicted - predicted class codes, same length.
 * @example
 * confusionTable([0, 1, 1], [0, 0, 1], { classes: ['stay', 'leave'] });
 * // stay/stay 1, stay/leave 0, leave/stay 1, leave/leave 1
 */
export function confusionTable(
  actual: ArrayLike<number>, predicted: ArrayLike<number>, options: ConfusionOptions = {},
): ConfusionCell[] {
  const n = actual.length;
  checkNotEmpty(n, 'confusionTable');
  checkLength('predicted', n, predicted);
  const seen = Math.max(checkCodes('actual', actual), checkCodes('predicted', predicted));
  const labels = options.classes ?? Array.from({ length: seen }, (_, c) => String(c));
  if (seen > labels.length) throw errors.badOption('classes', labels, `at least ${seen} labels (largest code is ${seen - 1})`);
  const w = checkWeights(options.weights, n);
  const k = labels.length;
  const counts = new Float64Array(k * k), rowTotals = new Float64Array(k);
  for (let i = 0; i < n; i++) {
    counts[actual[i] * k + predicted[i]] += w[i];
    rowTotals[actual[i]] += w[i];
  }
  const cells: ConfusionCell[] = [];
  for (let a = 0; a < k; a++) {
    for (let p = 0; p < k; p++) {
      const count = counts[a * k + p];
      cells.push({ actual: labels[a], predicted: labels[p], count, shareOfActual: rowTotals[a] > 0 ? count / rowTotals[a] : 0 });
    }
  }
  return cells;
}
