import { checkCodes, checkLength, checkNotEmpty, checkWeights, type Weights } from './check.js';

/**
 * Share of rows whose predicted class equals the actual class (weighted when weights are given).
 *
 * @param actual - actual class codes (integers >= 0).
 * @param predicted - predicted class codes, same length.
 * @param weights - per-row weights. __Default:__ all 1.
 * @example
 * accuracy([0, 1, 1, 0], [0, 1, 0, 0]); // 0.75
 */
export function accuracy(actual: ArrayLike<number>, predicted: ArrayLike<number>, weights?: Weights): number {
  const n = actual.length;
  checkNotEmpty(n, 'accuracy');
  checkLength('predicted', n, predicted);
  checkCodes('actual', actual);
  checkCodes('predicted', predicted);
  const w = checkWeights(weights, n);
  let hit = 0, total = 0;
  for (let i = 0; i < n; i++) {
    total += w[i];
    if (actual[i] === predicted[i]) hit += w[i];
  }
  return hit / total;
}
