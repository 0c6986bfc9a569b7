/**
 * Bagging of trees (Breiman, L. (1996) "Bagging predictors", Machine Learning 24:123–140): every member
 * is a tree grown on a bootstrap sample with all features tried at every split.
 */
import type { Dataset } from '../../table/frame.js';
import { fitBaggedTrees } from './bagged-trees.js';
import type { ForestModel } from './models.js';
import { callbackOption, type TreeCallback } from './progress.js';
import { checkKnown, memberTreeKeys, oneOf, resolveMemberTree, wholeNumber, type MemberTreeOptions } from './options.js';

export interface BaggingOptions extends MemberTreeOptions {
  /** Number of trees. __Default:__ 50 (Breiman 1996 used 50). */
  readonly size?: number;
  /** Classes: average leaf probabilities, or one vote per tree (Breiman 1996). __Default:__ 'average'. */
  readonly combine?: 'average' | 'vote';
  /** Seed for the bootstrap samples. __Default:__ 0. */
  readonly seed?: number;
  /** Weight per class label (multiplies sample weights). __Default:__ none. */
  readonly classWeights?: Readonly<Record<string, number>>;
  /** Class split criterion. __Default:__ 'gini'. */
  readonly criterion?: MemberTreeOptions['criterion'];
  /** __Default:__ Infinity. */
  readonly depthLimit?: number;
  /** __Default:__ 1. */
  readonly leafRows?: number;
  /**
   * Threads growing trees (the calling thread counts as one); the model is the same for any number.
   * Needs the package built (dist/); otherwise every tree grows in the calling thread.
   * __Default:__ 1 when rows × trees < 2,000,000, else min(2, cores).
   */
  readonly workers?: number;
  /**
   * Called as trees are added, in order, with the count so far and the out-of-bag error
   * (src/learn/ensemble/progress.ts). Never changes the model. __Default:__ none.
   */
  readonly onTree?: TreeCallback;
}

export const baggingKeys = ['size', 'combine', 'seed', 'classWeights', 'workers', 'onTree', ...memberTreeKeys] as const;

/**
 * Fit bagged trees.
 * @example
 * const bag = fitBagging(data, { size: 25, seed: 1 });
 * bag.oobCurve.map((pt) => pt.error); // out-of-bag error as trees are added
 */
export function fitBagging(data: Dataset, options: BaggingOptions = {}): ForestModel {
  checkKnown(options, baggingKeys);
  const tree = resolveMemberTree(options, { criterion: 'gini', depthLimit: Infinity, leafRows: 1 });
  return fitBaggedTrees('bagging', data, {
    size: wholeNumber('size', options.size ?? 50, 1),
    seed: wholeNumber('seed', options.seed ?? 0, -(2 ** 31)),
    combine: oneOf('combine', options.combine ?? 'average', ['average', 'vote']),
    plan: { tree, featuresPerSplit: 0 },
    classWeights: options.classWeights,
    workers: options.workers,
    onTree: callbackOption<TreeCallback>('onTree', options.onTree),
  });
}
