/**
 * Histograms of small nodes over their occupied bins only. A dense build clears and a dense scan walks all
 * 256 bins of every feature, whatever the node's size; a node of a few dozen rows touches at most that
 * many bins. Here the node's histograms are accumulated into a slot kept all-zero between uses (so every
 * reader of the slot sees the same numbers as after a dense build), the occupied bins of each feature are
 * listed in ascending order for the scan, and afterwards only those bins (and the missing bin) are zeroed.
 * The additions are the kernels' (src/kernels/ts-hist.ts), in the same row order, so the sums — and the
 * tree — are bit-for-bit those of the dense path (test/learn/hist/grow-histogram-sampled.test.ts).
 */
import { BINS, MISSING } from '../../kernels/layout.js';
import { viewsOf } from '../../kernels/views.js';
import type { HistWorkspace } from './hist-workspace.js';

let rowLimit = 48;

/**
 * Set the largest node (in rows) built over occupied bins; 0 turns the sparse path off. Returns the
 * previous limit (for tests and benchmarks comparing both paths).
 * __Default:__ 48 rows (common practice: below a few dozen rows the dense clear-and-scan of 256 bins per
 * feature costs more than the row loop).
 * @example
 * const before = setSparseRowLimit(0); // dense histograms everywhere
 * setSparseRowLimit(before);
 */
export function setSparseRowLimit(rows: number): number {
  const before = rowLimit;
  rowLimit = rows;
  return before;
}

/** Whether a node of `count` rows takes the sparse path. */
export function sparseFits(count: number): boolean {
  return count <= rowLimit;
}

/**
 * Occupied bins of one build: feature feats[k] has bins[k·stride .. k·stride + lens[k]), ascending, missing
 * excluded. The arrays are reused from build to build.
 */
export interface OccupiedBins {
  feats: readonly number[];
  bins: Int32Array;
  lens: Int32Array;
  stride: number;
  /** Per position i of the node: the bin of row i for the feature being built (scratch). */
  codes: Int32Array;
  /** 256-bit set of occupied bins (scratch, all zero between builds). */
  mark: Int32Array;
}

/** Empty reusable buffers. */
export function occupiedBuffers(): OccupiedBins {
  return { feats: [], bins: new Int32Array(0), lens: new Int32Array(0), stride: 0, codes: new Int32Array(0), mark: new Int32Array(BINS / 32) };
}

/**
 * Accumulate the histograms of `feats` over the gathered rows [start, start+count) into the all-zero slot
 * `hist` (layout of src/kernels/layout.ts), with the kernels' additions in row order; lists the occupied
 * bins in `occ`.
 * @example
 * buildSparse(ws, start, count, [0, 3], cleanSlot, occ);
 */
export function buildSparse(ws: HistWorkspace, start: number, count: number, feats: readonly number[], hist: number, occ: OccupiedBins): void {
  const { f64, i32, u8 } = viewsOf(ws.engine.arena.buffer);
  const stride = ws.stride, rows = (ws.rowsPtr >> 2) + start, gw = ws.gwPtr >> 3;
  if (occ.bins.length < feats.length * count) occ.bins = new Int32Array(Math.max(feats.length * count, 2 * occ.bins.length));
  if (occ.lens.length < feats.length) occ.lens = new Int32Array(Math.max(feats.length, 32));
  if (occ.codes.length < count) occ.codes = new Int32Array(Math.max(count, 64));
  occ.feats = feats;
  occ.stride = count;
  const { bins, lens, codes, mark } = occ;
  for (let k = 0; k < feats.length; k++) {
    const f = feats[k];
    const col = ws.codesPtr + f * ws.nRows, h = (hist >> 3) + f * BINS * stride;
    const base = k * count;
    // occupied bins as a 256-bit set, then listed in ascending order by lowest set bit
    for (let i = 0; i < count; i++) {
      const b = u8[col + i32[rows + i]];
      codes[i] = b;
      mark[b >>> 5] |= 1 << (b & 31);
    }
    mark[MISSING >>> 5] &= ~(1 << (MISSING & 31));
    let len = 0;
    for (let w = 0; w < 8; w++) {
      let x = mark[w];
      while (x !== 0) {
        const low = x & -x;
        bins[base + len++] = (w << 5) + 31 - Math.clz32(low);
        x ^= low;
      }
      mark[w] = 0;
    }
    lens[k] = len;
    if (ws.nClasses === 0) {
      const gs = ws.gxPtr >> 3;
      for (let i = 0; i < count; i++) {
        const p = h + codes[i] * 3;
        f64[p] = f64[p] + 1.0;
        f64[p + 1] = f64[p + 1] + f64[gw + i];
        f64[p + 2] = f64[p + 2] + f64[gs + i];
      }
    } else {
      const gc = ws.gxPtr >> 2;
      for (let i = 0; i < count; i++) {
        const p = h + codes[i] * stride;
        f64[p] = f64[p] + 1.0;
        const q = p + 1 + i32[gc + i];
        f64[q] = f64[q] + f64[gw + i];
      }
    }
  }
}

/** Zero the bins a sparse build wrote (occupied ones and the missing bin), leaving the slot all-zero again. */
export function clearSparse(ws: HistWorkspace, hist: number, occ: OccupiedBins): void {
  const { f64 } = viewsOf(ws.engine.arena.buffer);
  const stride = ws.stride;
  for (let k = 0; k < occ.feats.length; k++) {
    const h = (hist >> 3) + occ.feats[k] * BINS * stride;
    const base = k * occ.stride, end = base + occ.lens[k];
    for (let j = base; j < end; j++) {
      const p = h + occ.bins[j] * stride;
      for (let c = 0; c < stride; c++) f64[p + c] = 0;
    }
    const m = h + MISSING * stride;
    for (let c = 0; c < stride; c++) f64[m + c] = 0;
  }
}
