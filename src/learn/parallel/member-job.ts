/**
 * The forest/bagging member as a worker job: `growMemberJob({ data, plan, seed }, t)` is
 * `growForestMember(data, plan, seed, t)` (src/learn/ensemble/forest-member.ts), exported from a module
 * workers can import. Use with `runTreeJobs(size, memberJobSpec(input), workers)`.
 */
import { growForestMember, type GrownMember, type MemberData, type MemberPlan } from '../ensemble/forest-member.js';
import type { TreeJobSpec } from './tree-jobs.js';

export interface MemberJobInput {
  readonly data: MemberData;
  readonly plan: MemberPlan;
  readonly seed: number;
}

/** Grow member t (a pure function of the input and t). */
export function growMemberJob(input: MemberJobInput, t: number): GrownMember {
  return growForestMember(input.data, input.plan, input.seed, t);
}

/**
 * The job spec for `runTreeJobs`.
 * @example
 * const members = runTreeJobs(500, memberJobSpec({ data, plan, seed: 7 }), 2);
 */
export function memberJobSpec(input: MemberJobInput): TreeJobSpec<MemberJobInput, GrownMember> {
  return { run: growMemberJob, module: import.meta.url, name: 'growMemberJob', input };
}
