/**
 * A candidate split of one node on one feature, and how it is finished once chosen:
 * the C4.5 score, the gain ratio, and where rows missing the feature go.
 *
 * Scoring with missing values (after Quinlan 1993, C4.5, ch. 3): rows missing the feature are left
 * out of the scan; the score is the weighted impurity decrease over the rows with a known value,
 * W_known · (I(known) - Σ W_j/W_known · I(j)), which equals the node weight times the per-row gain
 * scaled by the known fraction F = W_known / W.
 */
import { MULTIWAY, NUMERIC, SUBSET } from '../flat-tree.js';
import type { GrowContext } from './grow-context.js';
import { channelWeight, weightedImpurity } from './impurity.js';

export interface SplitChoice {
  readonly feature: number;
  readonly kind: typeof NUMERIC | typeof SUBSET | typeof MULTIWAY;
  /** Numeric: x <= threshold goes to slot 0. */
  readonly threshold: number;
  /** Subset: 1 for categories sent to slot 0 (length nCats of the feature). */
  readonly inLeft: Uint8Array | null;
  /** Multiway: slot of each category, -1 for categories not seen at the node. */
  readonly branchOf: Int32Array | null;
  readonly nSlots: number;
  /** Channels of the known rows per slot (nSlots × nCh). */
  readonly slotStats: Float64Array;
  readonly slotRows: Float64Array;
  /** Channels and row count of rows missing the feature. */
  readonly missingStats: Float64Array;
  readonly missingRows: number;
  /** Weighted impurity decrease over the known rows (the C4.5 score). */
  readonly score: number;
}

/** A chosen split with its missing-value child and its realised gain. */
export interface FinishedSplit extends SplitChoice {
  /** Slot receiving rows missing the feature (at training and prediction). */
  readonly missingSlot: number;
  /** Weighted impurity decrease of the split with missing rows routed (stored as the node's gain). */
  readonly gain: number;
}

/**
 * C4.5 split information in bits: the entropy of the branch proportions of the node's weight, with
 * rows missing the feature counted as one more branch (Quinlan 1993).
 */
export function splitInfoOf(ctx: GrowContext, s: SplitChoice): number {
  const nCh = ctx.nCh;
  const parts: number[] = [];
  for (let j = 0; j < s.nSlots; j++) parts.push(channelWeight(ctx.measure, s.slotStats, j * nCh, nCh));
  parts.push(channelWeight(ctx.measure, s.missingStats, 0, nCh));
  let total = 0;
  for (const p of parts) total += p;
  let h = 0;
  for (const p of parts) if (p > 0) h -= (p / total) * Math.log2(p / total);
  return h;
}

/** Gain ratio: (score / node weight) / split information (Quinlan 1993). */
export function gainRatioOf(ctx: GrowContext, s: SplitChoice, nodeWeight: number): number {
  const si = splitInfoOf(ctx, s);
  return si > 0 ? s.score / nodeWeight / si : 0;
}

/**
 * Choose where rows missing the feature go: the slot that gives the larger weighted impurity decrease
 * of the whole node; ties (within `tol`) go to the heavier slot, then the lower slot. With no missing
 * rows, the heaviest slot (later missing values follow the majority).
 */
export function finishSplit(ctx: GrowContext, s: SplitChoice, nodeStats: Float64Array, tol: number): FinishedSplit {
  const nCh = ctx.nCh, m = ctx.measure;
  const parent = weightedImpurity(m, nodeStats, 0, nCh);
  const slotW = new Float64Array(s.nSlots);
  let sumChildren = 0;
  for (let j = 0; j < s.nSlots; j++) {
    slotW[j] = channelWeight(m, s.slotStats, j * nCh, nCh);
    sumChildren += weightedImpurity(m, s.slotStats, j * nCh, nCh);
  }
  const heavier = (a: number, b: number): boolean => slotW[a] > slotW[b];
  if (s.missingRows === 0) {
    let best = 0;
    for (let j = 1; j < s.nSlots; j++) if (heavier(j, best)) best = j;
    return { ...s, missingSlot: best, gain: parent - sumChildren };
  }
  const merged = new Float64Array(nCh);
  let best = -1, bestGain = -Infinity;
  for (let j = 0; j < s.nSlots; j++) {
    for (let k = 0; k < nCh; k++) merged[k] = s.slotStats[j * nCh + k] + s.missingStats[k];
    const g = parent - (sumChildren - weightedImpurity(m, s.slotStats, j * nCh, nCh) + weightedImpurity(m, merged, 0, nCh));
    if (best < 0 || g > bestGain + tol || (g >= bestGain - tol && heavier(j, best))) {
      best = j;
      bestGain = g;
    }
  }
  return { ...s, missingSlot: best, gain: bestGain };
}
