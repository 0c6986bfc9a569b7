/**
 * Input checks shared by the metrics: lengths, emptiness, weights, class codes and probabilities.
 * Each throws a `CoppiceError` naming the argument and value at fault; nothing is coerced.
 */
import { errors } from '../../errors.js';

/** Optional per-row weights: null or undefined means every row weighs 1. */
export type Weights = Float64Array | readonly number[] | null | undefined;

/** Throw unless `values` has `n` entries. */
export function checkLength(what: string, n: number, values: ArrayLike<number>): void {
  if (values.length !== n) throw errors.lengthMismatch(what, n, values.length);
}

/** Throw when there are no rows to score. */
export function checkNotEmpty(n: number, metric: string): void {
  if (n === 0) throw errors.emptyData(`score (${metric})`);
}

/** Check weights (finite, >= 0, positive total) and return them as a Float64Array of ones when absent. */
export function checkWeights(weights: Weights, n: number): Float64Array {
  if (weights == null) return new Float64Array(n).fill(1);
  checkLength('weights', n, weights);
  let total = 0;
  for (let i = 0; i < n; i++) {
    const w = weights[i];
    if (!(w >= 0) || w === Infinity) throw errors.badValue('weights', i, w, 'a finite number >= 0');
    total += w;
  }
  if (!(total > 0)) throw errors.badOption('weights', 'all zero', 'a positive total weight');
  return weights instanceof Float64Array ? weights : Float64Array.from(weights);
}

/** Throw unless every entry is a class code: an integer >= 0 (missing targets, -1, are dropped before scoring). */
export function checkCodes(what: string, codes: ArrayLike<number>): number {
  let max = -1;
  for (let i = 0; i < codes.length; i++) {
    const c = codes[i];
    if (!Number.isInteger(c) || c < 0) throw errors.badValue(what, i, c, 'a class code (integer >= 0)');
    if (c > max) max = c;
  }
  return max + 1;
}

/** Throw unless every entry is a finite number. */
export function checkFinite(what: string, values: ArrayLike<number>): void {
  for (let i = 0; i < values.length; i++) {
    if (!Number.isFinite(values[i])) throw errors.badValue(what, i, values[i], 'a finite number');
  }
}

/** Throw unless every entry is a probability in [0, 1]. */
export function checkProbabilities(proba: ArrayLike<number>): void {
  for (let i = 0; i < proba.length; i++) {
    const p = proba[i];
    if (!(p >= 0 && p <= 1)) throw errors.badProbability(i, p);
  }
}

/**
 * Columns per row of a probability array for `n` rows: 1 when it holds one probability per row
 * (the positive class of a binary task), K when it holds n × K class probabilities, row-major.
 */
export function probaColumns(n: number, proba: ArrayLike<number>): number {
  if (proba.length === n) return 1;
  if (n > 0 && proba.length % n === 0 && proba.length / n >= 2) return proba.length / n;
  throw errors.lengthMismatch('probabilities', n, proba.length);
}

/**
 * The shared checks of a metric on class codes and probabilities: non-empty, codes valid, probability
 * array of n or n × K values in [0, 1] (n × classes when the codes need more columns), weights valid.
 * Returns the columns per row and the weights.
 * @example
 * const { k, w } = checkClassProbabilities('logLoss', [1, 0], [0.8, 0.4]); // k = 1, w = [1, 1]
 */
export function checkClassProbabilities(metric: string, actual: ArrayLike<number>, proba: ArrayLike<number>, weights?: Weights): { k: number; w: Float64Array } {
  const n = actual.length;
  checkNotEmpty(n, metric);
  const k = probaColumns(n, proba);
  const classes = checkCodes('actual', actual);
  if (classes > Math.max(k, 2)) checkLength('probabilities', n * classes, proba);
  checkProbabilities(proba);
  return { k, w: checkWeights(weights, n) };
}
