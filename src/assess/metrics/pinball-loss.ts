import { errors } from '../../errors.js';
import type { Weights } from './check.js';
import { checkRegression } from './regression-check.js';

/**
 * Pinball (check) loss at quantile τ: the weighted mean of τ·(y − q) when y >= q, else (1 − τ)·(q − y),
 * minimised in expectation by the τ-quantile (Koenker & Bassett 1978, "Regression quantiles",
 * Econometrica 46(1):33–50). At τ = 0.5 it is half the absolute error.
 *
 * @param actual - actual values (finite).
 * @param predicted - predicted τ-quantiles, same length.
 * @param tau - the quantile, strictly between 0 and 1.
 * @param weights - per-row weights. __Default:__ all 1.
 * @example
 * pinballLoss([10, 10], [8, 13], 0.9); // (0.9·2 + 0.1·3) / 2 = 1.05
 */
export function pinballLoss(actual: ArrayLike<number>, predicted: ArrayLike<number>, tau: number, weights?: Weights): number {
  if (!(tau > 0 && tau < 1)) throw errors.badOption('tau', tau, 'a number strictly between 0 and 1');
  const w = checkRegression('pinballLoss', actual, predicted, weights);
  let sum = 0, total = 0;
  for (let i = 0; i < actual.length; i++) {
    const d = actual[i] - predicted[i];
    sum += w[i] * (d >= 0 ? tau * d : (tau - 1) * d);
    total += w[i];
  }
  return sum / total;
}
