/**
 * Stacking (Wolpert, D. (1992) "Stacked generalization", Neural Networks 5:241–259; Breiman, L. (1996)
 * "Stacked regressions", Machine Learning 24:49–64): each member's k-fold out-of-fold predictions become
 * the inputs of a combiner — multinomial logistic regression with a small ridge for classes, ridge least
 * squares for numbers (optionally with numeric features passed through). The members are then refitted on
 * every row; prediction feeds their outputs to the combiner.
 */
import { errors } from '../../errors.js';
import { takeDataset, takeRows } from '../../table/dataset.js';
import type { Dataset } from '../../table/frame.js';
import { createRng } from '../../util/rng.js';
import type { ModelHeader } from '../model.js';
import { predictFrame } from '../predict.js';
import { assignFolds } from './folds.js';
import { ensembleHeader } from './header.js';
import { fitLogisticCombiner } from './logistic-combiner.js';
import type { StackModel } from './models.js';
import { checkKnown, numberIn, wholeNumber } from './options.js';
import { prepareData } from './prepare.js';
import { fitRidgeCombiner } from './ridge-combiner.js';
import { memberWidth, writeMemberColumns, writePassThrough } from './stack-inputs.js';

/** A member learner: a name and a function fitting any coppice model. */
export interface StackLearner {
  readonly name: string;
  fit(data: Dataset): ModelHeader;
}

export interface StackOptions {
  /** Folds for the out-of-fold predictions (stratified for classes). __Default:__ 5. */
  readonly folds?: number;
  /** Seed of the fold assignment. __Default:__ 0. */
  readonly seed?: number;
  /** Numeric features given to the combiner as they are. __Default:__ [] (none). */
  readonly passThrough?: readonly string[];
  /** Ridge penalty of the combiner (on standardised inputs). __Default:__ 1e-3. */
  readonly ridge?: number;
}

/**
 * Fit a stack of `learners` on `data`.
 * @example
 * const stack = fitStack(data, [
 *   { name: 'forest', fit: (d) => fitForest(d, { size: 100 }) },
 *   { name: 'boosted', fit: (d) => fitBoosting(d, { rounds: 200 }) },
 * ], { folds: 5 });
 * predictFrame(stack, testFrame);
 */
export function fitStack(data: Dataset, learners: readonly StackLearner[], options: StackOptions = {}): StackModel {
  checkKnown(options, ['folds', 'seed', 'passThrough', 'ridge']);
  if (learners.length === 0) throw errors.badOption('learners', [], 'at least one learner');
  const names = learners.map((l) => l.name);
  if (new Set(names).size !== names.length) throw errors.badOption('learners', names, 'distinct names');
  const k = wholeNumber('folds', options.folds ?? 5, 2);
  const seed = wholeNumber('seed', options.seed ?? 0, -(2 ** 31));
  const ridge = numberIn('ridge', options.ridge ?? 1e-3, 0, Number.MAX_VALUE);
  const passThrough = [...(options.passThrough ?? [])];
  const prep = prepareData(data, 'fit a stack');
  const t = prep.data.target, n = prep.n;
  const K = t.kind === 'class' ? t.classes.length : 0;
  const width = K > 0 ? K : 1;
  const p = learners.length * width + passThrough.length;
  const X = new Float64Array(n * p);
  const fold = assignFolds(n, k, createRng(seed), t.kind === 'class' ? t.codes : null);
  for (let f = 0; f < k; f++) {
    const test: number[] = [], train: number[] = [];
    for (let i = 0; i < n; i++) (fold[i] === f ? test : train).push(i);
    const trainData = takeDataset(prep.data, train), testFrame = takeRows(prep.data.features, test);
    learners.forEach((l, j) => {
      const pred = predictFrame(l.fit(trainData), testFrame);
      if (memberWidth(pred) !== width) throw errors.badOption('learners', l.name, `a learner for this ${t.kind} target`);
      writeMemberColumns(X, p, j * width, pred, width, test);
    });
  }
  writePassThrough(X, p, learners.length * width, prep.data.features, passThrough);
  const memberScores = learners.map((l, j) => ({ name: l.name, score: outOfFoldScore(X, p, j * width, width, prep) }));
  const combiner = t.kind === 'class'
    ? fitLogisticCombiner(X, n, p, t.codes, K, prep.weights, ridge)
    : fitRidgeCombiner(X, n, p, t.values, prep.weights, ridge);
  const members = learners.map((l) => ({ name: l.name, model: l.fit(prep.data) }));
  return {
    ...ensembleHeader('stack', prep.data, { folds: k, passThrough, ridge, learners: names }, seed),
    kind: 'stack', members, combiner, passThrough, folds: k, memberScores,
  };
}

function outOfFoldScore(X: Float64Array, p: number, col: number, width: number, prep: ReturnType<typeof prepareData>): number {
  const t = prep.data.target, w = prep.weights;
  let s = 0, sw = 0;
  for (let i = 0; i < prep.n; i++) {
    sw += w[i];
    if (t.kind === 'number') { s += w[i] * (X[i * p + col] - t.values[i]) ** 2; continue; }
    let best = 0;
    for (let c = 1; c < width; c++) if (X[i * p + col + c] > X[i * p + col + best]) best = c;
    if (best === t.codes[i]) s += w[i];
  }
  return s / sw;
}
