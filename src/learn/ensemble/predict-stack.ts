/**
 * Stack predictions: every member predicts the frame, their outputs (and pass-through features) go to
 * the combiner. Members are predicted with `predictMember` (normally `predictFrame` of
 * src/learn/predict.ts, passed in so this file does not import the registry that imports it).
 */
import type { Frame } from '../../table/frame.js';
import type { ModelHeader, Predictions } from '../model.js';
import { applyLogisticCombiner } from './logistic-combiner.js';
import type { StackModel } from './models.js';
import { applyRidgeCombiner } from './ridge-combiner.js';
import { writeMemberColumns, writePassThrough } from './stack-inputs.js';
import { argmaxAt } from './tree-sum.js';

/**
 * Predict `frame` with a stack.
 * @example
 * predictStack(stack, frame, predictFrame).proba;
 */
export function predictStack(
  model: StackModel, frame: Frame, predictMember: (m: ModelHeader, f: Frame) => Predictions,
): Predictions {
  const n = frame.nRows;
  const classes = model.target.classes ?? [];
  const width = model.task === 'classification' ? classes.length : 1;
  const p = model.members.length * width + model.passThrough.length;
  const X = new Float64Array(n * p);
  model.members.forEach((m, j) => writeMemberColumns(X, p, j * width, predictMember(m.model, frame), width, null));
  writePassThrough(X, p, model.members.length * width, frame, model.passThrough);
  if (model.combiner.kind === 'ridge') {
    return { task: 'regression', n, value: applyRidgeCombiner(model.combiner, X, n), proba: new Float64Array(0), classes: [] };
  }
  const proba = applyLogisticCombiner(model.combiner, X, n);
  const value = new Float64Array(n);
  for (let i = 0; i < n; i++) value[i] = argmaxAt(proba, i * width, width);
  return { task: 'classification', n, value, proba, classes };
}
