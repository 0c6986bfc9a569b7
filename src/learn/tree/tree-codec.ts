/**
 * Model-file body of a single tree: `{ tree, trainingRows, droppedRows }`.
 */
import { errors } from '../../errors.js';
import type { ModelHeader } from '../model.js';
import type { TreeModel } from '../tree-model.js';
import { decodeFlatTree, encodeFlatTree } from './flat-tree-json.js';
import { readInt, readObject, type JsonValue } from './json-values.js';

export const treeCodec = {
  encode(model: TreeModel): { [key: string]: JsonValue } {
    return { tree: encodeFlatTree(model.tree), trainingRows: model.trainingRows, droppedRows: model.droppedRows };
  },
  decode(body: unknown, header: ModelHeader): TreeModel {
    const o = readObject(body, 'body');
    const tree = decodeFlatTree(o.tree, 'body.tree', header.features);
    const k = header.target.kind === 'class' ? Math.max(1, header.target.classes?.length ?? 0) : 1;
    if (tree.nOutputs !== k) throw errors.badModel(`body.tree.nOutputs should be ${k} (one per class, or 1)`);
    return {
      ...header, kind: 'tree', tree,
      trainingRows: readInt(o.trainingRows, 'body.trainingRows', 0),
      droppedRows: readInt(o.droppedRows, 'body.droppedRows', 0),
    };
  },
};
