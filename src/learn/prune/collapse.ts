/**
 * Subtrees of a flat tree: the children of a node, and a copy of a tree with chosen internal nodes
 * turned into leaves (their descendants dropped). Kept nodes stay in their original order, so children
 * still come after their parents; a collapsed node keeps its value, cover and count, with gain 0.
 */
import { LEAF, MULTIWAY, SUBSET, type FlatTree } from '../flat-tree.js';
import { TreeBuilder } from '../tree/tree-builder.js';

/**
 * Distinct children of node `n` (none for a leaf), in ascending index order.
 * @example
 * childrenOf(tree, 0); // e.g. [1, 2]
 */
export function childrenOf(tree: FlatTree, n: number): number[] {
  switch (tree.kind[n]) {
    case LEAF:
      return [];
    case MULTIWAY: {
      const set = new Set<number>([tree.missing[n]]);
      for (let c = 0; c < tree.width[n]; c++) { const b = tree.branches[tree.offset[n] + c]; if (b >= 0) set.add(b); }
      return [...set].sort((a, b) => a - b);
    }
    default:
      return tree.left[n] === tree.right[n] ? [tree.left[n]] : [tree.left[n], tree.right[n]].sort((a, b) => a - b);
  }
}

/** Depth of every node (root 0). */
export function depthsOf(tree: FlatTree): Int32Array {
  const d = new Int32Array(tree.nNodes);
  for (let n = 0; n < tree.nNodes; n++) for (const c of childrenOf(tree, n)) d[c] = d[n] + 1;
  return d;
}

/**
 * Number of leaves.
 * @example
 * leafCount(model.tree); // e.g. 7
 */
export function leafCount(tree: FlatTree): number {
  let k = 0;
  for (let n = 0; n < tree.nNodes; n++) if (tree.kind[n] === LEAF) k++;
  return k;
}

/**
 * A copy of `tree` where every node with `collapse[n]` set is a leaf (descendants removed).
 * @example
 * const stump = collapseTree(tree, Array.from({ length: tree.nNodes }, (_, n) => n > 0));
 */
export function collapseTree(tree: FlatTree, collapse: ArrayLike<number | boolean>): FlatTree {
  const keep = new Uint8Array(tree.nNodes);
  const isLeaf = new Uint8Array(tree.nNodes);
  keep[0] = 1;
  for (let n = 0; n < tree.nNodes; n++) {
    if (!keep[n]) continue;
    if (tree.kind[n] === LEAF || collapse[n]) { isLeaf[n] = 1; continue; }
    for (const c of childrenOf(tree, n)) keep[c] = 1;
  }
  const newId = new Int32Array(tree.nNodes).fill(-1);
  let next = 0;
  for (let n = 0; n < tree.nNodes; n++) if (keep[n]) newId[n] = next++;
  const k = tree.nOutputs;
  const b = new TreeBuilder(k);
  for (let n = 0; n < tree.nNodes; n++) {
    if (keep[n]) b.addLeaf(tree.value.subarray(n * k, (n + 1) * k), tree.cover[n], tree.count[n]);
  }
  for (let n = 0; n < tree.nNodes; n++) {
    if (!keep[n] || isLeaf[n]) continue;
    const id = newId[n], f = tree.feature[n], g = tree.gain[n], miss = newId[tree.missing[n]];
    if (tree.kind[n] === MULTIWAY) {
      const branchOf: number[] = [];
      for (let c = 0; c < tree.width[n]; c++) { const x = tree.branches[tree.offset[n] + c]; branchOf.push(x < 0 ? -1 : newId[x]); }
      b.setMultiway(id, f, branchOf, miss, g);
    } else if (tree.kind[n] === SUBSET) {
      const bits: number[] = [];
      for (let c = 0; c < tree.width[n] * 32; c++) bits.push((tree.catBits[tree.offset[n] + (c >>> 5)] >>> (c & 31)) & 1);
      b.setSubset(id, f, bits, newId[tree.left[n]], newId[tree.right[n]], miss, g);
    } else {
      b.setNumeric(id, f, tree.threshold[n], newId[tree.left[n]], newId[tree.right[n]], miss, g);
    }
  }
  return b.finish();
}
