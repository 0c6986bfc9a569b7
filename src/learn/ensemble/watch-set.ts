/**
 * A watched set (held-out rows scored after every round, for learning curves and early stopping):
 * checked against the training target and routed through the training features.
 */
import { errors } from '../../errors.js';
import type { Dataset, Target } from '../../table/frame.js';
import type { ColumnSchema } from '../../table/frame.js';
import type { RowSource } from '../flat-tree.js';
import { prepareData } from './prepare.js';
import { rowSourceFor } from '../tree/row-source.js';

export interface WatchSet {
  readonly n: number;
  readonly src: RowSource;
  /** Class codes (as numbers) or values. */
  readonly y: Float64Array;
  readonly weights: Float64Array;
}

/**
 * Prepare `data` as a watched set for a model trained on `features` and `target`.
 * @example
 * const watch = watchSetOf(holdout, train.features.schema.columns, train.target);
 */
export function watchSetOf(data: Dataset, features: readonly ColumnSchema[], target: Target): WatchSet {
  const t = data.target;
  if (t.kind !== target.kind) throw errors.badWatchSet(`its target is ${t.kind === 'class' ? 'a class' : 'a number'}, the training target is not`);
  if (t.kind === 'class' && target.kind === 'class' && t.classes.join('\u0000') !== target.classes.join('\u0000')) {
    throw errors.badWatchSet(`classes ${t.classes.join(', ')} differ from the training classes ${target.classes.join(', ')}`);
  }
  const prep = prepareData(data, 'watch');
  const pt = prep.data.target;
  const y = pt.kind === 'class' ? Float64Array.from(pt.codes) : pt.values;
  return { n: prep.n, src: rowSourceFor(features, prep.data.features), y, weights: prep.weights };
}
