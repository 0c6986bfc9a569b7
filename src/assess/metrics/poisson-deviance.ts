import { errors } from '../../errors.js';
import type { Weights } from './check.js';
import { checkRegression } from './regression-check.js';

/**
 * Mean Poisson deviance: Σ w_i · 2(y_i ln(y_i/μ_i) − (y_i − μ_i)) / Σ w_i, with y ln y taken as 0 at y = 0
 * (McCullagh & Nelder 1989, Generalized Linear Models, 2nd ed., ch. 2, deviance). Counts y must be >= 0 and
 * predicted means μ >= 0; μ = 0 with y > 0 gives Infinity.
 *
 * @param actual - observed counts (finite, >= 0; need not be integers, e.g. rates).
 * @param predicted - predicted means, same length.
 * @param weights - per-row weights (e.g. exposure). __Default:__ all 1.
 * @example
 * poissonDeviance([0, 2], [1, 1]); // (2·1 + 2·(2 ln 2 − 1)) / 2 ≈ 1.3863
 */
export function poissonDeviance(actual: ArrayLike<number>, predicted: ArrayLike<number>, weights?: Weights): number {
  const w = checkRegression('poissonDeviance', actual, predicted, weights);
  let sum = 0, total = 0;
  for (let i = 0; i < actual.length; i++) {
    const y = actual[i], mu = predicted[i];
    if (y < 0) throw errors.badValue('actual', i, y, 'a count >= 0');
    if (mu < 0) throw errors.badValue('predicted', i, mu, 'a mean >= 0');
    const ylog = y === 0 ? 0 : mu === 0 ? Infinity : y * Math.log(y / mu);
    sum += w[i] * 2 * (ylog - (y - mu));
    total += w[i];
  }
  return sum / total;
}
