/**
 * Training ranges of numeric features, kept in a model's header under `ranges` (`{ [feature]: [min, max] }`,
 * recorded by every learner at fit time and kept by the model file), so scoring can flag values outside
 * what the model was fitted on.
 */
import { errors } from '../errors.js';
import type { ModelHeader } from '../learn/model.js';
import type { Frame } from '../table/frame.js';

import { featureRangesOf, type TrainingRanges } from '../table/ranges.js';

export { featureRangesOf };
export type { TrainingRanges };

/**
 * `model` with the training ranges of `frame` (its training features) recorded in its settings.
 * @example
 * const kept = withTrainingRanges(model, train.features);
 * await saveModel(kept, 'model.json');
 */
export function withTrainingRanges<M extends ModelHeader>(model: M, frame: Frame): M {
  const names = model.features.map((f) => f.name);
  frame.columns.forEach((c, j) => {
    if (c.name !== names[j]) throw errors.schemaMismatch(`column ${j + 1} is ${JSON.stringify(c.name)}, the model expects ${JSON.stringify(names[j])}`);
  });
  return { ...model, ranges: featureRangesOf(frame) };
}

/**
 * The ranges recorded in `model`, or null when the model file has none (checked loosely: bad entries skipped).
 * @example
 * trainingRangesOf(model)?.storage_hours; // [0, 96]
 */
export function trainingRangesOf(model: ModelHeader): TrainingRanges | null {
  const r = model.ranges;
  if (typeof r !== 'object' || r === null || Array.isArray(r)) return null;
  const out: Record<string, [number, number]> = {};
  for (const [k, v] of Object.entries(r as Record<string, unknown>)) {
    if (Array.isArray(v) && v.length === 2 && typeof v[0] === 'number' && typeof v[1] === 'number' && v[0] <= v[1]) out[k] = [v[0], v[1]];
  }
  return out;
}
