/**
 * AdaBoost predictions: the class with the largest α-weighted vote, argmax_k Σ_m α_m I(G_m(x) = k)
 * (ESL Algorithm 10.1 step 3, written for K classes as in SAMME). `proba` holds each class's share of
 * the vote (Σ α over rounds voting for it / Σ α) — a ranking score, not a calibrated probability.
 * With no kept round the weighted class shares of the training rows are returned.
 */
import type { Frame } from '../../table/frame.js';
import { leafOf } from '../flat-tree.js';
import type { Predictions } from '../model.js';
import type { AdaBoostModel } from './models.js';
import { rowSourceFor } from '../tree/row-source.js';
import { argmaxAt } from './tree-sum.js';

/**
 * Predict `frame` with the first `rounds` rounds of `model` (all by default).
 * @param rounds rounds used (for error-against-rounds curves). __Default:__ all kept rounds.
 * @example
 * predictAdaBoost(ada, testFrame).value; // class index per row
 */
export function predictAdaBoost(model: AdaBoostModel, frame: Frame, rounds: number = model.trees.length): Predictions {
  const src = rowSourceFor(model.features, frame);
  const classes = model.target.classes ?? [];
  const K = classes.length, n = frame.nRows;
  const m = Math.max(0, Math.min(rounds, model.trees.length));
  const proba = new Float64Array(n * K);
  let sum = 0;
  for (let t = 0; t < m; t++) {
    const tree = model.trees[t], a = model.stepWeights[t];
    sum += a;
    for (let i = 0; i < n; i++) proba[i * K + argmaxAt(tree.value, leafOf(tree, src, i) * K, K)] += a;
  }
  if (m === 0) for (let i = 0; i < n; i++) for (let k = 0; k < K; k++) proba[i * K + k] = model.prior[k];
  else for (let j = 0; j < proba.length; j++) proba[j] /= sum;
  const value = new Float64Array(n);
  for (let i = 0; i < n; i++) value[i] = argmaxAt(proba, i * K, K);
  return { task: 'classification', n, value, proba, classes };
}
