/**
 * Predictions and raw outputs of any model kind, through the learners' own prediction code.
 */
import type { AdaBoostModel, BoostingModel, ForestModel } from '../learn/ensemble/models.js';
import { predictAdaBoost } from '../learn/ensemble/predict-adaboost.js';
import { boostingScores, predictBoosting } from '../learn/ensemble/predict-boosting.js';
import { predictForest } from '../learn/ensemble/predict-forest.js';
import type { ModelHeader, Predictions } from '../learn/model.js';
import { predictFrame } from '../learn/predict.js';
import type { Frame } from '../table/frame.js';

/**
 * Predict every row of `frame` (aligned to the model's features) with a model of any kind.
 * @example
 * const p = predictModel(forest, testFrame);
 */
export function predictModel(model: ModelHeader, frame: Frame): Predictions {
  switch (model.kind) {
    case 'bagging': case 'forest': return predictForest(model as ForestModel, frame);
    case 'adaboost': return predictAdaBoost(model as AdaBoostModel, frame);
    case 'boosting': return predictBoosting(model as BoostingModel, frame);
    default: return predictFrame(model, frame);
  }
}

/**
 * The model's raw outputs, n × K row-major, in the sense of `additiveModelOf`: class probabilities or
 * vote shares, the predicted number, or a boosted model's scores before the link.
 * @example
 * rawOutputsOf(gb, frame); // boosting margins F(x)
 */
export function rawOutputsOf(model: ModelHeader, frame: Frame): Float64Array {
  if (model.kind === 'boosting') return boostingScores(model as BoostingModel, frame);
  const p = predictModel(model, frame);
  return p.task === 'classification' ? p.proba : p.value;
}
