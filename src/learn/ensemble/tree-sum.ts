/**
 * Add one tree's leaf values into a score buffer, row by row (typed arrays, no per-row objects).
 */
import { leafOf, type FlatTree, type RowSource } from '../flat-tree.js';

/**
 * out[i·stride + at + k] += scale · value(leaf of row i)[k] for every row i in 0..n−1 and every output k
 * of the tree (k < tree.nOutputs). Rows with `skip[i]` set are left alone.
 * @example
 * addTreeValues(tree, src, n, scores, 1, 0, 0.1); // boosting: add a shrunken tree
 */
export function addTreeValues(
  tree: FlatTree, src: RowSource, n: number, out: Float64Array, stride: number, at: number, scale = 1,
  skip: Uint8Array | null = null,
): void {
  const K = tree.nOutputs, v = tree.value;
  for (let i = 0; i < n; i++) {
    if (skip && skip[i]) continue;
    const leaf = leafOf(tree, src, i);
    const o = i * stride + at;
    for (let k = 0; k < K; k++) out[o + k] += scale * v[leaf * K + k];
  }
}

/** Index of the largest entry of `a[o .. o+K)` (ties: the lowest index). */
export function argmaxAt(a: Float64Array, o: number, K: number): number {
  let best = 0;
  for (let k = 1; k < K; k++) if (a[o + k] > a[o + best]) best = k;
  return best;
}
