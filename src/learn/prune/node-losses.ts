/**
 * Per-node losses of a tree on a labelled dataset: every row is routed from the root to its leaf and,
 * at every node on the way, counted and charged the loss of that node's own prediction — what the
 * node would cost as a leaf. Losses are weighted: misclassification (weight when the node's most
 * probable class, ties to the lower class index, is wrong) or squared error (weight × (y − value)²).
 * Rows with a missing target are skipped.
 */
import { errors } from '../../errors.js';
import type { Dataset } from '../../table/frame.js';
import { childOf, LEAF } from '../flat-tree.js';
import { rowSourceFor } from '../tree/row-source.js';
import type { TreeModel } from '../tree-model.js';

export interface NodeLosses {
  /** Rows reaching each node. */
  readonly rows: Float64Array;
  /** Weight reaching each node. */
  readonly weight: Float64Array;
  /** Weighted loss of each node's own prediction over the rows reaching it. */
  readonly asLeaf: Float64Array;
  /** Total weight of the rows with a known target. */
  readonly totalWeight: number;
  /** Loss of node `n`'s prediction on row `i` (unweighted); used for per-row errors. */
  readonly loss: (n: number, i: number) => number;
  /** Node path of row `i` from the root to its leaf ([] when its target is missing). */
  readonly path: (i: number) => number[];
  /** Weight of row `i` (0 when its target is missing). */
  readonly rowWeight: Float64Array;
}

/** Check `data` carries the model's kind of target (and the same classes). */
export function checkTarget(model: TreeModel, data: Dataset): void {
  const t = data.target;
  if (model.task === 'classification') {
    if (t.kind !== 'class') throw errors.schemaMismatch(`target ${JSON.stringify(t.name)} holds numbers, the model predicts classes`);
    const want = model.target.classes ?? [];
    if (t.classes.length !== want.length || t.classes.some((c, i) => c !== want[i])) {
      throw errors.schemaMismatch(`target ${JSON.stringify(t.name)} has classes ${JSON.stringify(t.classes)}, the model ${JSON.stringify(want)}`);
    }
  } else if (t.kind !== 'number') {
    throw errors.schemaMismatch(`target ${JSON.stringify(t.name)} holds classes, the model predicts numbers`);
  }
}

/**
 * Route every row of `data` through `model.tree` and sum losses per node.
 * @example
 * const { rows, asLeaf } = nodeLosses(model, validation);
 */
export function nodeLosses(model: TreeModel, data: Dataset, tree = model.tree): NodeLosses {
  checkTarget(model, data);
  const src = rowSourceFor(model.features, data.features);
  const n = data.features.nRows, k = tree.nOutputs;
  const t = data.target;
  const predicted = new Int32Array(tree.nNodes);
  for (let v = 0; v < tree.nNodes; v++) {
    let best = 0;
    for (let j = 1; j < k; j++) if (tree.value[v * k + j] > tree.value[v * k + best]) best = j;
    predicted[v] = best;
  }
  const known = (i: number): boolean => (t.kind === 'class' ? t.codes[i] >= 0 : t.values[i] === t.values[i]);
  const loss = (v: number, i: number): number => {
    if (t.kind === 'class') return predicted[v] === t.codes[i] ? 0 : 1;
    const d = t.values[i] - tree.value[v];
    return d * d;
  };
  const rowWeight = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const w = data.weights ? data.weights[i] : 1;
    if (!(w >= 0) || w === Infinity) throw errors.badValue('weights', i, w, 'a finite weight >= 0');
    rowWeight[i] = known(i) ? w : 0;
  }
  const path = (i: number): number[] => {
    if (!known(i)) return [];
    const p = [0];
    let v = 0;
    while (tree.kind[v] !== LEAF) { v = childOf(tree, v, src, i); p.push(v); }
    return p;
  };
  const rows = new Float64Array(tree.nNodes), weight = new Float64Array(tree.nNodes), asLeaf = new Float64Array(tree.nNodes);
  let totalWeight = 0;
  for (let i = 0; i < n; i++) {
    if (!known(i)) continue;
    const w = rowWeight[i];
    totalWeight += w;
    let v = 0;
    for (;;) {
      rows[v]++; weight[v] += w; asLeaf[v] += w * loss(v, i);
      if (tree.kind[v] === LEAF) break;
      v = childOf(tree, v, src, i);
    }
  }
  return { rows, weight, asLeaf, totalWeight, loss, path, rowWeight };
}
