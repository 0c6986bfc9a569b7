import { checkClassProbabilities, type Weights } from './check.js';

/** Probabilities are clipped to [CLIP, 1 - CLIP] before the logarithm, so a confident miss costs at most -ln(1e-15) ≈ 34.5. */
export const LOG_LOSS_CLIP = 1e-15;

/**
 * Log loss (cross-entropy, natural logarithm): the weighted mean of -ln p(actual class).
 * Probabilities are clipped to [1e-15, 1 - 1e-15] first, so a probability of 0 for the actual class
 * gives a large finite loss (≈ 34.54) instead of Infinity.
 *
 * @param actual - actual class codes (integers >= 0).
 * @param proba - either one probability per row (binary: the probability of class 1), or n × K class
 *   probabilities, row-major.
 * @param weights - per-row weights. __Default:__ all 1.
 * @example
 * logLoss([1, 0], [0.8, 0.4]); // (-ln 0.8 - ln 0.6) / 2 ≈ 0.3670
 */
export function logLoss(actual: ArrayLike<number>, proba: ArrayLike<number>, weights?: Weights): number {
  const n = actual.length;
  const { k, w } = checkClassProbabilities('logLoss', actual, proba, weights);
  let sum = 0, total = 0;
  for (let i = 0; i < n; i++) {
    const y = actual[i];
    const p = k === 1 ? (y === 1 ? proba[i] : 1 - proba[i]) : proba[i * k + y];
    const q = Math.min(Math.max(p, LOG_LOSS_CLIP), 1 - LOG_LOSS_CLIP);
    sum -= w[i] * Math.log(q);
    total += w[i];
  }
  return sum / total;
}
