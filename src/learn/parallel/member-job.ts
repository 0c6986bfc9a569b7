/**
 * The forest/bagging member as a worker job: `growMemberJob({ data, plan, seed }, t)` is
 * `growForestMember(data, plan, seed, t)` (src/learn/ensemble/forest-member.ts), exported from a module
 * workers can import. Use with `runTreeJobs(size, memberJobSpec(input), workers)`. With the histogram
 * engine the spec carries the frame's bins (computed once here), so workers reuse them.
 */
import { binnedFrameFor, cachedBinnedFrame, rememberBinnedFrame } from '../../table/bin-cache.js';
import type { BinnedFrame } from '../../table/bin-frame.js';
import { growForestMember, type GrownMember, type MemberData, type MemberPlan } from '../ensemble/forest-member.js';
import type { TreeJobSpec } from './tree-jobs.js';

export interface MemberJobInput {
  readonly data: MemberData;
  readonly plan: MemberPlan;
  readonly seed: number;
  /** The frame's bins, computed once by the caller so workers do not bin again (histogram engine). */
  readonly binned?: BinnedFrame;
}

/** Grow member t (a pure function of the input and t). */
export function growMemberJob(input: MemberJobInput, t: number): GrownMember {
  const frame = input.data.frame;
  if (input.binned && !cachedBinnedFrame(frame)) rememberBinnedFrame(frame, input.binned);
  return growForestMember(input.data, input.plan, input.seed, t);
}

/**
 * The job spec for `runTreeJobs`.
 * @example
 * const members = runTreeJobs(500, memberJobSpec({ data, plan, seed: 7 }), 2);
 */
export function memberJobSpec(input: MemberJobInput): TreeJobSpec<MemberJobInput, GrownMember> {
  const binned = input.binned ?? (input.plan.tree.engine === 'histogram' ? binnedFrameFor(input.data.frame) : undefined);
  return { run: growMemberJob, module: import.meta.url, name: 'growMemberJob', input: binned ? { ...input, binned } : input };
}
