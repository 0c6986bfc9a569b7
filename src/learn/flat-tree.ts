/**
 * Trees as flat typed arrays: the one representation shared by single trees, forests, bagging,
 * AdaBoost and gradient boosting, by the exact and histogram growers, by prediction, explanation
 * (TreeSHAP), the model file and ONNX export.
 *
 * Node n is one of:
 * - LEAF:     `value[n*nOutputs .. +nOutputs]` is the prediction.
 * - NUMERIC:  x = feature `feature[n]`; go to `left[n]` when x <= threshold[n], else `right[n]`.
 * - SUBSET:   categorical; code c goes to `left[n]` when bit c of the bitset
 *             `catBits[offset[n] .. offset[n] + width[n])` is set, else `right[n]`.
 * - MULTIWAY: categorical; code c goes to `branches[offset[n] + c]` for 0 <= c < width[n].
 * Missing values (NaN, code -1) and categories unseen in training go to `missing[n]`: the direction
 * learned when the split was chosen (see DEVELOPERS.md, "Missing values").
 *
 * Every node, not just leaves, keeps `value` (what it would predict as a leaf), `cover` (training
 * weight reaching it), `count` (training rows reaching it) and `gain` (weighted impurity decrease of
 * its split, 0 at leaves). Node 0 is the root; children always have larger indices than parents.
 */
export const LEAF = 0;
export const NUMERIC = 1;
export const SUBSET = 2;
export const MULTIWAY = 3;
export type NodeKind = typeof LEAF | typeof NUMERIC | typeof SUBSET | typeof MULTIWAY;

export interface FlatTree {
  readonly nNodes: number;
  /** Values per node: 1 for regression or a raw boosting score, K for class probabilities. */
  readonly nOutputs: number;
  readonly kind: Uint8Array;
  readonly feature: Int32Array;
  readonly threshold: Float64Array;
  readonly left: Int32Array;
  readonly right: Int32Array;
  readonly missing: Int32Array;
  readonly offset: Int32Array;
  readonly width: Int32Array;
  readonly branches: Int32Array;
  readonly catBits: Uint32Array;
  readonly value: Float64Array;
  readonly cover: Float64Array;
  readonly count: Float64Array;
  readonly gain: Float64Array;
}

/** Per-feature accessors used by routing: numeric values or categorical codes (null when not that kind). */
export interface RowSource {
  readonly numeric: readonly (Float64Array | null)[];
  readonly codes: readonly (Int32Array | null)[];
}

/** The child of internal node `n` for row `row`. */
export function childOf(tree: FlatTree, n: number, src: RowSource, row: number): number {
  const f = tree.feature[n];
  switch (tree.kind[n]) {
    case NUMERIC: {
      const col = src.numeric[f];
      const x = col ? col[row] : NaN;
      if (x !== x) return tree.missing[n];
      return x <= tree.threshold[n] ? tree.left[n] : tree.right[n];
    }
    case SUBSET: {
      const codes = src.codes[f];
      const c = codes ? codes[row] : -1;
      if (c < 0 || c >= tree.width[n] * 32) return tree.missing[n];
      const word = tree.catBits[tree.offset[n] + (c >>> 5)];
      return (word >>> (c & 31)) & 1 ? tree.left[n] : tree.right[n];
    }
    case MULTIWAY: {
      const codes = src.codes[f];
      const c = codes ? codes[row] : -1;
      if (c < 0 || c >= tree.width[n]) return tree.missing[n];
      const child = tree.branches[tree.offset[n] + c];
      return child < 0 ? tree.missing[n] : child;
    }
    default:
      return -1;
  }
}

/** Index of the leaf that row `row` reaches. */
export function leafOf(tree: FlatTree, src: RowSource, row: number): number {
  let n = 0;
  while (tree.kind[n] !== LEAF) n = childOf(tree, n, src, row);
  return n;
}
