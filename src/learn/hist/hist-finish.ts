/**
 * Choosing among the features' candidates and finishing the chosen split — the same rules as the exact
 * grower (src/learn/tree/find-split.ts and split-choice.ts):
 * - information gain, Gini, variance: the largest score; gain ratio (Quinlan 1993, C4.5): among
 *   candidates scoring at least the average, the largest gain ratio, with rows missing the feature
 *   counted as one more branch in the split information;
 * - rows missing the feature go to the side giving the larger weighted impurity decrease of the whole
 *   node; ties (within `tol`) go to the heavier side, then the left. With no missing rows, the heavier side.
 */
import { channelWeight, weightedImpurity, type ImpurityCode } from '../tree/impurity.js';
import type { HistChoice } from './hist-scan.js';

export interface FinishedHistSplit extends HistChoice {
  /** 0 = missing rows go left, 1 = right. */
  readonly missingSlot: number;
  readonly gain: number;
}

function splitInfo(m: ImpurityCode, nCh: number, c: HistChoice): number {
  const parts = [channelWeight(m, c.slotStats, 0, nCh), channelWeight(m, c.slotStats, nCh, nCh), channelWeight(m, c.missingStats, 0, nCh)];
  const total = parts[0] + parts[1] + parts[2];
  let h = 0;
  for (const p of parts) if (p > 0) h -= (p / total) * Math.log2(p / total);
  return h;
}

/** The best candidate (candidates in ascending feature order, each with score > tol), or null. */
export function pickChoice(cands: readonly HistChoice[], m: ImpurityCode, nCh: number, gainRatio: boolean, nodeWeight: number, tol: number): HistChoice | null {
  if (cands.length === 0) return null;
  if (!gainRatio) {
    let best = cands[0];
    for (const c of cands) if (c.score > best.score + tol) best = c;
    return best;
  }
  let avg = 0;
  for (const c of cands) avg += c.score;
  avg /= cands.length;
  let best: HistChoice | null = null, bestRatio = -Infinity;
  for (const c of cands) {
    if (c.score < avg - tol) continue;
    const si = splitInfo(m, nCh, c);
    const r = si > 0 ? c.score / nodeWeight / si : 0;
    if (best === null || r > bestRatio + 1e-12 * Math.abs(bestRatio)) { best = c; bestRatio = r; }
  }
  return best;
}

/** Route missing rows and compute the split's realised gain (see the file comment). */
export function finishChoice(c: HistChoice, m: ImpurityCode, nCh: number, nodeStats: Float64Array, tol: number): FinishedHistSplit {
  const parent = weightedImpurity(m, nodeStats, 0, nCh);
  const w0 = channelWeight(m, c.slotStats, 0, nCh), w1 = channelWeight(m, c.slotStats, nCh, nCh);
  const i0 = weightedImpurity(m, c.slotStats, 0, nCh), i1 = weightedImpurity(m, c.slotStats, nCh, nCh);
  const sumChildren = i0 + i1;
  if (c.missingRows === 0) return finished(c, w1 > w0 ? 1 : 0, parent - sumChildren);
  const merged = new Float64Array(nCh);
  let best = -1, bestGain = -Infinity;
  for (let j = 0; j < 2; j++) {
    for (let k = 0; k < nCh; k++) merged[k] = c.slotStats[j * nCh + k] + c.missingStats[k];
    const g = parent - (sumChildren - (j === 0 ? i0 : i1) + weightedImpurity(m, merged, 0, nCh));
    const heavier = best >= 0 && (j === 1 ? w1 > w0 : w0 > w1);
    if (best < 0 || g > bestGain + tol || (g >= bestGain - tol && heavier)) { best = j; bestGain = g; }
  }
  return finished(c, best, bestGain);
}

/** The finished split as one object of fixed shape (built field by field: an object spread here was slow). */
function finished(c: HistChoice, missingSlot: number, gain: number): FinishedHistSplit {
  return {
    feature: c.feature, kind: c.kind, bin: c.bin, leftBins: c.leftBins, slotStats: c.slotStats, slotRows: c.slotRows,
    missingStats: c.missingStats, missingRows: c.missingRows, score: c.score, missingSlot, gain,
  };
}
