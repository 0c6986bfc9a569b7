/**
 * After leaf values are replaced (boosting line search or Newton step), give every internal node the
 * cover-weighted mean of its children's values, so `value` keeps meaning "what this node would predict
 * as a leaf" (src/learn/flat-tree.ts). Children always have larger indices than parents, so one pass
 * from the last node to the first suffices.
 */
import { LEAF, MULTIWAY, type FlatTree } from '../flat-tree.js';

function childrenOf(tree: FlatTree, n: number): number[] {
  const out = new Set<number>();
  if (tree.kind[n] === MULTIWAY) {
    for (let j = 0; j < tree.width[n]; j++) { const c = tree.branches[tree.offset[n] + j]; if (c >= 0) out.add(c); }
  } else {
    out.add(tree.left[n]); out.add(tree.right[n]);
  }
  if (tree.missing[n] >= 0) out.add(tree.missing[n]);
  return [...out];
}

/**
 * Recompute internal node values from the leaves up (in place).
 * @example
 * tree.value[leaf] = 0.3; refreshInnerValues(tree);
 */
export function refreshInnerValues(tree: FlatTree): void {
  const K = tree.nOutputs;
  for (let n = tree.nNodes - 1; n >= 0; n--) {
    if (tree.kind[n] === LEAF) continue;
    const kids = childrenOf(tree, n);
    let cw = 0;
    for (const c of kids) cw += tree.cover[c];
    for (let k = 0; k < K; k++) {
      let s = 0;
      for (const c of kids) s += (cw > 0 ? tree.cover[c] / cw : 1 / kids.length) * tree.value[c * K + k];
      tree.value[n * K + k] = s;
    }
  }
}
