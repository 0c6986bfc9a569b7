/**
 * Features to try at one node: all eligible features, or `k` of them drawn without replacement by a
 * partial Fisher–Yates shuffle (Durstenfeld 1964) for random forests, returned in ascending order so
 * ties still break toward the lower feature index.
 */
import type { Rng } from '../../util/rng.js';

export function sampleFeatures(eligible: readonly number[], k: number, rng: Rng): number[] {
  if (!(k > 0) || k >= eligible.length) return eligible.slice();
  const a = eligible.slice();
  for (let i = 0; i < k; i++) {
    const j = i + rng.int(a.length - i);
    const t = a[i]; a[i] = a[j]; a[j] = t;
  }
  return a.slice(0, k).sort((x, y) => x - y);
}
