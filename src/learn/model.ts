/**
 * What every fitted model carries, whatever its kind. Concrete kinds (tree, forest, boosting, ...)
 * extend `ModelHeader` with their own fields; each kind has one file that fits it and one entry in
 * `src/learn/predict.ts` and `src/learn/model-file.ts`.
 */
import type { ColumnSchema } from '../table/frame.js';

export type Task = 'classification' | 'regression';

export type ModelKind = 'tree' | 'bagging' | 'forest' | 'adaboost' | 'boosting' | 'stack';

export interface TargetInfo {
  readonly name: string;
  readonly kind: 'class' | 'number';
  /** Class labels in code order (classification only). */
  readonly classes?: readonly string[];
}

export interface ModelHeader {
  readonly kind: ModelKind;
  readonly task: Task;
  /** Feature columns in the order the trees index them. */
  readonly features: readonly ColumnSchema[];
  readonly target: TargetInfo;
  /** Every setting the learner used, defaults filled in. */
  readonly settings: Readonly<Record<string, unknown>>;
  /** Seed of the generator every random choice came from (0 when the learner used none). */
  readonly seed: number;
  /** Fingerprints of the training data: schema and values. */
  readonly fingerprint: { readonly schema: string; readonly data: string };
  /** [min, max] of each numeric feature in the training data, so scoring can flag values outside it. */
  readonly ranges?: Readonly<Record<string, readonly [number, number]>>;
}

/** Predictions for n rows. */
export interface Predictions {
  readonly task: Task;
  readonly n: number;
  /** Regression: predicted values. Classification: index of the predicted class. */
  readonly value: Float64Array;
  /** Classification: n × K probabilities, row-major. Empty for regression. */
  readonly proba: Float64Array;
  /** Class labels (classification), empty for regression. */
  readonly classes: readonly string[];
}
