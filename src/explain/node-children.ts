/**
 * The distinct children of an internal node and the share of training cover each one holds: the weights
 * TreeSHAP and the expected value use for "feature not known" (Lundberg, Erion & Lee 2018, Algorithm 2,
 * r_c / r_j).
 */
import { LEAF, MULTIWAY, type FlatTree } from '../learn/flat-tree.js';

/**
 * Distinct children of node `n` (every branch target and the missing-value child) with their cover
 * shares, which sum to 1: `cover[c] / Σ cover[children]`, or equal shares when no child has cover (a node
 * no training row reached). A leaf has none.
 * @example
 * const { children, shares } = childShares(tree, 0); // root's children and their cover fractions
 */
export function childShares(tree: FlatTree, n: number): { children: number[]; shares: number[] } {
  if (tree.kind[n] === LEAF) return { children: [], shares: [] };
  const set = new Set<number>();
  if (tree.kind[n] === MULTIWAY) {
    for (let j = 0; j < tree.width[n]; j++) {
      const c = tree.branches[tree.offset[n] + j];
      if (c >= 0) set.add(c);
    }
  } else {
    set.add(tree.left[n]);
    set.add(tree.right[n]);
  }
  if (tree.missing[n] >= 0) set.add(tree.missing[n]);
  const children = [...set];
  let total = 0;
  for (const c of children) total += Math.max(0, tree.cover[c]);
  const shares = children.map((c) => (total > 0 ? Math.max(0, tree.cover[c]) / total : 1 / children.length));
  return { children, shares };
}
