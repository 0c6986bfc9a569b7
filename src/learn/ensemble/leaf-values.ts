/**
 * Set the leaf values of a boosting tree from its training rows (`GrowResult.leafOfRow`), by the loss's
 * leaf rule (src/learn/ensemble/loss/loss.ts): a weighted ratio (line search for squared error, Newton
 * step otherwise) or a group statistic (median, quantile, Huber step). Each value is multiplied by the
 * round's step; a leaf whose denominator is 0 gets 0.
 */
import { LEAF, type FlatTree } from '../flat-tree.js';
import type { Loss } from './loss/loss.js';

/** Scratch buffers reused across rounds (no per-round allocation of n-sized arrays). */
export interface LeafScratch {
  readonly num: Float64Array;
  readonly den: Float64Array;
  readonly rows: Int32Array;
}

export function createLeafScratch(n: number): LeafScratch {
  return { num: new Float64Array(n), den: new Float64Array(n), rows: new Int32Array(n) };
}

/**
 * Overwrite the leaf values of `tree` (single output) for output `k` of `loss`, scaled by `step`.
 * For a ratio loss the per-row terms are computed here; `ratioLeafValues` takes them ready-made.
 * @example
 * setLeafValues(tree, leafOfRow, loss, y, F, w, 0, residuals, 0.1, scratch);
 */
export function setLeafValues(
  tree: FlatTree, leafOfRow: Int32Array, loss: Loss, y: Float64Array, F: Float64Array, w: Float64Array,
  k: number, r: Float64Array, step: number, scratch: LeafScratch,
): void {
  if (loss.leafRule === 'ratio') {
    loss.leafTerms(y, F, k, r, scratch.num, scratch.den);
    ratioLeafValues(tree, leafOfRow, w, scratch.num, scratch.den, step * loss.ratioScale);
    return;
  }
  // group rule: bucket rows by leaf (counting sort), then one statistic per leaf
  const nn = tree.nNodes, n = leafOfRow.length;
  const start = new Int32Array(nn + 1);
  for (let i = 0; i < n; i++) if (leafOfRow[i] >= 0) start[leafOfRow[i] + 1]++;
  for (let l = 0; l < nn; l++) start[l + 1] += start[l];
  const fill = start.slice(0, nn);
  for (let i = 0; i < n; i++) { const l = leafOfRow[i]; if (l >= 0) scratch.rows[fill[l]++] = i; }
  for (let l = 0; l < nn; l++) {
    if (tree.kind[l] !== LEAF) continue;
    const v = start[l + 1] > start[l] ? loss.leafValue(y, F, w, scratch.rows, start[l], start[l + 1]) : NaN;
    tree.value[l] = v === v ? step * v : 0;
  }
}

/**
 * Leaf l gets scale · Σ w·num / Σ w·den over its rows (rows with leaf −1 or weight <= 0 are skipped);
 * 0 when the denominator is not positive.
 * @example
 * ratioLeafValues(tree, leafOfRow, w, residuals, hessians, 0.1); // one Newton step per leaf, shrunk by 0.1
 */
export function ratioLeafValues(
  tree: FlatTree, leafOfRow: Int32Array, w: Float64Array, num: Float64Array, den: Float64Array, scale: number,
): void {
  const nn = tree.nNodes, n = leafOfRow.length;
  const a = new Float64Array(nn), b = new Float64Array(nn);
  for (let i = 0; i < n; i++) {
    const l = leafOfRow[i];
    if (l < 0 || !(w[i] > 0)) continue;
    a[l] += w[i] * num[i];
    b[l] += w[i] * den[i];
  }
  for (let l = 0; l < nn; l++) {
    if (tree.kind[l] !== LEAF) continue;
    tree.value[l] = b[l] > 1e-300 ? scale * (a[l] / b[l]) : 0;
  }
}
