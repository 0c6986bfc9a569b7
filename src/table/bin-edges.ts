/**
 * Bin boundaries for one numeric column.
 *
 * A bin is described by its upper bound: bin b holds the values x with upper[b-1] < x <= upper[b], and the
 * last bound is +Infinity. So "bins 0..b go left" is the same rule as the tree test `x <= upper[b]`, and a
 * histogram split can be written into a tree as a real threshold.
 *
 * - At most `limit` distinct values: one bin per distinct value; bounds are midpoints between neighbouring
 *   distinct values — the candidate thresholds of the exact (sorting) grower, so both growers agree.
 * - More distinct values, up to `exactRows` rows: near-equal-count bins from the sorted column (see
 *   `equalCountCuts`), each bound the midpoint after the last distinct value of its bin.
 * - More rows: the same cut rule over the items of a KLL quantile sketch (bin-sketch.ts); bounds are the
 *   sketch's values themselves.
 */
import { QuantileSketch } from './bin-sketch.js';

/**
 * Midpoint of a < b that lies in [a, b) even for huge or adjacent floats. The same formula as the exact
 * grower's (src/learn/tree/scan-numeric.ts), so both growers write the same thresholds.
 * @example
 * midpoint(1, 2); // 1.5
 */
export function midpoint(a: number, b: number): number {
  const t = a / 2 + b / 2;
  return t >= a && t < b ? t : a;
}

/**
 * Distinct non-NaN values of `values` in ascending order, or null when there are more than `limit`.
 * @example
 * distinctUpTo(Float64Array.of(3, 1, 3), 255); // Float64Array [1, 3]
 */
export function distinctUpTo(values: Float64Array, limit: number): Float64Array | null {
  const seen = new Set<number>();
  for (let i = 0; i < values.length; i++) {
    const x = values[i];
    if (x !== x || seen.has(x)) continue;
    seen.add(x === 0 ? 0 : x); // -0 and 0 are one value
    if (seen.size > limit) return null;
  }
  return Float64Array.from(seen).sort();
}

/**
 * Greedy equal-count cuts: a bin closes after distinct value j when its weight reaches an equal share of
 * the weight not yet binned (remaining weight / bins left), so a heavy value does not starve the rest.
 * Returns the indices j after which a bin closes (at most limit-1 of them).
 * @example
 * equalCountCuts(Float64Array.of(1, 1, 1, 1), 2); // [1]
 */
export function equalCountCuts(weights: Float64Array, limit: number): number[] {
  let total = 0;
  for (let j = 0; j < weights.length; j++) total += weights[j];
  const cuts: number[] = [];
  let acc = 0, target = total / limit;
  for (let j = 0; j < weights.length - 1 && cuts.length < limit - 1; j++) {
    acc += weights[j];
    if (acc >= target) {
      cuts.push(j);
      target = acc + (total - acc) / (limit - cuts.length);
    }
  }
  return cuts;
}

/**
 * Distinct non-NaN values (ascending) with their counts, or null when there are more than `cap` of them.
 * Cheaper than sorting the column when values repeat (rounded measurements, counts, dates).
 * @example
 * distinctCounts(Float64Array.of(2, 1, 2), 10); // { values: [1, 2], counts: [1, 2] }
 */
export function distinctCounts(values: Float64Array, cap: number): { values: Float64Array; counts: Float64Array } | null {
  // open addressing on the value's bits (a Map costs several times more per row on million-row columns)
  const one = new Float64Array(1), half = new Uint32Array(one.buffer);
  let size = 1024, used = 0;
  let keys = new Float64Array(size), counts = new Float64Array(size);
  const slotOf = (x: number, mask: number): number => {
    one[0] = x;
    return (Math.imul(half[0] ^ Math.imul(half[1], 0x9e3779b1), 0x85ebca6b) >>> 15) & mask;
  };
  for (let i = 0; i < values.length; i++) {
    let x = values[i];
    if (x !== x) continue;
    if (x === 0) x = 0; // -0 and 0 are one value
    const mask = size - 1;
    let s = slotOf(x, mask);
    while (counts[s] !== 0 && keys[s] !== x) s = (s + 1) & mask;
    if (counts[s] !== 0) { counts[s]++; continue; }
    if (used >= cap) return null;
    keys[s] = x; counts[s] = 1; used++;
    if (2 * used > size) {
      const oldKeys = keys, oldCounts = counts;
      size *= 2;
      keys = new Float64Array(size); counts = new Float64Array(size);
      for (let j = 0; j < oldKeys.length; j++) {
        if (oldCounts[j] === 0) continue;
        let q = slotOf(oldKeys[j], size - 1);
        while (counts[q] !== 0) q = (q + 1) & (size - 1);
        keys[q] = oldKeys[j]; counts[q] = oldCounts[j];
      }
    }
  }
  const vals = new Float64Array(used);
  let k = 0;
  for (let j = 0; j < size; j++) if (counts[j] !== 0) vals[k++] = keys[j];
  vals.sort();
  const outCounts = new Float64Array(used);
  for (let j = 0; j < used; j++) {
    let s = slotOf(vals[j], size - 1);
    while (keys[s] !== vals[j] || counts[s] === 0) s = (s + 1) & (size - 1);
    outCounts[j] = counts[s];
  }
  return { values: vals, counts: outCounts };
}

function boundsFromCounts(vals: Float64Array, counts: Float64Array, limit: number): Float64Array {
  const cuts = equalCountCuts(counts, limit);
  const upper = new Float64Array(cuts.length + 1);
  cuts.forEach((j, b) => { upper[b] = midpoint(vals[j], vals[j + 1]); });
  upper[cuts.length] = Infinity;
  return upper;
}

function boundsFromSorted(values: Float64Array, limit: number): Float64Array {
  // run-length encode the sorted column
  const vals: number[] = [], counts: number[] = [];
  for (let i = 0; i < values.length; i++) {
    const x = values[i];
    if (vals.length && vals[vals.length - 1] === x) counts[counts.length - 1]++;
    else { vals.push(x); counts.push(1); }
  }
  const cuts = equalCountCuts(Float64Array.from(counts), limit);
  const upper = new Float64Array(cuts.length + 1);
  cuts.forEach((j, b) => { upper[b] = midpoint(vals[j], vals[j + 1]); });
  upper[cuts.length] = Infinity;
  return upper;
}

function boundsFromSketch(sketch: QuantileSketch, limit: number): Float64Array {
  const { values, weights } = sketch.items();
  const vals: number[] = [], w: number[] = [];
  for (let i = 0; i < values.length; i++) {
    if (vals.length && vals[vals.length - 1] === values[i]) w[w.length - 1] += weights[i];
    else { vals.push(values[i]); w.push(weights[i]); }
  }
  const cuts = equalCountCuts(Float64Array.from(w), limit);
  const upper = new Float64Array(cuts.length + 1);
  cuts.forEach((j, b) => { upper[b] = vals[j]; });
  upper[cuts.length] = Infinity;
  return upper;
}

/**
 * Upper bounds of one bin per distinct value (midpoints), last = +Infinity.
 * @example
 * boundsFromDistinct(Float64Array.of(1, 2)); // Float64Array [1.5, Infinity]
 */
export function boundsFromDistinct(distinct: Float64Array): Float64Array {
  const n = Math.max(distinct.length, 1);
  const upper = new Float64Array(n);
  for (let j = 0; j + 1 < distinct.length; j++) upper[j] = midpoint(distinct[j], distinct[j + 1]);
  upper[n - 1] = Infinity;
  return upper;
}

/** Up to this many distinct values, a large column is counted in a hash map instead of sorted (same bins). */
const DISTINCT_CAP = 1 << 16;

/** Options of `numericBounds`. */
export interface BoundsOptions {
  /** Most bins (not counting the missing bin), 2..255. */
  readonly limit: number;
  /** Columns with more rows than this use a quantile sketch instead of a full sort. */
  readonly exactRows: number;
  /** Accuracy parameter of the sketch. */
  readonly sketchK: number;
}

/** Bins of a numeric column: upper bounds, and the one value of each bin when bins are distinct values. */
export interface NumericBins {
  readonly upper: Float64Array;
  /** The single distinct value of each bin, or null when some bin holds a range of values. */
  readonly binValues: Float64Array | null;
}

/**
 * Bins of a numeric column (NaN = missing, ignored). An all-missing column gets a single bin.
 * @example
 * numericBins(Float64Array.of(1, 2, 2, 5), { limit: 255, exactRows: 1e6, sketchK: 800 });
 * // { upper: [1.5, 3.5, Infinity], binValues: [1, 2, 5] }
 */
export function numericBins(values: Float64Array, opts: BoundsOptions): NumericBins {
  const distinct = distinctUpTo(values, opts.limit);
  if (distinct) return { upper: boundsFromDistinct(distinct), binValues: distinct.length ? distinct : null };
  return { upper: numericBounds(values, opts), binValues: null };
}

/**
 * Upper bounds of the bins of a numeric column (NaN = missing, ignored); length = number of bins.
 * @example
 * numericBounds(Float64Array.of(1, 2, 2, 5), { limit: 255, exactRows: 1e6, sketchK: 800 });
 * // Float64Array [1.5, 3.5, Infinity]
 */
export function numericBounds(values: Float64Array, opts: BoundsOptions): Float64Array {
  const distinct = distinctUpTo(values, opts.limit);
  if (distinct) return boundsFromDistinct(distinct);
  if (values.length > 4 * DISTINCT_CAP) {
    const dc = distinctCounts(values, DISTINCT_CAP);
    if (dc) return boundsFromCounts(dc.values, dc.counts, opts.limit);
  }
  let present = 0;
  for (let i = 0; i < values.length; i++) if (values[i] === values[i]) present++;
  if (present <= opts.exactRows) {
    const sorted = new Float64Array(present);
    let j = 0;
    for (let i = 0; i < values.length; i++) if (values[i] === values[i]) sorted[j++] = values[i];
    return boundsFromSorted(sorted.sort(), opts.limit);
  }
  const sketch = new QuantileSketch(opts.sketchK);
  sketch.updateAll(values);
  return boundsFromSketch(sketch, opts.limit);
}

/**
 * Bin bounds from a sketch built elsewhere (e.g. merged from chunks), with the same cut rule; `distinct`
 * (when known and within the limit) gives one bin per value instead.
 * @example
 * sketchBounds(sketch, null, 255);
 */
export function sketchBounds(sketch: QuantileSketch, distinct: Float64Array | null, limit: number): Float64Array {
  if (distinct && distinct.length <= limit) return boundsFromDistinct(distinct);
  return boundsFromSketch(sketch, limit);
}
