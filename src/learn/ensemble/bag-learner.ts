/**
 * Bagging of any learner given as a fit/predict pair (Breiman, L. (1996) "Bagging predictors", Machine
 * Learning 24:123–140). Member t is fitted on the rows of bootstrap sample t (drawn from
 * `derive(seed, t, 0)`), each with weight count × sample weight — so the learner must honour weights.
 * Members are combined by mean (numbers), mean probabilities ('average') or majority vote ('vote').
 */
import type { Dataset, Frame } from '../../table/frame.js';
import { takeDataset, takeRows } from '../../table/dataset.js';
import { derive } from '../../util/rng.js';
import type { Predictions } from '../model.js';
import { drawBootstrapCounts } from './bootstrap.js';
import { OobTally, type OobPoint } from './oob.js';
import { checkKnown, oneOf, wholeNumber } from './options.js';
import { prepareData } from './prepare.js';
import { argmaxAt } from './tree-sum.js';

/** A learner as a pair of functions. */
export interface Learner<M> {
  /** Fit on a dataset (weights = bootstrap counts × sample weights). */
  fit(data: Dataset): M;
  /** Predict a frame with a fitted model. */
  predict(model: M, frame: Frame): Predictions;
}

export interface BagLearnerOptions {
  /** Number of members. __Default:__ 25. */
  readonly size?: number;
  /** Seed of the bootstrap samples. __Default:__ 0. */
  readonly seed?: number;
  /** Classes: mean probabilities or majority vote. __Default:__ 'average'. */
  readonly combine?: 'average' | 'vote';
}

/** Bagged members of any learner, with their out-of-bag curve and a combined predictor. */
export interface BaggedLearner<M> {
  readonly members: readonly M[];
  readonly oobCurve: readonly OobPoint[];
  readonly combine: 'average' | 'vote';
  predict(frame: Frame): Predictions;
}

/**
 * Bag `learner` on `data`.
 * @example
 * const bag = bagLearner(data, { fit: (d) => fitTree(d, { depthLimit: 4 }), predict: predictTree }, { size: 30 });
 * bag.predict(testFrame).value;
 */
export function bagLearner<M>(data: Dataset, learner: Learner<M>, options: BagLearnerOptions = {}): BaggedLearner<M> {
  checkKnown(options, ['size', 'seed', 'combine']);
  const size = wholeNumber('size', options.size ?? 25, 1);
  const seed = wholeNumber('seed', options.seed ?? 0, -(2 ** 31));
  const combine = oneOf('combine', options.combine ?? 'average', ['average', 'vote']);
  const prep = prepareData(data, 'bag a learner');
  const t = prep.data.target;
  const oob = new OobTally(prep.n, prep.nClasses, t.kind === 'class' ? t.codes : t.values, prep.weights, combine === 'vote');
  const members: M[] = [];
  for (let m = 0; m < size; m++) {
    const counts = drawBootstrapCounts(prep.n, derive(seed, m, 0));
    const rows: number[] = [], out: number[] = [];
    for (let i = 0; i < prep.n; i++) (counts[i] > 0 ? rows : out).push(i);
    const inBag = takeDataset(prep.data, rows);
    const w = new Float64Array(rows.length);
    rows.forEach((r, j) => { w[j] = counts[r] * prep.weights[r]; });
    const model = learner.fit({ ...inBag, weights: w });
    members.push(model);
    const pred = new Float64Array(prep.n), proba = new Float64Array(prep.n * prep.nClasses);
    if (out.length > 0) {
      const p = learner.predict(model, takeRows(prep.data.features, out));
      out.forEach((r, j) => {
        pred[r] = p.value[j];
        for (let k = 0; k < prep.nClasses; k++) proba[r * prep.nClasses + k] = p.proba[j * prep.nClasses + k];
      });
    }
    oob.addPredictions(pred, prep.nClasses > 0 ? proba : null, counts);
  }
  return {
    members,
    oobCurve: oob.curve,
    combine,
    predict: (frame) => combineMembers(members.map((mm) => learner.predict(mm, frame)), combine, frame.nRows),
  };
}

function combineMembers(preds: readonly Predictions[], combine: 'average' | 'vote', n: number): Predictions {
  const first = preds[0];
  const m = preds.length;
  if (first.task === 'regression') {
    const value = new Float64Array(n);
    for (const p of preds) for (let i = 0; i < n; i++) value[i] += p.value[i];
    for (let i = 0; i < n; i++) value[i] /= m;
    return { task: 'regression', n, value, proba: new Float64Array(0), classes: [] };
  }
  const K = first.classes.length;
  const proba = new Float64Array(n * K);
  for (const p of preds) {
    if (combine === 'vote') for (let i = 0; i < n; i++) proba[i * K + p.value[i]] += 1;
    else for (let j = 0; j < n * K; j++) proba[j] += p.proba[j];
  }
  for (let j = 0; j < n * K; j++) proba[j] /= m;
  const value = new Float64Array(n);
  for (let i = 0; i < n; i++) value[i] = argmaxAt(proba, i * K, K);
  return { task: 'classification', n, value, proba, classes: first.classes };
}
