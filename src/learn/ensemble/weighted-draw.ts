/**
 * Draws with replacement where row i is chosen with probability w_i / Σw (resampling by weight, the
 * alternative to weighted fitting in AdaBoost; Freund & Schapire 1997, "A decision-theoretic
 * generalization of on-line learning and an application to boosting", JCSS 55:119–139).
 */
import { errors } from '../../errors.js';
import type { Rng } from '../../util/rng.js';

/**
 * Draw `size` rows with probability proportional to `weights`, returned as counts per row.
 *
 * @param weights non-negative row weights with a positive sum.
 * @param rng seeded generator.
 * @param size number of draws. __Default:__ `weights.length`.
 * @example
 * drawWeightedCounts(new Float64Array([0, 1, 3]), createRng(1), 4); // e.g. [0, 1, 3]; row 0 never drawn
 */
export function drawWeightedCounts(weights: Float64Array, rng: Rng, size: number = weights.length): Float64Array {
  const n = weights.length;
  const cum = new Float64Array(n);
  let total = 0;
  for (let i = 0; i < n; i++) {
    const w = weights[i];
    if (!(w >= 0) || w === Infinity) throw errors.badWeights(`weight ${w} at row ${i}`);
    total += w;
    cum[i] = total;
  }
  if (!(total > 0)) throw errors.badWeights('they sum to 0');
  const counts = new Float64Array(n);
  for (let d = 0; d < size; d++) {
    const u = rng.next() * total;
    // first i with cum[i] > u (binary search); rows of weight 0 are never chosen
    let lo = 0, hi = n - 1;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (cum[mid] > u) hi = mid; else lo = mid + 1;
    }
    counts[lo] += 1;
  }
  return counts;
}
