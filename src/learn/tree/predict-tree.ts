/**
 * Raw outputs of one tree for every row of a frame: the value vector of the leaf each row reaches.
 */
import type { Frame } from '../../table/frame.js';
import { leafOf, type FlatTree, type RowSource } from '../flat-tree.js';
import { rowSourceOf } from './row-source.js';

/**
 * n × nOutputs leaf values, row-major (class probabilities, a mean, or a raw boosting score).
 * Feature indices of `tree` refer to `frame.columns`; no schema check (see `predictFrame` for that).
 * @example
 * const out = predictTree(model.tree, frame); // out[i * tree.nOutputs + k]
 */
export function predictTree(tree: FlatTree, frame: Frame | RowSource, nRows?: number): Float64Array {
  const src = 'columns' in frame ? rowSourceOf(frame) : frame;
  const n = 'columns' in frame ? frame.nRows : (nRows ?? 0);
  const k = tree.nOutputs;
  const out = new Float64Array(n * k);
  for (let i = 0; i < n; i++) {
    const leaf = leafOf(tree, src, i);
    for (let j = 0; j < k; j++) out[i * k + j] = tree.value[leaf * k + j];
  }
  return out;
}

/**
 * Index of the leaf each row reaches.
 * @example
 * const leaves = leavesOf(model.tree, rowSourceOf(frame), frame.nRows);
 */
export function leavesOf(tree: FlatTree, src: RowSource, nRows: number): Int32Array {
  const out = new Int32Array(nRows);
  for (let i = 0; i < nRows; i++) out[i] = leafOf(tree, src, i);
  return out;
}
