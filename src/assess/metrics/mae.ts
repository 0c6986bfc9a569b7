import type { Weights } from './check.js';
import { checkRegression } from './regression-check.js';

/**
 * Mean absolute error: Σ w_i |y_i − ŷ_i| / Σ w_i.
 *
 * @param actual - actual values (finite).
 * @param predicted - predicted values, same length.
 * @param weights - per-row weights. __Default:__ all 1.
 * @example
 * mae([1, 2, 3], [1, 2, 5]); // 2 / 3
 */
export function mae(actual: ArrayLike<number>, predicted: ArrayLike<number>, weights?: Weights): number {
  const w = checkRegression('mae', actual, predicted, weights);
  let sum = 0, total = 0;
  for (let i = 0; i < actual.length; i++) {
    sum += w[i] * Math.abs(actual[i] - predicted[i]);
    total += w[i];
  }
  return sum / total;
}
