/**
 * The one number per row that partial dependence follows: the predicted value (regression) or the
 * predicted probability of a chosen class (classification).
 */
import { errors } from '../errors.js';
import type { ModelHeader } from '../learn/model.js';
import type { Frame } from '../table/frame.js';
import { predictModel } from './predict-model.js';

/** A function giving, for each row of a frame, the followed prediction; and its name. */
export interface FollowedOutput {
  readonly name: string;
  readonly of: (frame: Frame) => Float64Array;
}

/**
 * What partial dependence follows for `model`: its prediction, or class `label`'s probability.
 * @param label class whose probability is followed. __Default:__ the second class when there are two
 *   (the "positive" one, common practice), else the first.
 * @example
 * followedOutput(model, 'spoiled').of(frame); // P(spoiled) per row
 */
export function followedOutput(model: ModelHeader, label?: string): FollowedOutput {
  if (model.task === 'regression') {
    if (label !== undefined) throw errors.badOption('output', label, 'no class for a regression model');
    return { name: `predicted ${model.target.name}`, of: (f) => predictModel(model, f).value };
  }
  const classes = model.target.classes ?? [];
  const chosen = label ?? (classes.length === 2 ? classes[1] : classes[0]);
  const k = classes.indexOf(chosen);
  if (k < 0) throw errors.badOption('output', chosen, `one of the classes ${classes.join(', ')}`);
  const K = classes.length;
  return {
    name: `P(${model.target.name} = ${chosen})`,
    of: (f) => {
      const p = predictModel(model, f);
      return Float64Array.from({ length: f.nRows }, (_, i) => p.proba[i * K + k]);
    },
  };
}
