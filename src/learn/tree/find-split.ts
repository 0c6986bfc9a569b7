/**
 * The best split of one node over the features tried there.
 *
 * - Information gain, Gini and variance: the largest score (weighted impurity decrease over known rows).
 * - Gain ratio (Quinlan 1993, C4.5): among candidates whose score is at least the average score of all
 *   candidates with a positive score, the largest gain ratio. Numeric thresholds are chosen by score
 *   first, then compared by ratio (no MDL threshold penalty is applied).
 * Ties (within `tol`) go to the lower feature index; within a feature, to the lower threshold.
 */
import type { GrowContext } from './grow-context.js';
import { scanMultiway, scanSubset } from './scan-categorical.js';
import { scanNumeric } from './scan-numeric.js';
import { gainRatioOf, type SplitChoice } from './split-choice.js';

export function findSplit(ctx: GrowContext, features: readonly number[], start: number, end: number, nodeStats: Float64Array, nodeWeight: number, tol: number): SplitChoice | null {
  const candidates: SplitChoice[] = [];
  const multiway = ctx.settings.categorical === 'multiway';
  let floor = 0; // without gain ratio only a better score matters, so scans may skip worse features
  for (const f of features) {
    let c: SplitChoice | null;
    if (ctx.numeric[f] !== null) c = scanNumeric(ctx, f, start, end, nodeStats, tol, floor);
    else if (multiway) c = scanMultiway(ctx, f, start, end);
    else c = scanSubset(ctx, f, start, end, tol);
    if (c !== null && c.score > tol) {
      candidates.push(c);
      if (!ctx.gainRatio && c.score > floor + tol) floor = c.score;
    }
  }
  if (candidates.length === 0) return null;
  if (!ctx.gainRatio) {
    let best = candidates[0];
    for (const c of candidates) if (c.score > best.score + tol) best = c;
    return best;
  }
  let avg = 0;
  for (const c of candidates) avg += c.score;
  avg /= candidates.length;
  let best: SplitChoice | null = null, bestRatio = -Infinity;
  for (const c of candidates) {
    if (c.score < avg - tol) continue;
    const r = gainRatioOf(ctx, c, nodeWeight);
    if (best === null || r > bestRatio + 1e-12 * Math.abs(bestRatio)) { best = c; bestRatio = r; }
  }
  return best;
}
