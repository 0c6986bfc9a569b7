/**
 * Metrics by name, so cross-validation, search and segment breakdowns can take `'logLoss'` or `'rmse'`.
 * Each entry scores a target against model predictions and says whether higher is better.
 * `pinballLoss` takes its quantile in the name: `'pinballLoss:0.9'` (plain `'pinballLoss'` is τ = 0.5).
 */
import { CoppiceError, errors } from '../../errors.js';
import type { Predictions, Task } from '../../learn/model.js';
import type { Target } from '../../table/frame.js';
import { accuracy } from './accuracy.js';
import { alignClasses } from './align-classes.js';
import { averagePrecision } from './average-precision.js';
import { balancedAccuracy } from './balanced-accuracy.js';
import { brierScore } from './brier-score.js';
import { checkLength } from './check.js';
import { logLoss } from './log-loss.js';
import { mae } from './mae.js';
import { pinballLoss } from './pinball-loss.js';
import { poissonDeviance } from './poisson-deviance.js';
import { rSquared } from './r-squared.js';
import { rmse } from './rmse.js';
import { rocAuc } from './roc-auc.js';

export interface MetricEntry {
  readonly name: string;
  readonly task: Task;
  readonly higherIsBetter: boolean;
  /** Score `predictions` against `target` (same rows). */
  readonly score: (target: Target, predictions: Predictions, weights: Float64Array | null) => number;
}

type ClassScore = (actual: Int32Array, labels: Int32Array, proba: Float64Array, w: Float64Array | null) => number;
type ValueScore = (actual: Float64Array, predicted: Float64Array, w: Float64Array | null) => number;

function classMetric(name: string, higherIsBetter: boolean, f: ClassScore): MetricEntry {
  return {
    name, task: 'classification', higherIsBetter,
    score(target, predictions, weights) {
      if (target.kind !== 'class' || predictions.task !== 'classification') throw errors.metricTask(name, 'regression');
      checkLength('predictions', target.codes.length, predictions.value);
      const { labels, proba } = alignClasses(target.classes, predictions);
      return f(target.codes, labels, proba, weights);
    },
  };
}

function valueMetric(name: string, higherIsBetter: boolean, f: ValueScore): MetricEntry {
  return {
    name, task: 'regression', higherIsBetter,
    score(target, predictions, weights) {
      if (target.kind !== 'number' || predictions.task !== 'regression') throw errors.metricTask(name, 'classification');
      return f(target.values, predictions.value, weights);
    },
  };
}

const entries: readonly MetricEntry[] = [
  classMetric('accuracy', true, (y, l, _p, w) => accuracy(y, l, w)),
  classMetric('balancedAccuracy', true, (y, l, _p, w) => balancedAccuracy(y, l, w)),
  classMetric('logLoss', false, (y, _l, p, w) => logLoss(y, p, w)),
  classMetric('brierScore', false, (y, _l, p, w) => brierScore(y, p, w)),
  classMetric('rocAuc', true, (y, _l, p, w) => rocAuc(y, p, w)),
  classMetric('averagePrecision', true, (y, _l, p, w) => averagePrecision(y, p, w)),
  valueMetric('rmse', false, rmse),
  valueMetric('mae', false, mae),
  valueMetric('rSquared', true, rSquared),
  valueMetric('poissonDeviance', false, poissonDeviance),
  valueMetric('pinballLoss', false, (y, q, w) => pinballLoss(y, q, 0.5, w)),
];

/**
 * Names of the registered metrics, optionally for one task.
 * @param task - 'classification' or 'regression'. __Default:__ both.
 * @example
 * metricNames('regression'); // ['rmse', 'mae', 'rSquared', 'poissonDeviance', 'pinballLoss']
 */
export function metricNames(task?: Task): string[] {
  return entries.filter((e) => task === undefined || e.task === task).map((e) => e.name);
}

/**
 * The registry entry for `name` (with `pinballLoss:τ` for a chosen quantile); throws for an unknown name.
 * @example
 * findMetric('logLoss').higherIsBetter; // false
 */
export function findMetric(name: string): MetricEntry {
  const m = /^pinballLoss:(.+)$/.exec(name);
  if (m) {
    const tau = Number(m[1]);
    if (!(tau > 0 && tau < 1)) throw errors.badOption('tau', m[1], 'a number strictly between 0 and 1');
    return valueMetric(name, false, (y, q, w) => pinballLoss(y, q, tau, w));
  }
  const e = entries.find((x) => x.name === name);
  if (!e) throw errors.unknownMetric(name, metricNames());
  return e;
}

/**
 * Score predictions against a target with a metric chosen by name.
 * @param name - a registered metric name.
 * @param weights - per-row weights. __Default:__ none (all 1).
 * @example
 * scoreMetric('rmse', { kind: 'number', name: 'cost', values: Float64Array.of(1, 2) }, predictions);
 */
export function scoreMetric(name: string, target: Target, predictions: Predictions, weights: Float64Array | null = null): number {
  return findMetric(name).score(target, predictions, weights);
}

/**
 * Metrics used when none are asked for.
 * @example
 * defaultMetrics('classification'); // ['accuracy', 'logLoss', 'rocAuc']
 */
export function defaultMetrics(task: Task): string[] {
  return task === 'classification' ? ['accuracy', 'logLoss', 'rocAuc'] : ['rmse', 'mae', 'rSquared'];
}

/**
 * Score with a registry entry, or NaN when the metric is undefined on these rows because only one class
 * occurs (ROC AUC, average precision); every other error is thrown. Used per fold and per segment, where
 * a small group may hold one class.
 * @example
 * scoreWhereDefined(findMetric('rocAuc'), target, predictions, null); // NaN if target has one class
 */
export function scoreWhereDefined(entry: MetricEntry, target: Target, predictions: Predictions, weights: Float64Array | null): number {
  try {
    return entry.score(target, predictions, weights);
  } catch (e) {
    if (e instanceof CoppiceError && e.code === 'one-class-only') return NaN;
    throw e;
  }
}
