import type { Weights } from './check.js';
import { checkRegression } from './regression-check.js';

/**
 * Coefficient of determination: R² = 1 − Σ w (y − ŷ)² / Σ w (y − ȳ)², ȳ the weighted mean of the actual
 * values. Negative when the predictions are worse than predicting ȳ. When the actual values are all equal
 * the ratio is undefined and the result is NaN (no convention is imposed).
 *
 * @param actual - actual values (finite).
 * @param predicted - predicted values, same length.
 * @param weights - per-row weights. __Default:__ all 1.
 * @example
 * rSquared([1, 2, 3], [1, 2, 4]); // 1 − 1/2 = 0.5
 */
export function rSquared(actual: ArrayLike<number>, predicted: ArrayLike<number>, weights?: Weights): number {
  const w = checkRegression('rSquared', actual, predicted, weights);
  const n = actual.length;
  let sw = 0, swy = 0;
  for (let i = 0; i < n; i++) { sw += w[i]; swy += w[i] * actual[i]; }
  const mean = swy / sw;
  let residual = 0, spread = 0;
  for (let i = 0; i < n; i++) {
    residual += w[i] * (actual[i] - predicted[i]) ** 2;
    spread += w[i] * (actual[i] - mean) ** 2;
  }
  return spread > 0 ? 1 - residual / spread : NaN;
}
