/**
 * Weighted quantiles: the smallest value v with (weight of values <= v) >= tau · (total weight) — the
 * lower weighted quantile, which minimises the weighted pinball loss (Koenker & Bassett 1978,
 * "Regression quantiles", Econometrica 46(1):33–50). tau = 0.5 gives the lower weighted median.
 * With unit weights (the common case) it is an order statistic, found by selection (select-kth.ts).
 */
import { selectKth } from './select-kth.js';

/**
 * Weighted tau-quantile of `values[rows[start..end)]` with weights `weights[rows[...]]`; rows of weight 0
 * are ignored. Returns NaN when no row has positive weight. `rows` is not modified.
 * @example
 * weightedQuantile(new Float64Array([3, 1, 2]), new Float64Array([1, 1, 1]), Int32Array.of(0, 1, 2), 0, 3, 0.5); // 2
 */
export function weightedQuantile(
  values: Float64Array, weights: Float64Array, rows: Int32Array, start: number, end: number, tau: number,
): number {
  const m = end - start;
  const fast = unitQuantile(values, weights, rows, start, end, tau);
  if (fast !== null) return fast;
  const pick: number[] = [];
  let total = 0;
  for (let j = 0; j < m; j++) {
    const i = rows[start + j];
    if (weights[i] > 0) { pick.push(i); total += weights[i]; }
  }
  if (pick.length === 0) return NaN;
  pick.sort((a, b) => values[a] - values[b] || a - b);
  const goal = tau * total;
  let acc = 0;
  for (const i of pick) {
    acc += weights[i];
    if (acc >= goal * (1 - 1e-12)) return values[i];
  }
  return values[pick[pick.length - 1]];
}

let scratch = new Float64Array(0);

/**
 * When every row has weight 0 or 1, the rule above picks the j-th smallest value of the c rows of weight
 * 1, j = max(1, ⌈τ·c·(1 − 1e−12)⌉) capped at c (the running weight is then an exact count): an order
 * statistic, found by selection instead of a sort. Returns null when some weight is not 0 or 1, or no
 * row has weight 1 (the general path handles both).
 */
function unitQuantile(values: Float64Array, weights: Float64Array, rows: Int32Array, start: number, end: number, tau: number): number | null {
  if (scratch.length < end - start) scratch = new Float64Array(end - start);
  let c = 0;
  for (let j = start; j < end; j++) {
    const i = rows[j], wi = weights[i];
    if (wi === 1) scratch[c++] = values[i];
    else if (wi !== 0) return null;
  }
  if (c === 0) return null;
  const k = Math.min(c, Math.max(1, Math.ceil(tau * c * (1 - 1e-12))));
  return selectKth(scratch, c, k);
}

/** All rows 0..n-1, for a quantile over a whole array. */
export function allRows(n: number): Int32Array {
  const rows = new Int32Array(n);
  for (let i = 0; i < n; i++) rows[i] = i;
  return rows;
}
