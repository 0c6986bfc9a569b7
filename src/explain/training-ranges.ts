/**
 * Training ranges of numeric features, kept in a model's settings under `trainingRanges`
 * (`{ [feature]: [min, max] }`, a plain JSON value the model file already round-trips), so scoring can
 * flag values outside what the model was fitted on.
 */
import { errors } from '../errors.js';
import type { ModelHeader } from '../learn/model.js';
import type { Frame } from '../table/frame.js';

export type TrainingRanges = Readonly<Record<string, readonly [number, number]>>;

/**
 * [min, max] of every numeric or boolean column of `frame` over its non-missing values (columns with
 * none are left out).
 * @example
 * featureRangesOf(train.features); // { storage_hours: [0, 96], bruised: [0, 1] }
 */
export function featureRangesOf(frame: Frame): TrainingRanges {
  const out: Record<string, [number, number]> = {};
  for (const c of frame.columns) {
    if (c.kind === 'categorical') continue;
    let lo = Infinity, hi = -Infinity;
    for (const v of c.values) { if (v < lo) lo = v; if (v > hi) hi = v; }
    if (lo <= hi) out[c.name] = [lo, hi];
  }
  return out;
}

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
  return { ...model, settings: { ...model.settings, trainingRanges: featureRangesOf(frame) } };
}

/** The ranges recorded in `model`, or null when the model file has none (checked loosely: bad entries skipped). */
export function trainingRangesOf(model: ModelHeader): TrainingRanges | null {
  const r = model.settings.trainingRanges;
  if (typeof r !== 'object' || r === null || Array.isArray(r)) return null;
  const out: Record<string, [number, number]> = {};
  for (const [k, v] of Object.entries(r as Record<string, unknown>)) {
    if (Array.isArray(v) && v.length === 2 && typeof v[0] === 'number' && typeof v[1] === 'number' && v[0] <= v[1]) out[k] = [v[0], v[1]];
  }
  return out;
}
