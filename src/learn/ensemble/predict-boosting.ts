/**
 * Boosting predictions: F(x) = F_0 + Σ trees (leaf values include each round's step), then the loss's
 * link: the score itself ('squared', 'absolute', 'huber', 'quantile'), e^F ('poisson'), the logistic
 * function for two classes ('logistic') or the softmax over K scores ('multiclass').
 */
import type { Frame } from '../../table/frame.js';
import type { Predictions } from '../model.js';
import { sigmoid } from './loss/logistic.js';
import { softmaxRows } from './loss/multiclass.js';
import type { BoostingModel } from './models.js';
import { rowSourceFor } from '../tree/row-source.js';
import { addTreeValues, argmaxAt } from './tree-sum.js';

/**
 * Raw scores F (n × nOutputs, row-major) after the first `rounds` rounds.
 * @example
 * boostingScores(gb, frame, 10); // scores after 10 rounds
 */
export function boostingScores(model: BoostingModel, frame: Frame, rounds: number = model.roundsKept): Float64Array {
  const src = rowSourceFor(model.features, frame);
  const n = frame.nRows, K = model.nOutputs;
  const m = Math.max(0, Math.min(Math.floor(rounds), model.roundsKept));
  const F = new Float64Array(n * K);
  for (let i = 0; i < n; i++) for (let k = 0; k < K; k++) F[i * K + k] = model.initial[k];
  for (let t = 0; t < m * K; t++) addTreeValues(model.trees[t], src, n, F, K, t % K);
  return F;
}

/**
 * Predict `frame` with the first `rounds` rounds (any count up to `roundsKept`).
 * @param rounds rounds used. __Default:__ `model.roundsKept`.
 * @example
 * predictBoosting(gb, testFrame).value;      // all kept rounds
 * predictBoosting(gb, testFrame, 50).value;  // as if only 50 rounds had been run
 */
export function predictBoosting(model: BoostingModel, frame: Frame, rounds: number = model.roundsKept): Predictions {
  const F = boostingScores(model, frame, rounds);
  const n = frame.nRows;
  if (model.task === 'regression') {
    const value = model.loss === 'poisson' ? F.map(Math.exp) : F;
    return { task: 'regression', n, value, proba: new Float64Array(0), classes: [] };
  }
  const classes = model.target.classes ?? [];
  const K = classes.length;
  let proba: Float64Array;
  if (model.loss === 'logistic') {
    proba = new Float64Array(n * 2);
    for (let i = 0; i < n; i++) { const p = sigmoid(F[i]); proba[2 * i] = 1 - p; proba[2 * i + 1] = p; }
  } else {
    proba = new Float64Array(n * K);
    softmaxRows(F, K, proba);
  }
  const value = new Float64Array(n);
  for (let i = 0; i < n; i++) value[i] = argmaxAt(proba, i * K, K);
  return { task: 'classification', n, value, proba, classes };
}
