/**
 * The bootstrap (Efron 1979): n draws with replacement from n rows, returned as a count per row so a
 * learner can use the counts as row weights (a count of 0 leaves the row out: it is out-of-bag).
 * The chance that a given row is drawn at least once is 1 − (1 − 1/n)^n → 1 − 1/e ≈ 0.632
 * (James et al. 2013, ISLR Ex. 5.4.2; Hastie, Tibshirani & Friedman 2009, ESL eq. 7.55).
 */
import { errors } from '../../errors.js';
import type { Rng } from '../../util/rng.js';

/**
 * Draw a bootstrap sample of `size` rows out of `n` as counts per row.
 *
 * @param n number of rows to draw from (>= 1).
 * @param rng seeded generator (use `derive(seed, t)` for sample t).
 * @param size number of draws. __Default:__ `n`.
 * @returns Float64Array of length n; entry i is how often row i was drawn (sums to `size`).
 * @example
 * const counts = drawBootstrapCounts(100, derive(7, 0));
 * const inBag = counts.filter((c) => c > 0).length; // about 63
 */
export function drawBootstrapCounts(n: number, rng: Rng, size: number = n): Float64Array {
  if (!Number.isInteger(n) || n < 1) throw errors.badOption('n', n, 'a whole number >= 1');
  if (!Number.isInteger(size) || size < 0) throw errors.badOption('size', size, 'a whole number >= 0');
  const counts = new Float64Array(n);
  for (let d = 0; d < size; d++) counts[rng.int(n)] += 1;
  return counts;
}
