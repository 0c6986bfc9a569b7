/**
 * Checks a dataset before a tree is fitted and turns it into grower inputs: per-row weights where rows
 * with a missing target get weight 0 (left out), and the response.
 */
import { errors } from '../../errors.js';
import type { Dataset } from '../../table/frame.js';

export interface TrainingRows {
  readonly weights: Float64Array;
  readonly used: number;
  readonly dropped: number;
}

/** Validate features, target and weights of `data`; rows with a missing target get weight 0. */
export function trainingRowsOf(data: Dataset, what: string): TrainingRows {
  const frame = data.features;
  const n = frame.nRows;
  if (n === 0) throw errors.emptyData(what);
  const t = data.target;
  const tLen = t.kind === 'class' ? t.codes.length : t.values.length;
  if (tLen !== n) throw errors.badTarget(t.name, `has ${tLen} values for ${n} rows`);
  if (data.weights && data.weights.length !== n) throw errors.badOption('weights', `length ${data.weights.length}`, `length ${n}`);
  for (const col of frame.columns) {
    if (col.kind === 'categorical') {
      if (col.codes.length !== n) throw errors.badValue(col.name, 0, `${col.codes.length} values`, `${n} values`);
      const k = col.categories.length;
      for (let i = 0; i < n; i++) {
        const c = col.codes[i];
        if (!(c >= -1 && c < k) || !Number.isInteger(c)) throw errors.badValue(col.name, i, c, `a category code in -1..${k - 1}`);
      }
    } else {
      if (col.values.length !== n) throw errors.badValue(col.name, 0, `${col.values.length} values`, `${n} values`);
      for (let i = 0; i < n; i++) {
        const v = col.values[i];
        if (v === Infinity || v === -Infinity) throw errors.badValue(col.name, i, v, 'a finite number (NaN for missing)');
      }
    }
  }
  const weights = new Float64Array(n);
  let used = 0, dropped = 0;
  for (let i = 0; i < n; i++) {
    const w = data.weights ? data.weights[i] : 1;
    if (!(w >= 0) || w === Infinity) throw errors.badValue('weights', i, w, 'a finite weight >= 0');
    let missing: boolean;
    if (t.kind === 'class') {
      const c = t.codes[i];
      if (!(c >= -1 && c < t.classes.length)) throw errors.badValue(t.name, i, c, `a class code in -1..${t.classes.length - 1}`);
      missing = c < 0;
    } else {
      const v = t.values[i];
      if (v === Infinity || v === -Infinity) throw errors.badValue(t.name, i, v, 'a finite number (NaN for missing)');
      missing = v !== v;
    }
    if (missing) { dropped++; continue; }
    weights[i] = w;
    if (w > 0) used++;
  }
  if (used === 0) throw errors.emptyData(`${what} (no row has a known target and a positive weight)`);
  return { weights, used, dropped };
}
