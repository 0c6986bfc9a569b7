/**
 * Shared state of one exact-grower run: the training rows (positive weight only), the response as
 * per-row channels, the numeric features presorted once, and scratch buffers reused by every node.
 *
 * Every node owns the same contiguous range `[start, end)` of `base` and of each `sorted[f]`; a split
 * partitions that range stably in every array (see partition.ts), so sorted order survives to the leaves.
 */
import { errors } from '../../errors.js';
import type { GrowSettings, GrowTask } from '../grow-task.js';
import { ENTROPY, GINI, VARIANCE, type ImpurityCode } from './impurity.js';
import { presortRows } from './presort.js';

export interface GrowContext {
  readonly nFeatures: number;
  readonly w: Float64Array;
  readonly measure: ImpurityCode;
  readonly gainRatio: boolean;
  /** Channels per node: number of classes, or 2 (weight, centred sum) for values. */
  readonly nCh: number;
  /** Class codes (class response) or null. */
  readonly classes: Int32Array | null;
  /** Responses (value response) or null. */
  readonly y: Float64Array | null;
  /** Responses centred on the current node's mean (value response), indexed by row. */
  readonly yc: Float64Array;
  readonly leafRule: 'mean' | 'median' | 'proba';
  readonly numeric: readonly (Float64Array | null)[];
  readonly cats: readonly (Int32Array | null)[];
  readonly nCats: readonly number[];
  readonly names: readonly string[];
  readonly sorted: readonly (Int32Array | null)[];
  readonly base: Int32Array;
  readonly scratch: Int32Array;
  /** Child slot of each row during a partition. */
  readonly slot: Int32Array;
  readonly settings: GrowSettings;
  /** Scratch channels reused by the numeric scans (length nCh). */
  readonly scanTotal: Float64Array;
  readonly scanLeft: Float64Array;
}

/** Add row `r` to the channels at `acc[off ..]`. */
export function addRow(ctx: GrowContext, acc: Float64Array, off: number, r: number): void {
  const cls = ctx.classes;
  if (cls !== null) acc[off + cls[r]] += ctx.w[r];
  else { acc[off] += ctx.w[r]; acc[off + 1] += ctx.w[r] * ctx.yc[r]; }
}

/** Validate a task and build the context: rows with positive weight, presorted numeric features. */
export function createGrowContext(task: GrowTask): GrowContext {
  const { frame, weights, response, settings } = task;
  const n = frame.nRows;
  if (weights.length !== n) throw errors.badOption('weights', `length ${weights.length}`, `length ${n} (one per row)`);
  let nPos = 0;
  for (let i = 0; i < n; i++) {
    const wi = weights[i];
    if (!(wi >= 0) || wi === Infinity) throw errors.badValue('weights', i, wi, 'a finite non-negative weight');
    if (wi > 0) nPos++;
  }
  if (nPos === 0) throw errors.emptyData('grow a tree (no row has a positive weight)');
  const base = new Int32Array(nPos);
  for (let i = 0, j = 0; i < n; i++) if (weights[i] > 0) base[j++] = i;

  let classes: Int32Array | null = null, y: Float64Array | null = null, nCh = 2;
  let measure: ImpurityCode = VARIANCE;
  let leafRule: GrowContext['leafRule'] = 'mean';
  if (response.kind === 'class') {
    classes = response.codes; nCh = response.nClasses; leafRule = 'proba';
    measure = response.criterion === 'gini' ? GINI : ENTROPY;
    if (classes.length !== n) throw errors.badOption('response.codes', `length ${classes.length}`, `length ${n}`);
    if (!(nCh >= 1)) throw errors.badOption('response.nClasses', nCh, 'at least 1');
    for (const r of base) {
      const c = classes[r];
      if (!(c >= 0 && c < nCh)) throw errors.badValue('target', r, c, `a class code in 0..${nCh - 1}`);
    }
  } else {
    y = response.values; leafRule = response.leaf;
    if (y.length !== n) throw errors.badOption('response.values', `length ${y.length}`, `length ${n}`);
    for (const r of base) {
      if (!Number.isFinite(y[r])) throw errors.badValue('target', r, y[r], 'a finite number');
    }
  }
  const numeric: (Float64Array | null)[] = [];
  const cats: (Int32Array | null)[] = [];
  const nCats: number[] = [];
  const sorted: (Int32Array | null)[] = [];
  for (const col of frame.columns) {
    if (col.kind === 'categorical') {
      numeric.push(null); cats.push(col.codes); sorted.push(null);
      let k = col.categories.length;
      for (const r of base) if (col.codes[r] >= k) k = col.codes[r] + 1;
      nCats.push(k);
    } else {
      numeric.push(col.values); cats.push(null); nCats.push(0);
      sorted.push(presortRows(col.values, base, col.name));
    }
  }
  return {
    nFeatures: frame.columns.length,
    w: weights, measure, gainRatio: response.kind === 'class' && response.criterion === 'gainRatio',
    nCh, classes, y, yc: new Float64Array(n), leafRule,
    numeric, cats, nCats, names: frame.columns.map((c) => c.name), sorted, base,
    scratch: new Int32Array(nPos), slot: new Int32Array(n), settings,
    scanTotal: new Float64Array(nCh), scanLeft: new Float64Array(nCh),
  };
}
