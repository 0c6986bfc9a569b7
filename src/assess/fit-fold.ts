/**
 * The shared step of cross-validation and search: fit on a fold's training rows, predict its test rows,
 * score them. Also resolves a split setting (a plan or ready-made folds) into folds.
 */
import { errors } from '../errors.js';
import type { Predictions } from '../learn/model.js';
import { takeDataset } from '../table/dataset.js';
import type { Dataset, Frame } from '../table/frame.js';
import { derive } from '../util/rng.js';
import { findMetric, scoreWhereDefined } from './metrics/registry.js';
import type { Fold, SplitPlan } from './splits/fold.js';
import { splitRows } from './splits/plan.js';
import { takeTarget } from './take-rows.js';

/** What a fit function learns about the fold it is fitting. */
export interface FitContext {
  /** Fold number (the outer fold of a nested split). */
  readonly fold: number;
  /** Inner fold number for nested splits, else 0. */
  readonly inner: number;
  /** A seed for this fold's learner, derived from the run seed and the fold (use it for the model's seed). */
  readonly seed: number;
  /** Held-out rows inside the training part (nested splits), for pruning or early stopping; else null. */
  readonly watch: Dataset | null;
}

/** Predict every row of a frame with a fitted model. */
export type PredictFunction<M> = (model: M, frame: Frame) => Predictions;

/** A split setting: a plan for `splitRows`, or folds made already. */
export type SplitSetting = SplitPlan | readonly Fold[];

/** The folds for `data`: stratified 5-fold for a class target, plain 5-fold otherwise, unless given. */
export function resolveFolds(data: Dataset, split: SplitSetting | undefined, seed: number): readonly Fold[] {
  const n = data.features.nRows;
  if (n === 0) throw errors.emptyData('cross-validate');
  if (Array.isArray(split)) {
    const folds = split as readonly Fold[];
    if (folds.length === 0) throw errors.badOption('split', [], 'at least one fold');
    for (const f of folds) {
      for (const part of [f.train, f.test, f.watch ?? new Int32Array(0)]) {
        for (const r of part) if (!(r >= 0 && r < n)) throw errors.badOption('split', `row ${r} in fold ${f.fold}`, `row indices below ${n}`);
      }
      if (f.train.length === 0 || f.test.length === 0) throw errors.badOption('split', `fold ${f.fold}`, 'non-empty train and test rows');
    }
    return folds;
  }
  const plan = (split as SplitPlan | undefined) ?? (data.target.kind === 'class' ? { method: 'stratified', k: 5 } : { method: 'folds', k: 5 });
  return splitRows(data, plan, seed);
}

/** One fitted and scored fold. */
export interface FoldOutcome {
  readonly scores: Record<string, number>;
  readonly fitMs: number;
  readonly predictions: Predictions;
}

/**
 * Fit on `fold.train` (with `fold.watch` in the context), predict `fold.test`, score with `metrics`.
 * A metric undefined on the fold (one class only, e.g. ROC AUC) scores NaN rather than stopping the run.
 */
export function fitAndScoreFold<M>(
  data: Dataset, fold: Fold, seed: number, metrics: readonly string[],
  fit: (train: Dataset, context: FitContext) => M, predict: PredictFunction<M>,
): FoldOutcome {
  const context: FitContext = {
    fold: fold.fold, inner: fold.inner ?? 0, seed: derive(seed, fold.fold, fold.inner ?? 0).nextU32(),
    watch: fold.watch ? takeDataset(data, fold.watch) : null,
  };
  const train = takeDataset(data, fold.train);
  const started = performance.now();
  const model = fit(train, context);
  const fitMs = performance.now() - started;
  const test = takeDataset(data, fold.test);
  const predictions = predict(model, test.features);
  if (predictions.n !== fold.test.length) throw errors.lengthMismatch('predictions', fold.test.length, predictions.n);
  const target = takeTarget(data.target, fold.test);
  const scores: Record<string, number> = {};
  for (const name of metrics) scores[name] = scoreWhereDefined(findMetric(name), target, predictions, test.weights);
  return { scores, fitMs, predictions };
}
