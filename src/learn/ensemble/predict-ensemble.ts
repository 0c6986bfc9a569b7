/**
 * Prediction for every ensemble kind, called by `predictFrame` (src/learn/predict.ts) for kinds other
 * than 'tree'.
 */
import type { Frame } from '../../table/frame.js';
import type { ModelHeader, Predictions } from '../model.js';
import type { AdaBoostModel, BoostingModel, ForestModel, StackModel } from './models.js';
import { predictAdaBoost } from './predict-adaboost.js';
import { predictBoosting } from './predict-boosting.js';
import { predictForest } from './predict-forest.js';
import { predictStack } from './predict-stack.js';

/**
 * Predictions of an ensemble model, or null when `model` is not an ensemble kind.
 * @param predictAny predicts a stack's members (any kind). __Default:__ none (required).
 * @example
 * predictEnsemble(forest, frame, predictFrame);
 */
export function predictEnsemble(
  model: ModelHeader, frame: Frame, predictAny: (m: ModelHeader, f: Frame) => Predictions,
): Predictions | null {
  switch (model.kind) {
    case 'bagging':
    case 'forest':
      return predictForest(model as ForestModel, frame);
    case 'adaboost':
      return predictAdaBoost(model as AdaBoostModel, frame);
    case 'boosting':
      return predictBoosting(model as BoostingModel, frame);
    case 'stack':
      return predictStack(model as StackModel, frame, predictAny);
    default:
      return null;
  }
}
