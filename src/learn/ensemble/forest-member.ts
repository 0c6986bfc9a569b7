/**
 * Grow tree t of a bagged ensemble or random forest as a pure function of (data, plan, seed, t): the
 * bootstrap draws come from `derive(seed, t, 0)` and the grower's feature sampling from
 * `derive(seed, t, 1)`, so trees can be grown in any order or on any worker with identical results.
 */
import type { Frame } from '../../table/frame.js';
import { derive } from '../../util/rng.js';
import type { FlatTree } from '../flat-tree.js';
import type { Response } from '../grow-task.js';
import { drawBootstrapCounts } from './bootstrap.js';
import { growEnsembleTree } from './engine.js';
import type { MemberTree } from './options.js';

/** What every member is grown from (shared, read-only). */
export interface MemberData {
  readonly frame: Frame;
  readonly response: Response;
  /** Sample weights (class weights applied), one per row. */
  readonly weights: Float64Array;
}

/** How members are grown. */
export interface MemberPlan {
  readonly tree: MemberTree;
  /** Features tried at each split (0 = all: bagging). */
  readonly featuresPerSplit: number;
}

export interface GrownMember {
  readonly tree: FlatTree;
  /** Bootstrap count of each row (0 = out-of-bag for this tree). */
  readonly counts: Float64Array;
}

/**
 * Grow member `t`.
 * @example
 * const { tree, counts } = growForestMember(data, plan, 42, 0);
 */
export function growForestMember(data: MemberData, plan: MemberPlan, seed: number, t: number): GrownMember {
  const n = data.frame.nRows;
  const counts = drawBootstrapCounts(n, derive(seed, t, 0));
  const weights = new Float64Array(n);
  for (let i = 0; i < n; i++) weights[i] = counts[i] * data.weights[i];
  const { tree } = growEnsembleTree({
    frame: data.frame,
    weights,
    response: data.response,
    settings: { ...plan.tree.grow, featuresPerSplit: plan.featuresPerSplit },
    rng: derive(seed, t, 1),
  }, plan.tree.engine);
  return { tree, counts };
}
