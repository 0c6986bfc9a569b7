/**
 * A seeded sample of row indices, so scatter plots of large tables stay small enough to embed in a
 * notebook while the same call always draws the same points.
 * Algorithm: Floyd's sampling without replacement (Bentley & Floyd 1987, "Programming pearls: a sample
 * of brilliance", Communications of the ACM 30(9):754–757).
 */
import { createRng } from '../util/rng.js';

/**
 * Up to `limit` distinct indices from `0..n-1`, in increasing order; all of them when `n <= limit`.
 *
 * @param n     Number of rows.
 * @param limit Most indices to return.
 * @param seed  Seed of the generator. __Default:__ 1.
 * @example
 * sampleIndices(100_000, 4000); // 4000 sorted indices, the same on every call
 */
export function sampleIndices(n: number, limit: number, seed = 1): Int32Array {
  if (n <= limit) return Int32Array.from({ length: n }, (_, i) => i);
  const rng = createRng(seed);
  const chosen = new Set<number>();
  for (let j = n - limit; j < n; j++) {
    const t = rng.int(j + 1);
    chosen.add(chosen.has(t) ? j : t);
  }
  return Int32Array.from(chosen).sort();
}
