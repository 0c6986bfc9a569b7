/**
 * Best binary threshold of one numeric feature at one node. Candidate thresholds are the midpoints
 * between neighbouring distinct known values (x <= t goes left); rows missing the value are left out
 * of the scan (see split-choice.ts). The first best threshold in ascending order wins ties.
 * The inner loops are specialised for class and value responses (this is the grower's hot loop).
 */
import { NUMERIC } from '../flat-tree.js';
import { addRow, type GrowContext } from './grow-context.js';
import { GINI, channelWeight, weightedImpurity } from './impurity.js';
import type { SplitChoice } from './split-choice.js';

/** Midpoint of a < b that lies in [a, b) even for huge or adjacent floats. */
export function midpoint(a: number, b: number): number {
  const t = a / 2 + b / 2;
  return t >= a && t < b ? t : a;
}

interface ScanBest { score: number; nLeft: number; threshold: number }
/** Reused result slot of the inner scans (growing is single-threaded within one context). */
const BEST: ScanBest = { score: 0, nLeft: -1, threshold: NaN };

/**
 * The best threshold of feature `f` over `[start, end)`, or null when none beats `floor` (+ tol) or
 * none is valid.
 */
export function scanNumeric(ctx: GrowContext, f: number, start: number, end: number, nodeStats: Float64Array, tol: number, floor = -Infinity): SplitChoice | null {
  const vals = ctx.numeric[f] as Float64Array;
  const seg = ctx.sorted[f] as Int32Array;
  const nCh = ctx.nCh;
  // rows missing the value sit at the end of the range
  let kEnd = end;
  while (kEnd > start && vals[seg[kEnd - 1]] !== vals[seg[kEnd - 1]]) kEnd--;
  const nKnown = kEnd - start;
  if (nKnown < 2 || nKnown < 2 * ctx.settings.leafRows) return null;
  if (vals[seg[start]] === vals[seg[kEnd - 1]]) return null;
  const missingStats = new Float64Array(nCh);
  for (let i = kEnd; i < end; i++) addRow(ctx, missingStats, 0, seg[i]);
  const total = ctx.scanTotal;
  for (let k = 0; k < nCh; k++) total[k] = nodeStats[k] - missingStats[k];
  const best = BEST;
  best.score = floor; best.nLeft = -1; best.threshold = NaN;
  if (ctx.classes !== null) scanClass(ctx, vals, seg, start, kEnd, total, tol, best);
  else scanValue(ctx, vals, seg, start, kEnd, total, tol, best);
  if (best.nLeft < 0) return null;
  const slotStats = new Float64Array(2 * nCh);
  for (let i = start; i < start + best.nLeft; i++) addRow(ctx, slotStats, 0, seg[i]);
  for (let k = 0; k < nCh; k++) slotStats[nCh + k] = total[k] - slotStats[k];
  return {
    feature: f, kind: NUMERIC, threshold: best.threshold, inLeft: null, branchOf: null, nSlots: 2,
    slotStats, slotRows: Float64Array.of(best.nLeft, nKnown - best.nLeft),
    missingStats, missingRows: end - kEnd, score: best.score,
  };
}

function scanValue(ctx: GrowContext, vals: Float64Array, seg: Int32Array, start: number, kEnd: number,
  total: Float64Array, tol: number, best: ScanBest): void {
  const w = ctx.w, yc = ctx.yc;
  const { leafRows, leafWeight } = ctx.settings;
  const W = total[0], S = total[1];
  const parent = W > 0 ? -(S * S) / W : 0;
  const nKnown = kEnd - start;
  let wl = 0, sl = 0;
  for (let i = start; i < kEnd - 1; i++) {
    const r = seg[i];
    wl += w[r]; sl += w[r] * yc[r];
    const a = vals[r], b = vals[seg[i + 1]];
    if (a === b) continue;
    const nLeft = i - start + 1;
    if (nLeft < leafRows || nKnown - nLeft < leafRows) continue;
    const wr = W - wl;
    if (wl < leafWeight || wr < leafWeight || !(wl > 0) || !(wr > 0)) continue;
    const sr = S - sl;
    const score = parent + (sl * sl) / wl + (sr * sr) / wr;
    if (score > best.score + tol) { best.score = score; best.nLeft = nLeft; best.threshold = midpoint(a, b); }
  }
}

/**
 * Class responses. Cuts inside a run of rows of one class are skipped: weighted entropy and Gini are
 * concave in the weight moved across the cut, so along such a run the best cut is at one of its ends
 * (Fayyad & Irani 1992, "On the handling of continuous-valued attributes in decision tree generation",
 * Machine Learning 8:87–102). A cut is skipped only when the value blocks on both sides hold one and
 * the same class and the cuts before and after it are both allowed by the leaf minimums, so the first
 * best cut is still found.
 */
function scanClass(ctx: GrowContext, vals: Float64Array, seg: Int32Array, start: number, kEnd: number,
  total: Float64Array, tol: number, best: ScanBest): void {
  const w = ctx.w, cls = ctx.classes as Int32Array, nCh = ctx.nCh, m = ctx.measure;
  const { leafRows, leafWeight } = ctx.settings;
  const W = channelWeight(m, total, 0, nCh);
  const parent = weightedImpurity(m, total, 0, nCh);
  const nKnown = kEnd - start;
  const left = ctx.scanLeft;
  left.fill(0);
  let wl = 0, prevAllowed = false, blockClass = -1, blockPure = false;
  for (let i = start; i < kEnd - 1; i++) {
    const r = seg[i], k = cls[r], a = vals[r];
    if (i === start || vals[seg[i - 1]] !== a) { blockClass = k; blockPure = true; } else if (k !== blockClass) blockPure = false;
    left[k] += w[r]; wl += w[r];
    const b = vals[seg[i + 1]];
    if (a === b) continue;
    const nLeft = i - start + 1;
    const wr = W - wl;
    if (nLeft < leafRows || nKnown - nLeft < leafRows || wl < leafWeight || wr < leafWeight) { prevAllowed = false; continue; }
    if (prevAllowed && blockPure && cls[seg[i + 1]] === blockClass) {
      let j = i + 1, bw = 0, pure = true;
      while (j < kEnd && vals[seg[j]] === b) {
        const q = seg[j];
        if (cls[q] !== blockClass) { pure = false; break; }
        bw += w[q]; j++;
      }
      // the next cut (after the next block) must exist and be allowed; left minimums only get easier
      if (pure && j < kEnd && nKnown - (j - start) >= leafRows && wr - bw >= leafWeight) continue;
    }
    prevAllowed = true;
    let score: number;
    if (m === GINI) {
      let ql = 0, qr = 0;
      for (let c = 0; c < nCh; c++) { const l = left[c], rr = total[c] - l; ql += l * l; qr += rr * rr; }
      // W·gini = W - Σc²/W for each side
      score = parent - (wl - ql / wl) - (wr - qr / wr);
    } else {
      let el = 0, er = 0;
      for (let c = 0; c < nCh; c++) {
        const l = left[c], rr = total[c] - l;
        if (l > 0) el += l * Math.log2(l);
        if (rr > 0) er += rr * Math.log2(rr);
      }
      score = parent - (wl * Math.log2(wl) - el) - (wr * Math.log2(wr) - er);
    }
    if (score > best.score + tol) { best.score = score; best.nLeft = nLeft; best.threshold = midpoint(a, b); }
  }
}
