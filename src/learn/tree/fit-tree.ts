/**
 * The single-tree learner: validate a dataset and options, grow one tree, wrap it with its header.
 */
import type { ColumnSchema, Dataset, Frame } from '../../table/frame.js';
import { dataFingerprint, schemaFingerprint } from '../../table/fingerprint.js';
import { featureRangesOf } from '../../table/ranges.js';
import { createRng } from '../../util/rng.js';
import type { Response } from '../grow-task.js';
import { growTree } from '../grow.js';
import type { TreeModel } from '../tree-model.js';
import { growSettingsOf, resolveTreeOptions, type TreeOptions } from './tree-options.js';
import { trainingRowsOf } from './training-rows.js';

/**
 * The schema of a frame's columns, in order (what a model records as its features).
 * @example
 * featureSchemaOf(frame); // [{ name: 'age', kind: 'numeric' }, ...]
 */
export function featureSchemaOf(frame: Frame): ColumnSchema[] {
  return frame.columns.map((c) => {
    const s: { name: string; kind: ColumnSchema['kind']; categories?: readonly string[]; origin?: ColumnSchema['origin'] } = { name: c.name, kind: c.kind };
    if (c.kind === 'categorical') s.categories = c.categories.slice();
    else if (c.origin) s.origin = c.origin;
    return s;
  });
}

/**
 * Fit one classification or regression tree. Class targets give a classification tree whose nodes
 * hold class probabilities; number targets a regression tree. Rows with a missing target are left out
 * (counted in `droppedRows`); missing feature values (NaN, code -1) are routed as described in
 * DEVELOPERS.md. One row, one class or a constant target give a single leaf.
 *
 * Options (see `TreeOptions` for each default): `criterion`, `leafValue`, `depthLimit`, `leafRows`,
 * `leafWeight`, `minGain`, `categorical`, `leafBudget`, `featuresPerSplit`, `seed`, `engine`.
 * @example
 * const model = fitTree(data, { criterion: 'gini', depthLimit: 3 });
 * const pred = predictFrame(model, data.features);
 */
export function fitTree(data: Dataset, options: TreeOptions = {}): TreeModel {
  const target = data.target;
  const settings = resolveTreeOptions(options, target.kind);
  const rows = trainingRowsOf(data, 'fit a tree');
  const response: Response = target.kind === 'class'
    ? { kind: 'class', codes: target.codes, nClasses: Math.max(1, target.classes.length), criterion: settings.criterion as 'entropy' | 'gainRatio' | 'gini' }
    : { kind: 'value', values: target.values, leaf: settings.leafValue };
  const { tree } = growTree({
    frame: data.features, weights: rows.weights, response, settings: growSettingsOf(settings), rng: createRng(settings.seed),
  }, settings.engine);
  const features = featureSchemaOf(data.features);
  return {
    kind: 'tree',
    task: target.kind === 'class' ? 'classification' : 'regression',
    features,
    target: target.kind === 'class'
      ? { name: target.name, kind: 'class', classes: target.classes.slice() }
      : { name: target.name, kind: 'number' },
    settings: { ...settings },
    ranges: featureRangesOf(data.features),
    seed: settings.seed,
    fingerprint: { schema: schemaFingerprint(features), data: dataFingerprint(data) },
    tree,
    trainingRows: rows.used,
    droppedRows: rows.dropped,
  };
}
