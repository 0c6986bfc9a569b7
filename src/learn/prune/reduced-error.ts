/**
 * Reduced-error pruning (Quinlan, J.R. (1987) "Simplifying decision trees", International Journal of
 * Man-Machine Studies 27:221–234): with rows held out from training, visit internal nodes bottom-up
 * (children before parents) and replace a node's subtree by a leaf whenever the held-out error of the
 * leaf is no larger than that of the (already pruned) subtree.
 *
 * Ties prune (the smaller tree is preferred at equal error), so nodes no held-out row reaches are
 * pruned too. Errors are weighted sums: misclassified weight for classification, squared error for
 * regression (see node-losses.ts). A tolerance of 1e-12 relative to the subtree error absorbs rounding.
 */
import type { Dataset } from '../../table/frame.js';
import { LEAF } from '../flat-tree.js';
import type { TreeModel } from '../tree-model.js';
import { childrenOf, collapseTree, depthsOf, leafCount } from './collapse.js';
import { nodeLosses } from './node-losses.js';

/** One candidate (internal node of the unpruned tree) of the pruning table. */
export interface PruningRow {
  readonly node: number;
  readonly depth: number;
  /** Training rows reaching the node. */
  readonly trainRows: number;
  /** Held-out rows reaching the node. */
  readonly heldOutRows: number;
  /** Held-out error (weighted sum) if the node were a leaf. */
  readonly errorAsLeaf: number;
  /** Held-out error (weighted sum) of the node's subtree, after pruning below it. */
  readonly errorWithSubtree: number;
  readonly decision: 'prune' | 'keep';
  /** True when an ancestor was pruned, so this node is gone whatever its own decision. */
  readonly removedWithAncestor: boolean;
}

export interface PruningSummary {
  readonly nodesBefore: number;
  readonly nodesAfter: number;
  readonly leavesBefore: number;
  readonly leavesAfter: number;
  readonly heldOutRows: number;
  /** Held-out error as a share of held-out weight, before and after pruning. */
  readonly heldOutErrorBefore: number;
  readonly heldOutErrorAfter: number;
}

export interface ReducedErrorResult {
  readonly model: TreeModel;
  /** One row per internal node of the unpruned tree, in node order. */
  readonly table: PruningRow[];
  readonly summary: PruningSummary;
}

/**
 * Prune `model` by reduced-error pruning on `heldOut` rows (not used in training).
 * @example
 * const { model: pruned, table, summary } = pruneReducedError(model, validation);
 */
export function pruneReducedError(model: TreeModel, heldOut: Dataset): ReducedErrorResult {
  const tree = model.tree;
  const losses = nodeLosses(model, heldOut);
  const nNodes = tree.nNodes;
  const err = new Float64Array(nNodes); // held-out error of the node's current (pruned) subtree
  const subtreeErr = new Float64Array(nNodes);
  const pruned = new Uint8Array(nNodes);
  const errBefore = new Float64Array(nNodes);
  for (let n = nNodes - 1; n >= 0; n--) {
    if (tree.kind[n] === LEAF) { err[n] = losses.asLeaf[n]; errBefore[n] = err[n]; continue; }
    let s = 0, s0 = 0;
    for (const c of childrenOf(tree, n)) { s += err[c]; s0 += errBefore[c]; }
    subtreeErr[n] = s;
    errBefore[n] = s0;
    if (losses.asLeaf[n] <= s + 1e-12 * Math.abs(s)) { pruned[n] = 1; err[n] = losses.asLeaf[n]; }
    else err[n] = s;
  }
  const depth = depthsOf(tree);
  const gone = new Uint8Array(nNodes);
  for (let n = 0; n < nNodes; n++) if (pruned[n] || gone[n]) for (const c of childrenOf(tree, n)) gone[c] = 1;
  const table: PruningRow[] = [];
  for (let n = 0; n < nNodes; n++) {
    if (tree.kind[n] === LEAF) continue;
    table.push({
      node: n, depth: depth[n], trainRows: tree.count[n], heldOutRows: losses.rows[n],
      errorAsLeaf: losses.asLeaf[n], errorWithSubtree: subtreeErr[n], decision: pruned[n] ? 'prune' : 'keep',
      removedWithAncestor: gone[n] === 1,
    });
  }
  const prunedTree = collapseTree(tree, pruned);
  const w = losses.totalWeight;
  const summary: PruningSummary = {
    nodesBefore: nNodes, nodesAfter: prunedTree.nNodes,
    leavesBefore: leafCount(tree), leavesAfter: leafCount(prunedTree),
    heldOutRows: losses.rows[0],
    heldOutErrorBefore: w > 0 ? errBefore[0] / w : 0,
    heldOutErrorAfter: w > 0 ? err[0] / w : 0,
  };
  return {
    model: { ...model, tree: prunedTree, settings: { ...model.settings, pruning: { method: 'reducedError', heldOutRows: summary.heldOutRows } } },
    table, summary,
  };
}
