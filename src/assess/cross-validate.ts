import { errors } from '../errors.js';
import type { ModelHeader, Predictions } from '../learn/model.js';
import { predictFrame } from '../learn/predict.js';
import type { Dataset } from '../table/frame.js';
import { fitAndScoreFold, resolveFolds, type FitContext, type PredictFunction, type SplitSetting } from './fit-fold.js';
import { defaultMetrics, findMetric } from './metrics/registry.js';
import { summarizeScores } from './summarize.js';

/** One fold's scores: fold ids, row counts, fit time, then one column per metric. */
export type FoldScoreRow = {
  readonly fold: number; readonly inner: number; readonly trainRows: number; readonly watchRows: number;
  readonly testRows: number; readonly fitMs: number;
} & Readonly<Record<string, number>>;

/** Summary of one metric over folds. */
export interface MetricSummaryRow {
  readonly metric: string;
  readonly higherIsBetter: boolean;
  readonly folds: number;
  readonly mean: number;
  readonly sd: number;
  readonly se: number;
  readonly min: number;
  readonly max: number;
}

export interface CrossValidation {
  /** One row per fold. */
  readonly folds: FoldScoreRow[];
  /** One row per metric: mean, sample sd, se, min, max over folds. */
  readonly summary: MetricSummaryRow[];
  /** Out-of-fold predictions for every row, in row order, when each row was tested exactly once; else null. */
  readonly outOfFold: Predictions | null;
}

export interface CrossValidateOptions<M> {
  /** Split plan or ready-made folds. __Default:__ stratified 5-fold (class target), 5-fold (numbers). */
  readonly split?: SplitSetting;
  /** Seed of the split and of each fold's derived learner seed (`context.seed`). __Default:__ 0. */
  readonly seed?: number;
  /** Metric names from the registry. __Default:__ `defaultMetrics(task)`. */
  readonly metrics?: readonly string[];
  /** Predict a frame with a fitted model. __Default:__ `predictFrame` from the learn layer. */
  readonly predict?: PredictFunction<M>;
  /** Called after each fold: (folds done, total folds, that fold's row). __Default:__ none. */
  readonly onProgress?: (done: number, total: number, info: FoldScoreRow) => void;
}

/**
 * Cross-validate a learner: for each fold, `fit` on the training rows (with any `watch` rows of a nested
 * split passed in the context), predict the test rows, and score them with the chosen metrics (weighted by
 * the data's weights). Returns per-fold rows and a summary. A metric undefined on a fold (ROC AUC where the
 * fold holds one class) is NaN there, and so is its summary. The sd and se describe spread over folds;
 * folds share training rows, so se understates the true uncertainty (Bengio & Grandvalet 2004, "No
 * unbiased estimator of the variance of K-fold cross-validation", JMLR 5:1089–1105).
 *
 * @param data - features, target and weights.
 * @param fit - fits a model on a fold's training rows; `context` carries the fold, a seed and watch rows.
 * @example
 * const cv = crossValidate(churn, (train, ctx) => fitTree(train, { depthLimit: 4, seed: ctx.seed }),
 *   { metrics: ['logLoss', 'rocAuc'], seed: 1 });
 * cv.summary; // [{ metric: 'logLoss', mean: 0.42, sd: 0.03, ... }, ...]
 */
export function crossValidate<M = ModelHeader>(
  data: Dataset, fit: (train: Dataset, context: FitContext) => M, options: CrossValidateOptions<M> = {},
): CrossValidation {
  if (typeof fit !== 'function') throw errors.badOption('fit', typeof fit, 'a function (train, context) => model');
  const seed = options.seed ?? 0;
  const folds = resolveFolds(data, options.split, seed);
  const task = data.target.kind === 'class' ? 'classification' : 'regression';
  const metrics = options.metrics ?? defaultMetrics(task);
  const entries = metrics.map(findMetric);
  const predict = options.predict ?? (predictFrame as unknown as PredictFunction<M>);
  const rows: FoldScoreRow[] = [];
  const n = data.features.nRows;
  const tested = new Int32Array(n);
  const perFold: { rows: Int32Array; predictions: Predictions }[] = [];
  for (const fold of folds) {
    const outcome = fitAndScoreFold(data, fold, seed, metrics, fit, predict);
    const row = {
      fold: fold.fold, inner: fold.inner ?? 0, trainRows: fold.train.length, watchRows: fold.watch?.length ?? 0,
      testRows: fold.test.length, fitMs: outcome.fitMs, ...outcome.scores,
    } as FoldScoreRow;
    rows.push(row);
    for (const r of fold.test) tested[r]++;
    perFold.push({ rows: fold.test, predictions: outcome.predictions });
    options.onProgress?.(rows.length, folds.length, row);
  }
  const summary = entries.map((e) => ({
    metric: e.name, higherIsBetter: e.higherIsBetter, folds: rows.length, ...summarizeScores(rows.map((r) => r[e.name])),
  }));
  return { folds: rows, summary, outOfFold: tested.every((c) => c === 1) ? gatherOutOfFold(perFold, n) : null };
}

/** Put each fold's test predictions back in row order. */
function gatherOutOfFold(perFold: readonly { rows: Int32Array; predictions: Predictions }[], n: number): Predictions {
  const first = perFold[0].predictions;
  const k = first.task === 'classification' ? first.classes.length : 0;
  const value = new Float64Array(n);
  const proba = new Float64Array(k > 0 && first.proba.length > 0 ? n * k : 0);
  for (const { rows, predictions } of perFold) {
    for (let i = 0; i < rows.length; i++) {
      value[rows[i]] = predictions.value[i];
      if (proba.length) proba.set(predictions.proba.subarray(i * k, i * k + k), rows[i] * k);
    }
  }
  return { task: first.task, n, value, proba, classes: first.classes };
}
