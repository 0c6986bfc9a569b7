/**
 * Row subsampling without replacement for stochastic gradient boosting (Friedman, J. (2002)
 * "Stochastic gradient boosting", Computational Statistics & Data Analysis 38(4):367–378): each round
 * fits its tree on a random fraction of the rows drawn without replacement.
 */
import { errors } from '../../errors.js';
import type { Rng } from '../../util/rng.js';

/**
 * Choose ⌊fraction·n⌋ (at least 1) of `n` rows without replacement; returns a 0/1 mask.
 *
 * @param n number of rows.
 * @param fraction share of rows kept, in (0, 1]. 1 keeps every row (no random draws are made).
 * @param rng seeded generator.
 * @param out buffer of length n to write the mask into (reused across rounds). __Default:__ a new array.
 * @example
 * const keep = drawSubsampleMask(10, 0.5, createRng(3)); // five 1s and five 0s
 */
export function drawSubsampleMask(n: number, fraction: number, rng: Rng, out: Uint8Array | null = null): Uint8Array {
  if (!(fraction > 0 && fraction <= 1)) throw errors.badOption('rowFraction', fraction, 'a number in (0, 1]');
  if (out && out.length !== n) throw errors.badOption('out', `length ${out.length}`, `length ${n}`);
  const mask = out ?? new Uint8Array(n);
  if (fraction === 1) { mask.fill(1); return mask; }
  if (out) mask.fill(0);
  const k = Math.max(1, Math.floor(fraction * n));
  // selection sampling (Knuth, TAOCP vol. 2, Algorithm 3.4.2 S): one pass, exactly k rows
  let chosen = 0;
  for (let i = 0; i < n && chosen < k; i++) {
    if ((n - i) * rng.next() < k - chosen) { mask[i] = 1; chosen++; }
  }
  return mask;
}
