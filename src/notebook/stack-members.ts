/**
 * Stacking from a settings list: `fitStack` with its members given in the options, either as earlier
 * fitted models (refitted like themselves, see `learnerLike`) or as learners.
 */
import { errors } from '../errors.js';
import { fitStack, type StackLearner, type StackOptions } from '../learn/ensemble/stacking.js';
import type { StackModel } from '../learn/ensemble/models.js';
import type { ModelHeader } from '../learn/model.js';
import type { Dataset } from '../table/frame.js';
import { learnerLike } from './learner-like.js';
import { isModelValue } from './model-bundle.js';

/** Members: name → fitted model or learner (or a list of learners), or a list of learners. */
export type StackMembers = Readonly<Record<string, ModelHeader | StackLearner | readonly StackLearner[]>> | readonly StackLearner[];

export interface StackWithOptions extends StackOptions {
  /** The members (required). */
  readonly members?: StackMembers;
}

function isLearner(x: unknown): x is StackLearner {
  const l = x as Partial<StackLearner> | null;
  return l != null && typeof l === 'object' && typeof l.name === 'string' && typeof l.fit === 'function';
}

/**
 * The learners `members` stands for, in order.
 * @example
 * stackLearners({ shallow, forest }).map((l) => l.name); // ['shallow', 'forest']
 */
export function stackLearners(members: StackMembers): StackLearner[] {
  const out: StackLearner[] = [];
  const add = (x: unknown, name: string) => {
    if (isModelValue(x)) out.push(learnerLike(x, name));
    else if (isLearner(x)) out.push(x);
    else if (Array.isArray(x)) x.forEach((y, i) => add(y, `${name}[${i}]`));
    else throw errors.badOption(`members.${name}`, x, 'a fitted model or a learner { name, fit }');
  };
  if (Array.isArray(members)) members.forEach((m, i) => add(m, String(i)));
  else if (members != null && typeof members === 'object') for (const [k, v] of Object.entries(members)) add(v, k);
  else throw errors.badOption('members', members, 'fitted models or learners');
  return out;
}

/**
 * Fit a stack on `data` whose members are given as `options.members`; the other options are `fitStack`'s.
 * @example
 * const stack = fitStackWith(train, { members: { shallow, forest }, folds: 5 });
 */
export function fitStackWith(data: Dataset, options: StackWithOptions = {}): StackModel {
  const { members, ...rest } = options;
  if (members === undefined) throw errors.badOption('members', members, 'fitted models or learners to stack');
  return fitStack(data, stackLearners(members), rest);
}
