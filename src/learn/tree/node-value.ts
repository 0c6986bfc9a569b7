/**
 * What a node predicts as a leaf: class probabilities (weighted class shares), the weighted mean, or
 * the weighted median of the responses reaching it.
 */
import type { GrowContext } from './grow-context.js';

/**
 * Weighted median: sort by value; the first value whose cumulative weight reaches half the total, or
 * the average of it and the next value when the cumulative weight equals exactly half (so unit
 * weights give the usual median of an even-sized sample).
 * @example
 * weightedMedian(Float64Array.of(1, 2, 3, 4), Float64Array.of(1, 1, 1, 1)); // 2.5
 */
export function weightedMedian(values: Float64Array, weights: Float64Array): number {
  const n = values.length;
  const order = new Int32Array(n);
  for (let i = 0; i < n; i++) order[i] = i;
  order.sort((a, b) => values[a] - values[b] || a - b);
  let total = 0;
  for (let i = 0; i < n; i++) total += weights[i];
  const half = total / 2;
  let cum = 0;
  for (let i = 0; i < n; i++) {
    cum += weights[order[i]];
    if (cum > half * (1 + 1e-12)) return values[order[i]];
    if (cum >= half * (1 - 1e-12)) {
      for (let j = i + 1; j < n; j++) if (weights[order[j]] > 0) return (values[order[i]] + values[order[j]]) / 2;
      return values[order[i]];
    }
  }
  return n > 0 ? values[order[n - 1]] : NaN;
}

/** Prediction of the node owning `base[start, end)`; `mean` is the node's weighted mean (values). */
export function nodeValue(ctx: GrowContext, start: number, end: number, stats: Float64Array, mean: number): Float64Array {
  if (ctx.leafRule === 'proba') {
    const out = new Float64Array(ctx.nCh);
    let w = 0;
    for (let k = 0; k < ctx.nCh; k++) w += stats[k];
    for (let k = 0; k < ctx.nCh; k++) out[k] = stats[k] / w;
    return out;
  }
  if (ctx.leafRule === 'mean') return Float64Array.of(mean);
  const y = ctx.y as Float64Array;
  const vals = new Float64Array(end - start), ws = new Float64Array(end - start);
  for (let i = start; i < end; i++) { vals[i - start] = y[ctx.base[i]]; ws[i - start] = ctx.w[ctx.base[i]]; }
  return Float64Array.of(weightedMedian(vals, ws));
}
