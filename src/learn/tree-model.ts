/**
 * A single fitted decision tree: the common model header plus one flat tree.
 */
import type { FlatTree } from './flat-tree.js';
import type { ModelHeader } from './model.js';

export interface TreeModel extends ModelHeader {
  readonly kind: 'tree';
  /** Classification: `value` holds class probabilities (nOutputs = number of classes); regression: 1 value. */
  readonly tree: FlatTree;
  /** Training rows used (positive weight and a known target). */
  readonly trainingRows: number;
  /** Training rows left out because their target was missing. */
  readonly droppedRows: number;
}

/**
 * True when `model` is a single-tree model.
 * @example
 * if (isTreeModel(model)) console.log(model.tree.nNodes);
 */
export function isTreeModel(model: { readonly kind: string }): model is TreeModel {
  return model.kind === 'tree';
}
