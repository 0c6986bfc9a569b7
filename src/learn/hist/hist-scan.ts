/**
 * Best split of one feature from its histogram at one node — the binned counterpart of the exact
 * grower's scans (src/learn/tree/scan-numeric.ts, scan-categorical.ts), with the same rules: rows
 * missing the feature are left out of the scan, candidates must leave `leafRows` rows and `leafWeight`
 * weight of known rows on each side, the first best candidate wins ties (within `tol`).
 *
 * Channels as in the exact grower: class weights per class, or [W, Σw·(y - node mean)] for values.
 * - numeric: a threshold after each non-empty bin (the value scan runs in the kernels);
 * - categorical: a subset split; non-empty bins ordered by mean response (values), the proportion of
 *   class 1 (two classes) or of the node's most frequent class (more), then scanned in that order
 *   (Fisher 1958; Breiman, Friedman, Olshen & Stone 1984, §4.2.2 and §8.8). Ties in order: lower bin.
 */
import { BINS, MISSING } from '../../kernels/layout.js';
import { viewsOf } from '../../kernels/views.js';
import { NUMERIC, SUBSET } from '../flat-tree.js';
import { ENTROPY, GINI, channelWeight, weightedImpurity, type ImpurityCode } from '../tree/impurity.js';
import { occupiedLength, occupiedList, type OccupiedBins } from './hist-sparse.js';
import type { HistWorkspace } from './hist-workspace.js';

export interface HistChoice {
  readonly feature: number;
  readonly kind: typeof NUMERIC | typeof SUBSET;
  /** Numeric: the last bin going left. */
  readonly bin: number;
  /** Subset: 1 for each bin going left (length 256). */
  readonly leftBins: Uint8Array | null;
  /** Channels of the known rows per side (2 × nCh). */
  readonly slotStats: Float64Array;
  readonly slotRows: Float64Array;
  readonly missingStats: Float64Array;
  readonly missingRows: number;
  readonly score: number;
}

/** What a scan needs to know about the node. */
export interface ScanNode {
  readonly ws: HistWorkspace;
  readonly measure: ImpurityCode;
  readonly nCh: number;
  readonly histPtr: number;
  /** Node mean (value response; 0 for classes). */
  readonly mean: number;
  readonly leafRows: number;
  readonly leafWeight: number;
  readonly tol: number;
  /** For a node built over occupied bins only (hist-sparse.ts): where to find each feature's non-empty bins. */
  readonly occupied?: OccupiedBins | null;
}

/** Channels of bin b of a block starting at double index h (see the file comment). */
function binChannels(s: ScanNode, f64: Float64Array, h: number, b: number, out: Float64Array, off: number): void {
  const p = h + b * s.ws.stride;
  if (s.ws.nClasses === 0) { out[off] = f64[p + 1]; out[off + 1] = f64[p + 2] - s.mean * f64[p + 1]; }
  else for (let k = 0; k < s.nCh; k++) out[off + k] = f64[p + 1 + k];
}

function blockStart(s: ScanNode, f: number): number {
  return (s.histPtr >> 3) + f * BINS * s.ws.stride;
}

function missingOf(s: ScanNode, f64: Float64Array, h: number): { stats: Float64Array; rows: number } {
  const stats = new Float64Array(s.nCh);
  binChannels(s, f64, h, MISSING, stats, 0);
  return { stats, rows: f64[h + MISSING * s.ws.stride] };
}

/** Numeric feature with a value response: the kernel scan. */
function scanNumericValue(s: ScanNode, f: number, nBins: number, floor: number): HistChoice | null {
  const { arena, kernels } = s.ws.engine;
  const block = s.histPtr + f * BINS * s.ws.stride * 8;
  const occ = s.occupied, k = occ ? occ.feats.indexOf(f) : -1;
  if (occ) kernels.scanValueList(block, occ.binsPtr + k * occ.count * 4, occupiedLength(s.ws, occ, k), nBins, s.mean, s.leafRows, s.leafWeight, s.tol, s.ws.scanPtr);
  else kernels.scanValue(block, nBins, s.mean, s.leafRows, s.leafWeight, s.tol, s.ws.scanPtr);
  const o = viewsOf(arena.buffer).f64, q = s.ws.scanPtr >> 3;
  if (o[q + 1] < 0 || !(o[q] > floor)) return null;
  const m = missingOf(s, o, block >> 3);
  return {
    feature: f, kind: NUMERIC, bin: o[q + 1], leftBins: null,
    slotStats: Float64Array.of(o[q + 3], o[q + 4], o[q + 6] - o[q + 3], o[q + 7] - o[q + 4]),
    slotRows: Float64Array.of(o[q + 2], o[q + 5] - o[q + 2]),
    missingStats: m.stats, missingRows: m.rows, score: o[q],
  };
}

/** Scan bins in `order`, cutting after each position; shared by class thresholds and subsets. */
function scanOrdered(s: ScanNode, f64: Float64Array, h: number, order: readonly number[]): { at: number; score: number; left: Float64Array; rows: number; total: Float64Array; totalRows: number } | null {
  const nCh = s.nCh, m = s.measure;
  const ch = new Float64Array(nCh), total = new Float64Array(nCh);
  let totalRows = 0;
  for (const b of order) {
    binChannels(s, f64, h, b, ch, 0);
    for (let k = 0; k < nCh; k++) total[k] += ch[k];
    totalRows += f64[h + b * s.ws.stride];
  }
  if (order.length < 2 || totalRows < 2 * s.leafRows) return null;
  const totalW = channelWeight(m, total, 0, nCh);
  const parent = weightedImpurity(m, total, 0, nCh);
  const left = new Float64Array(nCh), right = new Float64Array(nCh), bestLeft = new Float64Array(nCh);
  let best = -Infinity, at = -1, bestRows = 0, leftRows = 0;
  for (let i = 0; i < order.length - 1; i++) {
    binChannels(s, f64, h, order[i], ch, 0);
    for (let k = 0; k < nCh; k++) left[k] += ch[k];
    leftRows += f64[h + order[i] * s.ws.stride];
    if (leftRows < s.leafRows || totalRows - leftRows < s.leafRows) continue;
    const wl = channelWeight(m, left, 0, nCh);
    if (wl < s.leafWeight || totalW - wl < s.leafWeight) continue;
    for (let k = 0; k < nCh; k++) right[k] = total[k] - left[k];
    const score = parent - weightedImpurity(m, left, 0, nCh) - weightedImpurity(m, right, 0, nCh);
    if (score > best + s.tol) { best = score; at = i; bestRows = leftRows; bestLeft.set(left); }
  }
  return at < 0 ? null : { at, score: best, left: bestLeft, rows: bestRows, total, totalRows };
}

function choiceFrom(s: ScanNode, f: number, f64: Float64Array, h: number, kind: typeof NUMERIC | typeof SUBSET,
  r: NonNullable<ReturnType<typeof scanOrdered>>, order: readonly number[]): HistChoice {
  const nCh = s.nCh;
  const slotStats = new Float64Array(2 * nCh);
  slotStats.set(r.left, 0);
  for (let k = 0; k < nCh; k++) slotStats[nCh + k] = r.total[k] - r.left[k];
  let leftBins: Uint8Array | null = null;
  if (kind === SUBSET) {
    leftBins = new Uint8Array(BINS);
    for (let i = 0; i <= r.at; i++) leftBins[order[i]] = 1;
  }
  const miss = missingOf(s, f64, h);
  return {
    feature: f, kind, bin: order[r.at], leftBins, slotStats, slotRows: Float64Array.of(r.rows, r.totalRows - r.rows),
    missingStats: miss.stats, missingRows: miss.rows, score: r.score,
  };
}

/** Non-empty bins among 0..nBins-1, ascending. */
function seenBins(s: ScanNode, f64: Float64Array, h: number, nBins: number): number[] {
  const seen: number[] = [];
  for (let b = 0; b < nBins; b++) if (f64[h + b * s.ws.stride] > 0) seen.push(b);
  return seen;
}

/**
 * Best split of feature `f` at the node, or null — also null when its score is not above `floor` (the
 * caller passes the score a candidate must beat, so losing candidates are not built).
 */
export function scanFeature(s: ScanNode, f: number, floor = -Infinity): HistChoice | null {
  const feat = s.ws.binned.features[f];
  if (feat.kind === 'numeric' && s.ws.nClasses === 0) return scanNumericValue(s, f, feat.nBins, floor);
  const f64 = viewsOf(s.ws.engine.arena.buffer).f64;
  const h = blockStart(s, f);
  const occ = s.occupied, k = occ ? occ.feats.indexOf(f) : -1;
  const seen = occ ? occupiedList(s.ws, occ, k) : seenBins(s, f64, h, feat.nBins);
  if (feat.kind === 'numeric') {
    const r = scanOrdered(s, f64, h, seen);
    return r && r.score > floor ? choiceFrom(s, f, f64, h, NUMERIC, r, seen) : null;
  }
  // subset: order bins by a score (see the file comment)
  const nCh = s.nCh, m = s.measure;
  const ch = new Float64Array(nCh), total = new Float64Array(nCh);
  for (const b of seen) { binChannels(s, f64, h, b, ch, 0); for (let k = 0; k < nCh; k++) total[k] += ch[k]; }
  let channel = 1;
  if (m === ENTROPY || m === GINI) {
    if (nCh > 2) { channel = 0; for (let k = 1; k < nCh; k++) if (total[k] > total[channel]) channel = k; }
    else channel = nCh - 1;
  }
  const key = new Float64Array(BINS);
  for (const b of seen) { binChannels(s, f64, h, b, ch, 0); key[b] = ch[channel] / channelWeight(m, ch, 0, nCh); }
  const order = seen.slice().sort((a, b) => key[a] - key[b] || a - b);
  const r = scanOrdered(s, f64, h, order);
  return r && r.score > floor ? choiceFrom(s, f, f64, h, SUBSET, r, order) : null;
}
