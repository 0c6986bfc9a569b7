/**
 * A bagged-tree member as a worker job for `runTreeJobs` (src/learn/parallel/tree-jobs.ts): job t grows
 * member `first + t` (`growForestMember`, a pure function of the input and its index) and routes that
 * member's out-of-bag rows through it, so the out-of-bag work is shared by the workers too. With the
 * histogram engine the input carries the frame's bins, computed once by the caller, so workers never bin
 * again (as in src/learn/parallel/member-job.ts).
 */
import { cachedBinnedFrame, rememberBinnedFrame } from '../../table/bin-cache.js';
import type { BinnedFrame } from '../../table/bin-frame.js';
import { leafOf, type FlatTree } from '../flat-tree.js';
import type { TreeJobSpec } from '../parallel/tree-jobs.js';
import { rowSourceOf } from '../tree/row-source.js';
import { growForestMember, type MemberData, type MemberPlan } from './forest-member.js';

export interface ForestJobInput {
  readonly data: MemberData;
  readonly plan: MemberPlan;
  readonly seed: number;
  /** Member grown by job 0 (job t grows member first + t). */
  readonly first: number;
  /** The frame's bins (histogram engine), so a worker does not bin again. __Default:__ none. */
  readonly binned?: BinnedFrame;
}

export interface ForestJobResult {
  readonly tree: FlatTree;
  /** Leaf reached by each row left out of the member's bootstrap sample; −1 for rows in it. */
  readonly oobLeaf: Int32Array;
}

/**
 * Grow member `input.first + t` and route its out-of-bag rows.
 * @example
 * const { tree, oobLeaf } = growForestJob({ data, plan, seed: 7, first: 0 }, 3); // member 3
 */
export function growForestJob(input: ForestJobInput, t: number): ForestJobResult {
  const frame = input.data.frame;
  if (input.binned && !cachedBinnedFrame(frame)) rememberBinnedFrame(frame, input.binned);
  const { tree, counts } = growForestMember(input.data, input.plan, input.seed, input.first + t);
  const src = rowSourceOf(frame);
  const oobLeaf = new Int32Array(frame.nRows);
  for (let i = 0; i < oobLeaf.length; i++) oobLeaf[i] = counts[i] > 0 ? -1 : leafOf(tree, src, i);
  return { tree, oobLeaf };
}

/**
 * The job spec for `runTreeJobs`.
 * @example
 * const members = runTreeJobs(100, forestJobSpec({ data, plan, seed: 7, first: 0, binned }), 2);
 */
export function forestJobSpec(input: ForestJobInput): TreeJobSpec<ForestJobInput, ForestJobResult> {
  return { run: growForestJob, module: import.meta.url, name: 'growForestJob', input };
}
