import { checkFinite, checkLength, checkNotEmpty, checkWeights, type Weights } from './check.js';

/** Validate a regression metric's inputs and return the weights (all ones when absent). */
export function checkRegression(
  metric: string, actual: ArrayLike<number>, predicted: ArrayLike<number>, weights: Weights,
): Float64Array {
  const n = actual.length;
  checkNotEmpty(n, metric);
  checkLength('predicted', n, predicted);
  checkFinite('actual', actual);
  checkFinite('predicted', predicted);
  return checkWeights(weights, n);
}
