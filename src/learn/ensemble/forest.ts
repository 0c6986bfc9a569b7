/**
 * Random forests (Breiman, L. (2001) "Random forests", Machine Learning 45:5–32): trees grown on
 * bootstrap samples, each split choosing among `featuresPerSplit` features drawn at random.
 */
import type { Dataset } from '../../table/frame.js';
import { fitBaggedTrees } from './bagged-trees.js';
import type { ForestModel } from './models.js';
import { callbackOption, type TreeCallback } from './progress.js';
import { checkKnown, memberTreeKeys, oneOf, resolveMemberTree, wholeNumber, type MemberTreeOptions } from './options.js';

export interface ForestOptions extends MemberTreeOptions {
  /** Number of trees. __Default:__ 100 (common practice). */
  readonly size?: number;
  /**
   * Features drawn at random at each split. __Default:__ ⌊√p⌋ for classes, max(1, ⌊p/3⌋) for numbers
   * (Breiman 2001; common practice), p the number of features.
   */
  readonly featuresPerSplit?: number;
  /** Classes: average the trees' leaf probabilities, or count one vote per tree. __Default:__ 'average'. */
  readonly combine?: 'average' | 'vote';
  /** Seed for bootstrap samples and feature draws. __Default:__ 0. */
  readonly seed?: number;
  /** Weight per class label (multiplies sample weights). __Default:__ none (all 1). */
  readonly classWeights?: Readonly<Record<string, number>>;
  /** Class split criterion. __Default:__ 'gini' (Breiman 2001). */
  readonly criterion?: MemberTreeOptions['criterion'];
  /** __Default:__ Infinity (fully grown trees; Breiman 2001). */
  readonly depthLimit?: number;
  /** __Default:__ 1 for classes, 5 for numbers (common practice). */
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

export const forestKeys = ['size', 'featuresPerSplit', 'combine', 'seed', 'classWeights', 'workers', 'onTree', ...memberTreeKeys] as const;

/** The default features per split for p features (see `ForestOptions.featuresPerSplit`). */
export function defaultFeaturesPerSplit(p: number, target: 'class' | 'number'): number {
  return target === 'class' ? Math.max(1, Math.floor(Math.sqrt(p))) : Math.max(1, Math.floor(p / 3));
}

/**
 * Fit a random forest.
 * @example
 * const forest = fitForest(data, { size: 200, seed: 7 });
 * forest.oobCurve.at(-1); // { size: 200, error: 0.04 }
 * forest.importance[0];   // { feature: 'tenure', value: 0.31 }
 */
export function fitForest(data: Dataset, options: ForestOptions = {}): ForestModel {
  checkKnown(options, forestKeys);
  const kind = data.target.kind;
  const p = data.features.columns.length;
  const tree = resolveMemberTree(options, { criterion: 'gini', depthLimit: Infinity, leafRows: kind === 'class' ? 1 : 5 });
  const fps = wholeNumber('featuresPerSplit', options.featuresPerSplit ?? defaultFeaturesPerSplit(p, kind), 1);
  return fitBaggedTrees('forest', data, {
    size: wholeNumber('size', options.size ?? 100, 1),
    seed: wholeNumber('seed', options.seed ?? 0, -(2 ** 31)),
    combine: oneOf('combine', options.combine ?? 'average', ['average', 'vote']),
    plan: { tree, featuresPerSplit: Math.min(fps, Math.max(1, p)) },
    classWeights: options.classWeights,
    workers: options.workers,
    onTree: callbackOption<TreeCallback>('onTree', options.onTree),
  });
}
