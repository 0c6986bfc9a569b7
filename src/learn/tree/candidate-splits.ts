/**
 * The best split of each feature at the root of a task, with its information gain, split
 * information and gain ratio — the numbers a grower compares when it picks the root split.
 */
import { MULTIWAY, NUMERIC } from '../flat-tree.js';
import type { GrowTask } from '../grow-task.js';
import { createGrowContext } from './grow-context.js';
import { channelWeight, weightedImpurity } from './impurity.js';
import { scanMultiway, scanSubset } from './scan-categorical.js';
import { scanNumeric } from './scan-numeric.js';
import { splitInfoOf } from './split-choice.js';

export interface CandidateSplit {
  readonly feature: number;
  readonly name: string;
  readonly split: 'numeric' | 'subset' | 'multiway';
  /** Numeric threshold (x <= threshold goes left), NaN otherwise. */
  readonly threshold: number;
  /** Impurity decrease per unit of node weight, scaled by the known fraction (C4.5). */
  readonly gain: number;
  /** Split information in bits, rows missing the feature counted as one more branch (C4.5). */
  readonly splitInfo: number;
  /** gain / splitInfo (0 when splitInfo is 0). */
  readonly gainRatio: number;
}

/**
 * One row per feature that can split the root (features with no valid split are left out).
 * @example
 * candidateSplits(task).map((c) => [c.name, c.gain]); // e.g. [['Outlook', 0.2467], ...]
 */
export function candidateSplits(task: GrowTask): CandidateSplit[] {
  const ctx = createGrowContext(task);
  const end = ctx.base.length;
  const stats = new Float64Array(ctx.nCh);
  if (ctx.y !== null) {
    let w = 0, s = 0;
    for (const r of ctx.base) { w += ctx.w[r]; s += ctx.w[r] * ctx.y[r]; }
    for (const r of ctx.base) { ctx.yc[r] = ctx.y[r] - s / w; stats[1] += ctx.w[r] * ctx.yc[r]; }
    stats[0] = w;
  } else {
    for (const r of ctx.base) stats[ctx.classes![r]] += ctx.w[r];
  }
  const weight = channelWeight(ctx.measure, stats, 0, ctx.nCh);
  const tol = 1e-12 * Math.abs(weightedImpurity(ctx.measure, stats, 0, ctx.nCh));
  const out: CandidateSplit[] = [];
  for (let f = 0; f < ctx.nFeatures; f++) {
    const c = ctx.numeric[f] !== null ? scanNumeric(ctx, f, 0, end, stats, tol)
      : task.settings.categorical === 'multiway' ? scanMultiway(ctx, f, 0, end) : scanSubset(ctx, f, 0, end, tol);
    if (!c) continue;
    const si = splitInfoOf(ctx, c);
    const gain = c.score / weight;
    out.push({
      feature: f, name: ctx.names[f], split: c.kind === NUMERIC ? 'numeric' : c.kind === MULTIWAY ? 'multiway' : 'subset',
      threshold: c.kind === NUMERIC ? c.threshold : NaN, gain, splitInfo: si, gainRatio: si > 0 ? gain / si : 0,
    });
  }
  return out;
}
