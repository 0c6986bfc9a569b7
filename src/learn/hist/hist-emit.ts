/**
 * Turning the histogram grower's node records into a FlatTree with the exact grower's numbering: nodes in
 * creation order, children created when their parent is expanded (so breadth-first when growth has no
 * leaf budget, expansion order when it is best-first), splits recorded in expansion order.
 */
import type { FlatTree } from '../flat-tree.js';
import { NUMERIC } from '../flat-tree.js';
import { TreeBuilder } from '../tree/tree-builder.js';

export interface NodeRecord {
  value: Float64Array;
  cover: number;
  count: number;
  start: number;
  size: number;
  /** Set when the node was split. */
  split: {
    kind: typeof NUMERIC | 2;
    feature: number;
    threshold: number;
    inLeft: Uint8Array | null;
    left: number;
    right: number;
    missingSlot: number;
    gain: number;
  } | null;
}

/**
 * Emit `nodes` (indexed by internal id) as a FlatTree. `order` lists internal ids in final numbering;
 * `expansions` lists split nodes (internal ids) in the order their splits are written.
 * Returns the tree and the final id of each internal id.
 */
export function emitTree(nodes: readonly NodeRecord[], order: readonly number[], expansions: readonly number[], nOutputs: number): { tree: FlatTree; finalId: Int32Array } {
  const finalId = new Int32Array(nodes.length);
  order.forEach((internal, i) => { finalId[internal] = i; });
  const b = new TreeBuilder(nOutputs);
  for (const internal of order) { const n = nodes[internal]; b.addLeaf(n.value, n.cover, n.count); }
  for (const internal of expansions) {
    const s = nodes[internal].split;
    if (!s) continue;
    const l = finalId[s.left], r = finalId[s.right], miss = s.missingSlot === 0 ? l : r;
    if (s.kind === NUMERIC) b.setNumeric(finalId[internal], s.feature, s.threshold, l, r, miss, s.gain);
    else b.setSubset(finalId[internal], s.feature, s.inLeft as Uint8Array, l, r, miss, s.gain);
  }
  return { tree: b.finish(), finalId };
}

/** Breadth-first order of the internal ids (left child before right). */
export function breadthFirst(nodes: readonly NodeRecord[]): number[] {
  const out = [0];
  for (let q = 0; q < out.length; q++) {
    const s = nodes[out[q]].split;
    if (s) out.push(s.left, s.right);
  }
  return out;
}
