/**
 * The weakest-link sequence of cost-complexity pruning (Breiman, Friedman, Olshen & Stone 1984,
 * Classification and Regression Trees, ch. 3, §3.3): for the cost R_α(T) = R(T) + α·|leaves(T)|,
 * repeatedly collapse the internal node(s) t with the smallest
 *   g(t) = (R(t) − R(T_t)) / (|leaves(T_t)| − 1),
 * giving nested subtrees T_0 ⊃ T_1 ⊃ … ⊃ {root} and increasing α_0 = 0 < α_1 < … . Step 0 collapses
 * the nodes with g(t) <= 0 (splits that do not lower the training risk), Breiman's T_1.
 * R is the training risk: weighted misclassification or squared error over the training weight.
 * Each pass is linear in the tree size, so the path costs O(nodes × steps).
 */
import type { Dataset } from '../../table/frame.js';
import { LEAF } from '../flat-tree.js';
import type { TreeModel } from '../tree-model.js';
import { childrenOf } from './collapse.js';
import { nodeLosses } from './node-losses.js';

export interface ComplexityStep {
  /** Complexity parameter α at which this subtree becomes optimal. */
  readonly alpha: number;
  readonly leaves: number;
  readonly nodes: number;
  /** Training risk R(T) (share of training weight: error rate or mean squared error). */
  readonly trainingRisk: number;
}

export interface ComplexityPath {
  readonly steps: ComplexityStep[];
  /** α at which each internal node is collapsed (Infinity for leaves and a root never collapsed). */
  readonly collapseAt: Float64Array;
}

/**
 * The weakest-link pruning sequence of `model.tree`, with risks measured on `train` (the rows the
 * tree was grown on).
 * @example
 * const { steps } = costComplexityPath(model, train); // [{ alpha: 0, leaves: 12, ... }, ...]
 */
export function costComplexityPath(model: TreeModel, train: Dataset): ComplexityPath {
  const tree = model.tree;
  const losses = nodeLosses(model, train);
  const total = losses.totalWeight > 0 ? losses.totalWeight : 1;
  const risk = Float64Array.from(losses.asLeaf, (x) => x / total);
  const nNodes = tree.nNodes;
  const children = Array.from({ length: nNodes }, (_, n) => childrenOf(tree, n));
  const collapsed = new Uint8Array(nNodes);
  const collapseAt = new Float64Array(nNodes).fill(Infinity);
  const subRisk = new Float64Array(nNodes), subLeaves = new Float64Array(nNodes), subNodes = new Float64Array(nNodes);
  const g = new Float64Array(nNodes);
  const steps: ComplexityStep[] = [];

  /** Bottom-up pass over the current tree (children have larger indices); returns the smallest g. */
  const pass = (): number => {
    let minG = Infinity;
    for (let n = nNodes - 1; n >= 0; n--) {
      if (tree.kind[n] === LEAF || collapsed[n]) { subRisk[n] = risk[n]; subLeaves[n] = 1; subNodes[n] = 1; g[n] = Infinity; continue; }
      let r = 0, l = 0, k = 1;
      for (const c of children[n]) { r += subRisk[c]; l += subLeaves[c]; k += subNodes[c]; }
      subRisk[n] = r; subLeaves[n] = l; subNodes[n] = k;
      g[n] = (risk[n] - r) / (l - 1);
      if (g[n] < minG) minG = g[n];
    }
    return minG;
  };
  const collapse = (n: number, alpha: number): void => {
    collapsed[n] = 1;
    if (collapseAt[n] === Infinity) collapseAt[n] = alpha;
    for (const c of children[n]) if (tree.kind[c] !== LEAF && !collapsed[c]) collapse(c, alpha);
  };
  /** Collapse every weakest link (g within rounding of `cut`) at `alpha`, then record the subtree. */
  const step = (cut: number, alpha: number): void => {
    const tol = 1e-12 * Math.max(Math.abs(cut), Math.abs(subRisk[0]), 1e-300);
    for (let n = 0; n < nNodes; n++) if (tree.kind[n] !== LEAF && !collapsed[n] && g[n] <= cut + tol) collapse(n, alpha);
    let leaves = 0, nodes = 0, r = 0;
    const stack = [0];
    while (stack.length) {
      const n = stack.pop() as number;
      nodes++;
      if (tree.kind[n] === LEAF || collapsed[n]) { leaves++; r += risk[n]; continue; }
      for (const c of children[n]) stack.push(c);
    }
    steps.push({ alpha, leaves, nodes, trainingRisk: r });
  };

  pass();
  step(0, 0); // T_1: drop splits that do not lower the training risk
  while (tree.kind[0] !== LEAF && !collapsed[0]) {
    const cut = pass();
    step(cut, cut);
  }
  return { steps, collapseAt };
}
