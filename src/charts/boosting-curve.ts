/**
 * The learning curve of a boosted model straight from the model: gradient boosting's loss per round
 * (training and watched rows, best round marked) or AdaBoost's error per round. No glue code needed.
 */
import type { LossName } from '../learn/ensemble/loss/loss.js';
import type { AdaBoostModel, BoostingModel } from '../learn/ensemble/models.js';
import { chartLearningCurve, type LearningCurveOptions, type LearningCurveRow } from './learning-curve.js';
import type { ChartSpec } from './spec.js';

/** What each boosting loss's recorded figure is (the weighted mean of the loss over rows), for axis titles. */
const LOSS_TITLE: Readonly<Record<LossName, string>> = {
  squared: 'mean squared error',
  absolute: 'mean absolute error',
  huber: 'mean Huber loss',
  quantile: 'mean quantile (pinball) loss',
  logistic: 'log loss (nats)',
  multiclass: 'multiclass log loss (nats)',
  poisson: 'mean Poisson deviance',
};

/** Axis title for AdaBoost's per-round figure: the share of rows (by weight) the vote gets wrong. */
const ADABOOST_TITLE = 'error rate (weighted share misclassified)';

/**
 * Learning-curve rows of a boosted model: one row per round and set.
 *
 * Gradient boosting: the recorded training and watched loss after each round, from round 0 (the constant
 * starting model) on; watched rows only when the fit had a watched set. AdaBoost: the error of the vote of
 * rounds 1..m on the training rows and, when recorded (not NaN), on the watched rows.
 *
 * @param model A `BoostingModel` or `AdaBoostModel`.
 * @example
 * const gb = fitBoosting(train, { rounds: 200, watch: valid });
 * chartLearningCurve(learningCurveRows(gb), { bestRound: gb.bestRound });
 */
export function learningCurveRows(model: BoostingModel | AdaBoostModel): LearningCurveRow[] {
  const rows: LearningCurveRow[] = [];
  if (model.kind === 'boosting') {
    model.trainLoss.forEach((loss, round) => rows.push({ round, set: 'training', loss }));
    model.watchLoss.forEach((loss, round) => rows.push({ round, set: 'watched', loss }));
    return rows;
  }
  for (const r of model.rounds) {
    rows.push({ round: r.round, set: 'training', loss: r.trainError });
    if (!Number.isNaN(r.watchError)) rows.push({ round: r.round, set: 'watched', loss: r.watchError });
  }
  return rows;
}

/**
 * The learning curve of a boosted model: loss (gradient boosting) or error rate (AdaBoost) per round on
 * the training rows and the watched rows.
 *
 * @param model   A `BoostingModel` or `AdaBoostModel`.
 * @param options As `chartLearningCurve`. `lossName` __Default:__ what the model's loss measures (e.g.
 *                'log loss (nats)'); `bestRound` __Default:__ the model's best round when it watched rows
 *                (gradient boosting), else none; subtitle __Default:__ the reading guide, saying when early
 *                stopping kept only the rounds up to the best one.
 * @example
 * const gb = fitBoosting(train, { rounds: 300, watch: valid, patience: 20 });
 * chartBoostingCurve(gb);
 * chartBoostingCurve(fitAdaBoost(train, { rounds: 50, watch: valid }), { title: 'AdaBoost, 50 rounds' });
 */
export function chartBoostingCurve(model: BoostingModel | AdaBoostModel, options: LearningCurveOptions = {}): ChartSpec {
  const rows = learningCurveRows(model);
  if (model.kind === 'adaboost') {
    const stop = model.stopReason === 'perfect' ? 'stopped early: a round classified every row correctly'
      : model.stopReason === 'guessing' ? 'stopped early: a round did no better than guessing' : undefined;
    const subtitle = options.subtitle ?? (stop ? `${adaSubtitle(rows)}; ${stop}` : adaSubtitle(rows));
    return chartLearningCurve(rows, { lossName: ADABOOST_TITLE, ...options, subtitle });
  }
  const watched = model.watchLoss.length > 0;
  const lastRound = model.trainLoss.length - 1;
  const kept = watched && model.roundsKept < lastRound;
  const guide = watched
    ? `Loss per round on the training and watched rows; the grey line marks the best round${kept ? ', the last one the model keeps' : ''}`
    : 'Loss per round on the training rows (no watched rows)';
  return chartLearningCurve(rows, {
    lossName: LOSS_TITLE[model.loss] ?? model.loss,
    ...(watched ? { bestRound: model.bestRound } : {}),
    ...(options.subtitle === undefined ? { subtitle: guide } : {}),
    ...options,
  });
}

function adaSubtitle(rows: readonly LearningCurveRow[]): string {
  return rows.some((r) => r.set === 'watched')
    ? 'Error rate of the vote per round on the training and watched rows'
    : 'Error rate of the vote per round on the training rows (no watched rows)';
}
