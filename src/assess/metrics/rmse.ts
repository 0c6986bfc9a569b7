import type { Weights } from './check.js';
import { checkRegression } from './regression-check.js';

/**
 * Root mean squared error: sqrt(Σ w_i (y_i − ŷ_i)² / Σ w_i).
 *
 * @param actual - actual values (finite).
 * @param predicted - predicted values, same length.
 * @param weights - per-row weights. __Default:__ all 1.
 * @example
 * rmse([1, 2, 3], [1, 2, 5]); // sqrt(4 / 3) ≈ 1.1547
 */
export function rmse(actual: ArrayLike<number>, predicted: ArrayLike<number>, weights?: Weights): number {
  const w = checkRegression('rmse', actual, predicted, weights);
  let sum = 0, total = 0;
  for (let i = 0; i < actual.length; i++) {
    const d = actual[i] - predicted[i];
    sum += w[i] * d * d;
    total += w[i];
  }
  return Math.sqrt(sum / total);
}
