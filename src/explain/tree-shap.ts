/**
 * TreeSHAP: exact Shapley values of one tree's output for one row, in polynomial time (Lundberg, Erion &
 * Lee (2018) "Consistent individualized feature attribution for tree ensembles", arXiv:1802.03888,
 * Algorithm 2; Lundberg et al. (2020) "From local explanations to global understanding with explainable AI
 * for trees", Nature Machine Intelligence 2:56–67). The value of a feature set S is the tree's output with
 * the features in S fixed to the row's values and the others integrated out along the tree, each child
 * weighted by its share of the node's training cover.
 *
 * Generalised beyond binary splits: at any split (numeric, category subset, multiway) the child the row
 * takes ("hot") gets one-fraction 1 and every other child one-fraction 0; each child's zero-fraction is
 * its cover share (see `childShares`). Missing values follow `missing[n]`, as in prediction.
 */
import { childOf, LEAF, type FlatTree, type RowSource } from '../learn/flat-tree.js';
import { childShares } from './node-children.js';

/** A tree prepared for TreeSHAP: children, cover shares and depth, computed once. */
export interface ShapTree {
  readonly tree: FlatTree;
  /** Per-node value vectors, `width` per node. */
  readonly values: Float64Array;
  readonly width: number;
  readonly children: readonly (readonly number[])[];
  readonly shares: readonly (readonly number[])[];
  /** Expected output: values averaged over leaves under the cover distribution, `width` numbers. */
  readonly expected: Float64Array;
  /** Scratch path (feature, zero-fraction, one-fraction, weight), sized for the tree's depth. */
  readonly pd: Int32Array;
  readonly pz: Float64Array;
  readonly po: Float64Array;
  readonly pw: Float64Array;
}

/**
 * Prepare `tree` with per-node `values` (`width` per node) for `addTreeShap`.
 * @example
 * const st = prepareShapTree(tree, tree.value, tree.nOutputs);
 */
export function prepareShapTree(tree: FlatTree, values: Float64Array, width: number): ShapTree {
  const N = tree.nNodes;
  const children: number[][] = [], shares: number[][] = [];
  for (let n = 0; n < N; n++) {
    const s = childShares(tree, n);
    children.push(s.children);
    shares.push(s.shares);
  }
  const depth = new Int32Array(N);
  let maxDepth = 0;
  for (let n = 0; n < N; n++) {
    for (const c of children[n]) if (depth[n] + 1 > depth[c]) depth[c] = depth[n] + 1;
    if (depth[n] > maxDepth) maxDepth = depth[n];
  }
  // node expectations from the leaves up (children have larger indices than parents)
  const ev = new Float64Array(N * width);
  for (let n = N - 1; n >= 0; n--) {
    if (tree.kind[n] === LEAF) { for (let k = 0; k < width; k++) ev[n * width + k] = values[n * width + k]; continue; }
    const ch = children[n], sh = shares[n];
    for (let j = 0; j < ch.length; j++) for (let k = 0; k < width; k++) ev[n * width + k] += sh[j] * ev[ch[j] * width + k];
  }
  const size = ((maxDepth + 2) * (maxDepth + 3)) / 2 + 2;
  return {
    tree, values, width, children, shares, expected: ev.slice(0, width),
    pd: new Int32Array(size), pz: new Float64Array(size), po: new Float64Array(size), pw: new Float64Array(size),
  };
}

/** EXTEND: add (feature pi, zero-fraction pz, one-fraction po) to the path of L elements at s. */
function extend(t: ShapTree, s: number, L: number, pz: number, po: number, pi: number): void {
  const { pd, pw } = t;
  pd[s + L] = pi; t.pz[s + L] = pz; t.po[s + L] = po; pw[s + L] = L === 0 ? 1 : 0;
  for (let i = L - 1; i >= 0; i--) {
    pw[s + i + 1] += (po * pw[s + i] * (i + 1)) / (L + 1);
    pw[s + i] = (pz * pw[s + i] * (L - i)) / (L + 1);
  }
}

/** UNWIND: remove element k from the path of L + 1 elements at s (undoing its EXTEND). */
function unwind(t: ShapTree, s: number, L: number, k: number): void {
  const { pd, pz, po, pw } = t;
  const one = po[s + k], zero = pz[s + k];
  let next = pw[s + L];
  for (let i = L - 1; i >= 0; i--) {
    if (one !== 0) {
      const tmp = pw[s + i];
      pw[s + i] = (next * (L + 1)) / ((i + 1) * one);
      next = tmp - (pw[s + i] * zero * (L - i)) / (L + 1);
    } else {
      pw[s + i] = (pw[s + i] * (L + 1)) / (zero * (L - i));
    }
  }
  for (let i = k; i < L; i++) { pd[s + i] = pd[s + i + 1]; pz[s + i] = pz[s + i + 1]; po[s + i] = po[s + i + 1]; }
}

/** Sum of the path weights after unwinding element k, without changing the path. */
function unwoundSum(t: ShapTree, s: number, L: number, k: number): number {
  const { pz, po, pw } = t;
  const one = po[s + k], zero = pz[s + k];
  let total = 0, next = pw[s + L];
  for (let i = L - 1; i >= 0; i--) {
    if (one !== 0) {
      const tmp = (next * (L + 1)) / ((i + 1) * one);
      total += tmp;
      next = pw[s + i] - (tmp * zero * (L - i)) / (L + 1);
    } else {
      total += (pw[s + i] * (L + 1)) / (zero * (L - i));
    }
  }
  return total;
}

function recurse(
  t: ShapTree, src: RowSource, row: number, phi: Float64Array, at: number, stride: number,
  n: number, ps: number, plen: number, fz: number, fo: number, fi: number,
): void {
  const { pd, pz, po, pw } = t;
  const s = ps + plen;
  for (let i = 0; i < plen; i++) { pd[s + i] = pd[ps + i]; pz[s + i] = pz[ps + i]; po[s + i] = po[ps + i]; pw[s + i] = pw[ps + i]; }
  extend(t, s, plen, fz, fo, fi);
  let len = plen + 1;
  const tree = t.tree, W = t.width;
  if (tree.kind[n] === LEAF) {
    for (let i = 1; i < len; i++) {
      const w = unwoundSum(t, s, len - 1, i) * (po[s + i] - pz[s + i]);
      const o = pd[s + i] * stride + at;
      for (let k = 0; k < W; k++) phi[o + k] += w * t.values[n * W + k];
    }
    return;
  }
  const f = tree.feature[n];
  const hot = childOf(tree, n, src, row);
  let iz = 1, io = 1;
  for (let k = 1; k < len; k++) {
    if (pd[s + k] === f) { iz = pz[s + k]; io = po[s + k]; unwind(t, s, len - 1, k); len--; break; }
  }
  const ch = t.children[n], sh = t.shares[n];
  for (let j = 0; j < ch.length; j++) {
    const cz = iz * sh[j], co = ch[j] === hot ? io : 0;
    if (cz === 0 && co === 0) continue; // no subset of features reaches this child: it adds nothing
    recurse(t, src, row, phi, at, stride, ch[j], s, len, cz, co, f);
  }
}

/**
 * Add the Shapley values of tree `t` for row `row` into `phi`: feature j's value for output `at + k` goes
 * to `phi[j · stride + at + k]` (stride = number of outputs). Σ_j φ_j = output(row) − expected.
 * @example
 * const phi = new Float64Array(p * K);
 * addTreeShap(st, src, i, phi, K, 0);
 */
export function addTreeShap(t: ShapTree, src: RowSource, row: number, phi: Float64Array, stride: number, at: number): void {
  recurse(t, src, row, phi, at, stride, 0, 0, 0, 1, 1, -1);
}
