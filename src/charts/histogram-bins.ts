/**
 * Histogram bins for a numeric sample, computed here so a chart of 100,000 residuals embeds ~40 counts
 * rather than 100,000 values. Bin width: the Freedman–Diaconis rule, 2·IQR·n^(−1/3) (Freedman &
 * Diaconis 1981, "On the histogram as a density estimator: L2 theory", Z. Wahrscheinlichkeitstheorie
 * 57:453–476), falling back to Sturges' ⌈log2 n⌉ + 1 bins (Sturges 1926, JASA 21:65–66) when the IQR is 0;
 * then rounded up to a 1, 2, 2.5 or 5 × 10^k step (common practice) and kept within 5..60 bins.
 */

/** One histogram bin: [start, end) except the last, which includes its end. */
export interface HistogramBin {
  readonly start: number;
  readonly end: number;
  readonly count: number;
}

/** The smallest "nice" step (1, 2, 2.5 or 5 × 10^k) that is ≥ `raw`. */
export function niceStep(raw: number): number {
  const power = 10 ** Math.floor(Math.log10(raw));
  for (const m of [1, 2, 2.5, 5, 10]) if (m * power >= raw * (1 - 1e-12)) return m * power;
  return 10 * power;
}

function quantileSorted(sorted: Float64Array, p: number): number {
  const h = (sorted.length - 1) * p;
  const lo = Math.floor(h);
  return sorted[lo] + (h - lo) * ((sorted[Math.min(lo + 1, sorted.length - 1)] ?? sorted[lo]) - sorted[lo]);
}

/**
 * Bin finite `values` into nice-width bins.
 *
 * @example
 * binValues(Float64Array.of(1, 2, 2, 3, 7)); // bins of width 1 or 2 from 1 to 7
 */
export function binValues(values: ArrayLike<number>): HistogramBin[] {
  const sorted = Float64Array.from(values).sort();
  const n = sorted.length;
  if (n === 0) return [];
  const lo = sorted[0], hi = sorted[n - 1];
  if (lo === hi) return [{ start: lo - 0.5, end: hi + 0.5, count: n }];
  const iqr = quantileSorted(sorted, 0.75) - quantileSorted(sorted, 0.25);
  let width = iqr > 0 ? 2 * iqr * Math.cbrt(1 / n) : (hi - lo) / (Math.ceil(Math.log2(n)) + 1);
  width = Math.min(Math.max(width, (hi - lo) / 60), (hi - lo) / 5);
  width = niceStep(width);
  const start = Math.floor(lo / width) * width;
  const nBins = Math.max(1, Math.ceil((hi - start) / width + 1e-9));
  const counts = new Array<number>(nBins).fill(0);
  for (const v of sorted) counts[Math.min(nBins - 1, Math.floor((v - start) / width))]++;
  return counts.map((count, i) => ({ start: start + i * width, end: start + (i + 1) * width, count }));
}
