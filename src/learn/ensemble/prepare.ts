/**
 * Shared input checks for every ensemble learner: a non-empty dataset, valid sample weights, rows with
 * a missing target dropped (class code -1 or NaN), infinite targets rejected, and at least two class
 * labels for classification.
 */
import { errors } from '../../errors.js';
import { takeDataset } from '../../table/dataset.js';
import type { Dataset } from '../../table/frame.js';

/** A dataset ready for fitting: every row has a target, `weights` has one positive-or-zero entry per row. */
export interface PreparedData {
  readonly data: Dataset;
  readonly weights: Float64Array;
  readonly n: number;
  /** Number of classes (classification), 0 for regression. */
  readonly nClasses: number;
}

/**
 * Validate `data` for an ensemble learner named `what` and drop rows whose target is missing.
 * @example
 * const { data: clean, weights } = prepareData(data, 'fit a forest');
 */
export function prepareData(data: Dataset, what: string): PreparedData {
  const n0 = data.features.nRows;
  if (n0 === 0) throw errors.emptyData(what);
  const t = data.target;
  if (data.weights) {
    if (data.weights.length !== n0) throw errors.badWeights(`${data.weights.length} weights for ${n0} rows`);
    for (let i = 0; i < n0; i++) {
      const w = data.weights[i];
      if (!(w >= 0) || w === Infinity) throw errors.badWeights(`weight ${w} at row ${i}`);
    }
  }
  const keep: number[] = [];
  if (t.kind === 'class') {
    if (t.classes.length < 2) throw errors.oneClass(t.name, t.classes[0] ?? '');
    for (let i = 0; i < n0; i++) {
      const c = t.codes[i];
      if (c >= t.classes.length) throw errors.badValue(t.name, i, c, `a class code below ${t.classes.length}`);
      if (c >= 0) keep.push(i);
    }
  } else {
    for (let i = 0; i < n0; i++) {
      const v = t.values[i];
      if (v === Infinity || v === -Infinity) throw errors.badValue(t.name, i, v, 'a finite number');
      if (v === v) keep.push(i);
    }
  }
  if (keep.length === 0) throw errors.badTarget(t.name, 'every value is missing');
  const clean = keep.length === n0 ? data : takeDataset(data, keep);
  const n = keep.length;
  const weights = clean.weights ? Float64Array.from(clean.weights) : new Float64Array(n).fill(1);
  let total = 0;
  for (let i = 0; i < n; i++) total += weights[i];
  if (!(total > 0)) throw errors.badWeights('they sum to 0');
  return { data: clean, weights, n, nClasses: t.kind === 'class' ? t.classes.length : 0 };
}

/**
 * Multiply sample weights by per-class weights (`classWeights[label]`, 1 for labels not listed).
 * @example
 * applyClassWeights(prep, { yes: 3 }); // rows labelled "yes" count three times
 */
export function applyClassWeights(prep: PreparedData, classWeights: Readonly<Record<string, number>> | undefined): Float64Array {
  const t = prep.data.target;
  if (!classWeights || t.kind !== 'class') return prep.weights;
  const per = t.classes.map((label) => classWeights[label] ?? 1);
  for (const [label, w] of Object.entries(classWeights)) {
    if (!t.classes.includes(label)) throw errors.badOption('classWeights', label, `one of the classes ${t.classes.join(', ')}`);
    if (!(w >= 0) || w === Infinity) throw errors.badOption(`classWeights.${label}`, w, 'a finite number >= 0');
  }
  const out = new Float64Array(prep.n);
  for (let i = 0; i < prep.n; i++) out[i] = prep.weights[i] * per[t.codes[i]];
  return out;
}
