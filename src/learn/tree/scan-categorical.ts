/**
 * Splits on one categorical feature at one node:
 * - multiway: one branch per category seen at the node (Quinlan 1986); valid only when at least two
 *   categories are seen and every branch meets the leaf minimums;
 * - subset: a binary split into two groups of categories. Categories are ordered by a score and the
 *   ordered list is scanned like a numeric feature. For two classes the score is the proportion of
 *   class 1 and for values the mean response; for these the best ordered split is the best of all
 *   subsets (Breiman, Friedman, Olshen & Stone 1984, Classification and Regression Trees, §4.2.2 and
 *   §8.8; Fisher 1958). For more than two classes the score is the proportion of the node's most
 *   frequent class: a heuristic, not guaranteed optimal. Ties in the order break by category code.
 */
import { MULTIWAY, SUBSET } from '../flat-tree.js';
import { addRow, type GrowContext } from './grow-context.js';
import { ENTROPY, GINI, channelWeight, weightedImpurity } from './impurity.js';
import type { SplitChoice } from './split-choice.js';

interface CategoryStats {
  readonly stats: Float64Array; // nCats × nCh
  readonly rows: Float64Array; // nCats
  readonly missingStats: Float64Array;
  readonly missingRows: number;
  readonly seen: number[]; // seen category codes, ascending
}

function accumulate(ctx: GrowContext, f: number, start: number, end: number): CategoryStats {
  const codes = ctx.cats[f] as Int32Array;
  const nCh = ctx.nCh, nCats = ctx.nCats[f];
  const stats = new Float64Array(nCats * nCh);
  const rows = new Float64Array(nCats);
  const missingStats = new Float64Array(nCh);
  let missingRows = 0;
  for (let i = start; i < end; i++) {
    const r = ctx.base[i];
    const c = codes[r];
    if (c < 0) { addRow(ctx, missingStats, 0, r); missingRows++; }
    else { addRow(ctx, stats, c * nCh, r); rows[c]++; }
  }
  const seen: number[] = [];
  for (let c = 0; c < nCats; c++) if (rows[c] > 0) seen.push(c);
  return { stats, rows, missingStats, missingRows, seen };
}

function meetsMinimums(ctx: GrowContext, rows: number, weight: number): boolean {
  return rows >= ctx.settings.leafRows && weight >= ctx.settings.leafWeight;
}

export function scanMultiway(ctx: GrowContext, f: number, start: number, end: number): SplitChoice | null {
  const cs = accumulate(ctx, f, start, end);
  if (cs.seen.length < 2) return null;
  const nCh = ctx.nCh, m = ctx.measure;
  const nSlots = cs.seen.length;
  const slotStats = new Float64Array(nSlots * nCh);
  const slotRows = new Float64Array(nSlots);
  const branchOf = new Int32Array(ctx.nCats[f]).fill(-1);
  const total = new Float64Array(nCh);
  let children = 0;
  for (let j = 0; j < nSlots; j++) {
    const c = cs.seen[j];
    branchOf[c] = j;
    slotRows[j] = cs.rows[c];
    for (let k = 0; k < nCh; k++) { slotStats[j * nCh + k] = cs.stats[c * nCh + k]; total[k] += cs.stats[c * nCh + k]; }
    if (!meetsMinimums(ctx, cs.rows[c], channelWeight(m, cs.stats, c * nCh, nCh))) return null;
    children += weightedImpurity(m, cs.stats, c * nCh, nCh);
  }
  return {
    feature: f, kind: MULTIWAY, threshold: 0, inLeft: null, branchOf, nSlots, slotStats, slotRows,
    missingStats: cs.missingStats, missingRows: cs.missingRows, score: weightedImpurity(m, total, 0, nCh) - children,
  };
}

export function scanSubset(ctx: GrowContext, f: number, start: number, end: number, tol: number): SplitChoice | null {
  const cs = accumulate(ctx, f, start, end);
  if (cs.seen.length < 2) return null;
  const nCh = ctx.nCh, m = ctx.measure;
  const total = new Float64Array(nCh);
  let totalRows = 0;
  for (const c of cs.seen) { for (let k = 0; k < nCh; k++) total[k] += cs.stats[c * nCh + k]; totalRows += cs.rows[c]; }
  const totalW = channelWeight(m, total, 0, nCh);
  // order key per category
  let channel = 1;
  if (m === ENTROPY || m === GINI) {
    if (nCh > 2) { channel = 0; for (let k = 1; k < nCh; k++) if (total[k] > total[channel]) channel = k; }
    else channel = nCh - 1;
  }
  const key = (c: number): number => {
    const w = channelWeight(m, cs.stats, c * nCh, nCh);
    return cs.stats[c * nCh + channel] / w;
  };
  const order = cs.seen.slice().sort((a, b) => key(a) - key(b) || a - b);
  const parent = weightedImpurity(m, total, 0, nCh);
  const left = new Float64Array(nCh), right = new Float64Array(nCh), bestLeft = new Float64Array(nCh);
  let bestScore = -Infinity, bestCut = -1, bestRows = 0, leftRows = 0;
  for (let i = 0; i < order.length - 1; i++) {
    const c = order[i];
    for (let k = 0; k < nCh; k++) left[k] += cs.stats[c * nCh + k];
    leftRows += cs.rows[c];
    const wl = channelWeight(m, left, 0, nCh);
    if (!meetsMinimums(ctx, leftRows, wl) || !meetsMinimums(ctx, totalRows - leftRows, totalW - wl)) continue;
    for (let k = 0; k < nCh; k++) right[k] = total[k] - left[k];
    const score = parent - weightedImpurity(m, left, 0, nCh) - weightedImpurity(m, right, 0, nCh);
    if (score > bestScore + tol) { bestScore = score; bestCut = i; bestRows = leftRows; bestLeft.set(left); }
  }
  if (bestCut < 0) return null;
  const inLeft = new Uint8Array(ctx.nCats[f]);
  for (let i = 0; i <= bestCut; i++) inLeft[order[i]] = 1;
  const slotStats = new Float64Array(2 * nCh);
  slotStats.set(bestLeft, 0);
  for (let k = 0; k < nCh; k++) slotStats[nCh + k] = total[k] - bestLeft[k];
  return {
    feature: f, kind: SUBSET, threshold: 0, inLeft, branchOf: null, nSlots: 2, slotStats,
    slotRows: Float64Array.of(bestRows, totalRows - bestRows),
    missingStats: cs.missingStats, missingRows: cs.missingRows, score: bestScore,
  };
}
