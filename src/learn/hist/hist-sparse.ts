/**
 * Histograms of small nodes over their occupied bins only. A dense build clears and a dense scan walks all
 * 256 bins of every feature, whatever the node's size; a node of a few dozen rows touches at most that
 * many bins. Here the node's histograms are accumulated into a slot kept all-zero between uses (so every
 * reader of the slot sees the same numbers as after a dense build), the occupied bins of each feature are
 * listed in ascending order for the scan (kernels `histValueSparse`, `scanValueList`), and afterwards only
 * those bins and the missing bin are zeroed. The additions are the dense kernels', in the same row order,
 * so the sums — and the tree — are bit-for-bit those of the dense path
 * (test/learn/hist/grow-histogram-sampled.test.ts). Class responses use the same lists, built here.
 */
import { BINS, MISSING } from '../../kernels/layout.js';
import { drainOccupiedBins } from '../../kernels/ts-sparse.js';
import { viewsOf } from '../../kernels/views.js';
import type { HistWorkspace } from './hist-workspace.js';

/** Largest node the list region below can hold (its rows × features fit in one histogram slot). */
const MAX_ROWS = 512;
let rowLimit = 48;

/**
 * Set the largest node (in rows, at most 512) built over occupied bins; 0 turns the sparse path off.
 * Returns the previous limit (for tests and benchmarks comparing both paths).
 * __Default:__ 48 rows (common practice: below a few dozen rows the dense clear-and-scan of 256 bins per
 * feature costs more than the row loop).
 * @example
 * const before = setSparseRowLimit(0); // dense histograms everywhere
 * setSparseRowLimit(before);
 */
export function setSparseRowLimit(rows: number): number {
  const before = rowLimit;
  rowLimit = Math.min(MAX_ROWS, rows);
  return before;
}

/** Whether a node of `count` rows takes the sparse path. */
export function sparseFits(count: number): boolean {
  return count <= rowLimit;
}

/**
 * Occupied bins of the current sparse build, in arena memory: the k-th built feature has `len(k)` bins
 * (i32, ascending, missing excluded) at binsPtr + k·count·4.
 */
export interface OccupiedBins {
  feats: readonly number[];
  count: number;
  readonly binsPtr: number;
  readonly lensPtr: number;
  /** 32 bytes, zero between builds (a 256-bit set). */
  readonly markPtr: number;
}

/** The list region of a run, carved from one histogram slot of `ws` (released with the workspace). */
export function occupiedRegion(ws: HistWorkspace): OccupiedBins {
  const slot = ws.takeSlot();
  const nFeat = Math.max(1, ws.nFeat);
  // a slot holds nFeat·256·stride doubles (stride ≥ 2): room for the lists, their lengths and the set
  const lensPtr = slot + nFeat * MAX_ROWS * 4, markPtr = lensPtr + nFeat * 4;
  ws.engine.arena.u8(markPtr, 32).fill(0);
  return { feats: [], count: 0, binsPtr: slot, lensPtr, markPtr };
}

/** Number of occupied bins of the k-th built feature. */
export function occupiedLength(ws: HistWorkspace, occ: OccupiedBins, k: number): number {
  return viewsOf(ws.engine.arena.buffer).i32[(occ.lensPtr >> 2) + k];
}

/**
 * Accumulate the histograms of `feats` over the gathered rows [start, start+count) into the all-zero slot
 * `hist` (layout of src/kernels/layout.ts), with the dense kernels' additions in row order, and list the
 * occupied bins in `occ`. `feats` must already be at ws.featsPtr.
 * @example
 * buildSparse(ws, start, count, [0, 3], cleanSlot, occ);
 */
export function buildSparse(ws: HistWorkspace, start: number, count: number, feats: readonly number[], hist: number, occ: OccupiedBins): void {
  occ.feats = feats;
  occ.count = count;
  const rowsPtr = ws.rowsPtr + start * 4;
  if (ws.nClasses === 0) {
    ws.engine.kernels.histValueSparse(ws.codesPtr, ws.nRows, rowsPtr, count, ws.gwPtr, ws.gxPtr, ws.featsPtr, feats.length, hist, occ.binsPtr, occ.lensPtr, occ.markPtr);
    return;
  }
  const { f64, i32, u32, u8 } = viewsOf(ws.engine.arena.buffer);
  const stride = ws.stride, rows = rowsPtr >> 2, gw = ws.gwPtr >> 3, gc = ws.gxPtr >> 2, mark = occ.markPtr >> 2;
  for (let k = 0; k < feats.length; k++) {
    const col = ws.codesPtr + feats[k] * ws.nRows, h = (hist >> 3) + feats[k] * BINS * stride;
    for (let i = 0; i < count; i++) {
      const b = u8[col + i32[rows + i]];
      u32[mark + (b >>> 5)] |= 1 << (b & 31);
      const p = h + b * stride;
      f64[p] = f64[p] + 1.0;
      const q = p + 1 + i32[gc + i];
      f64[q] = f64[q] + f64[gw + i];
    }
    i32[(occ.lensPtr >> 2) + k] = drainOccupiedBins(u32, i32, mark, (occ.binsPtr >> 2) + k * count);
  }
}

/** Ascending occupied bins of the k-th built feature (a copy). */
export function occupiedList(ws: HistWorkspace, occ: OccupiedBins, k: number): number[] {
  const i32 = viewsOf(ws.engine.arena.buffer).i32, from = (occ.binsPtr >> 2) + k * occ.count;
  return Array.from(i32.subarray(from, from + i32[(occ.lensPtr >> 2) + k]));
}

/** Zero the bins a sparse build wrote (occupied ones and the missing bin), leaving the slot all-zero again. */
export function clearSparse(ws: HistWorkspace, hist: number, occ: OccupiedBins): void {
  const { f64, i32 } = viewsOf(ws.engine.arena.buffer);
  const stride = ws.stride;
  for (let k = 0; k < occ.feats.length; k++) {
    const h = (hist >> 3) + occ.feats[k] * BINS * stride;
    const base = (occ.binsPtr >> 2) + k * occ.count, end = base + i32[(occ.lensPtr >> 2) + k];
    for (let j = base; j < end; j++) {
      const p = h + i32[j] * stride;
      for (let c = 0; c < stride; c++) f64[p + c] = 0;
    }
    const m = h + MISSING * stride;
    for (let c = 0; c < stride; c++) f64[m + c] = 0;
  }
}
