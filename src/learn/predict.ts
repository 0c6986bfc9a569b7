/**
 * Predictions of any fitted model for the rows of a frame: one case per model kind.
 */
import { errors } from '../errors.js';
import type { Frame } from '../table/frame.js';
import type { ModelHeader, Predictions } from './model.js';
import { predictTree } from './tree/predict-tree.js';
import { rowSourceFor } from './tree/row-source.js';
import type { TreeModel } from './tree-model.js';
import { predictEnsemble } from './ensemble/predict-ensemble.js'; // ensembles (task G)

/** A model of any kind this build can predict with. */
export type AnyModel = TreeModel;

/**
 * Turn n × K class scores (probabilities) into predictions: the predicted class is the most probable
 * one (ties: the lower class index).
 * @example
 * classPredictions(Float64Array.of(0.2, 0.8), 1, ['no', 'yes']).value; // [1]
 */
export function classPredictions(proba: Float64Array, n: number, classes: readonly string[]): Predictions {
  const k = classes.length;
  const value = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let best = 0;
    for (let j = 1; j < k; j++) if (proba[i * k + j] > proba[i * k + best]) best = j;
    value[i] = best;
  }
  return { task: 'classification', n, value, proba, classes };
}

/**
 * Predict every row of `frame` with `model`. The frame must be aligned to the model's features (same
 * column names, order and kinds; categorical dictionaries extending the model's); otherwise a clear
 * schema error. Missing values and unseen categories follow each split's missing-value child.
 * @example
 * const p = predictFrame(model, frame);
 * p.value; // class index (classification) or predicted value (regression)
 */
export function predictFrame(model: ModelHeader, frame: Frame): Predictions {
  const m = model as AnyModel;
  switch (m.kind) {
    case 'tree': {
      const src = rowSourceFor(m.features, frame);
      const out = predictTree(m.tree, src, frame.nRows);
      if (m.task === 'classification') return classPredictions(out, frame.nRows, m.target.classes ?? []);
      return { task: 'regression', n: frame.nRows, value: out, proba: new Float64Array(0), classes: [] };
    }
    default: {
      const ensemble = predictEnsemble(model, frame, predictFrame); // ensembles (task G)
      if (ensemble) return ensemble;
      throw errors.notSupported(`predicting with a model of kind ${JSON.stringify((model as ModelHeader).kind)}`);
    }
  }
}
