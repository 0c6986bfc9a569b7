/**
 * Predictions of bagged trees and random forests: the mean of the members' leaf values (numbers), the
 * mean of their leaf probabilities ('average') or each member's vote share ('vote') for classes.
 */
import type { Frame } from '../../table/frame.js';
import type { Predictions } from '../model.js';
import type { ForestModel } from './models.js';
import { rowSourceFor } from '../tree/row-source.js';
import { addTreeValues, argmaxAt } from './tree-sum.js';
import { leafOf } from '../flat-tree.js';

/**
 * Predict `frame` with the first `size` members of `model` (all by default).
 * @param size members to use, for curves of error against size. __Default:__ all.
 * @example
 * const pred = predictForest(forest, testFrame);
 * pred.value; // class index per row (classification) or predicted number
 */
export function predictForest(model: ForestModel, frame: Frame, size: number = model.trees.length): Predictions {
  const src = rowSourceFor(model.features, frame);
  const n = frame.nRows;
  const m = Math.max(0, Math.min(size, model.trees.length));
  if (model.task === 'regression') {
    const value = new Float64Array(n);
    for (let t = 0; t < m; t++) addTreeValues(model.trees[t], src, n, value, 1, 0);
    for (let i = 0; i < n; i++) value[i] /= m; // m = 0 gives NaN: no members, no prediction
    return { task: 'regression', n, value, proba: new Float64Array(0), classes: [] };
  }
  const classes = model.target.classes ?? [];
  const K = classes.length;
  const proba = new Float64Array(n * K);
  for (let t = 0; t < m; t++) {
    const tree = model.trees[t];
    if (model.combine === 'average') addTreeValues(tree, src, n, proba, K, 0);
    else for (let i = 0; i < n; i++) proba[i * K + argmaxAt(tree.value, leafOf(tree, src, i) * K, K)] += 1;
  }
  for (let j = 0; j < proba.length; j++) proba[j] /= m;
  const value = new Float64Array(n);
  for (let i = 0; i < n; i++) value[i] = argmaxAt(proba, i * K, K);
  return { task: 'classification', n, value, proba, classes };
}
