import { checkCodes, checkLength, checkNotEmpty, checkWeights, type Weights } from './check.js';

/**
 * Balanced accuracy: the mean over classes of the recall (share of each actual class predicted
 * correctly), so every class counts the same however rare. Classes absent from `actual` are left
 * out of the mean. Definition: Brodersen, Ong, Stephan & Buhmann (2010), "The balanced accuracy and
 * its posterior distribution", ICPR 2010, pp. 3121–3124.
 *
 * @param actual - actual class codes (integers >= 0).
 * @param predicted - predicted class codes, same length.
 * @param weights - per-row weights. __Default:__ all 1.
 * @example
 * balancedAccuracy([0, 0, 0, 1], [0, 0, 0, 0]); // (1 + 0) / 2 = 0.5
 */
export function balancedAccuracy(actual: ArrayLike<number>, predicted: ArrayLike<number>, weights?: Weights): number {
  const n = actual.length;
  checkNotEmpty(n, 'balancedAccuracy');
  checkLength('predicted', n, predicted);
  const k = checkCodes('actual', actual);
  checkCodes('predicted', predicted);
  const w = checkWeights(weights, n);
  const total = new Float64Array(k), hit = new Float64Array(k);
  for (let i = 0; i < n; i++) {
    total[actual[i]] += w[i];
    if (actual[i] === predicted[i]) hit[actual[i]] += w[i];
  }
  let sum = 0, classes = 0;
  for (let c = 0; c < k; c++) {
    if (total[c] > 0) { sum += hit[c] / total[c]; classes++; }
  }
  return sum / classes;
}
