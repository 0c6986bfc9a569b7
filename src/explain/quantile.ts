/**
 * Sample quantiles by linear interpolation between order statistics: Hyndman & Fan (1996) "Sample
 * quantiles in statistical packages", The American Statistician 50(4):361–365, definition 7.
 */

/**
 * Quantile `q` (0..1) of ascending `sorted` values (NaN for none).
 * @example
 * quantileSorted([1, 2, 3, 4], 0.5); // 2.5
 */
export function quantileSorted(sorted: ArrayLike<number>, q: number): number {
  const n = sorted.length;
  if (n === 0) return NaN;
  const h = (n - 1) * q;
  const lo = Math.floor(h), hi = Math.min(lo + 1, n - 1);
  return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
}
