/**
 * Options of `fitBoosting`: names, defaults and validation.
 */
import type { Dataset, Target } from '../../table/frame.js';
import { errors } from '../../errors.js';
import type { LossName } from './loss/loss.js';
import { callbackOption, type RoundCallback } from './progress.js';
import { defaultLossName, lossNames } from './loss/pick.js';
import {
  checkKnown, memberTreeKeys, numberIn, oneOf, resolveMemberTree, wholeNumber, type MemberTree, type MemberTreeOptions,
} from './options.js';

export interface BoostingOptions extends MemberTreeOptions {
  /**
   * Loss: 'squared', 'absolute', 'huber', 'quantile', 'poisson' (numbers); 'logistic' (two classes),
   * 'multiclass' (two or more classes). __Default:__ 'squared' for numbers, 'logistic' for two classes,
   * 'multiclass' for more.
   */
  readonly loss?: LossName;
  /** Rounds of boosting (each grows one tree, or K for 'multiclass'). __Default:__ 100. */
  readonly rounds?: number;
  /** Learning rate (shrinkage) η_0 in (0, 1]. __Default:__ 0.1 (Friedman 2001 recommends ν <= 0.1). */
  readonly learningRate?: number;
  /** Step decay: round m (from 0) uses η_m = η_0 / (1 + stepDecay·m). __Default:__ 0 (constant step). */
  readonly stepDecay?: number;
  /** Share of rows drawn without replacement for each round, in (0, 1] (Friedman 2002). __Default:__ 1. */
  readonly rowFraction?: number;
  /** Seed for row subsampling. __Default:__ 0. */
  readonly seed?: number;
  /** Held-out rows whose loss is kept after every round (learning curves, early stopping). __Default:__ none. */
  readonly watch?: Dataset;
  /**
   * Stop when the watched loss has not improved for this many rounds; the model keeps the rounds up to
   * the best one. Needs `watch`. __Default:__ Infinity (no early stopping).
   */
  readonly patience?: number;
  /** Quantile of |residuals| that sets Huber's δ each round. __Default:__ 0.9 (Friedman 2001; from memory). */
  readonly huberQuantile?: number;
  /** Level τ of the quantile loss. __Default:__ 0.5. */
  readonly quantileLevel?: number;
  /** Weight per class label (multiplies sample weights). __Default:__ none. */
  readonly classWeights?: Readonly<Record<string, number>>;
  /** Depth of each tree. __Default:__ 3 (common practice: small trees). */
  readonly depthLimit?: number;
  /**
   * Grow each tree as a Newton fit — to −gradient/hessian with weights × hessian, so splits maximise the
   * second-order gain — instead of a least-squares fit to the pseudo-residuals (src/learn/ensemble/
   * newton-response.ts; Friedman, Hastie & Tibshirani 2000). Leaf values are the same Newton steps either
   * way. For 'logistic', 'multiclass' and 'poisson'; with 'squared' it changes nothing (the hessian is 1);
   * the other losses have no usable second derivative and reject it. On the seeded data of
   * test/bench/ensemble-newton.mjs it reached the lowest watched loss in fewer rounds (e.g. 58 instead of
   * 72–74 for logistic, at the same loss) and a slightly lower one for 'multiclass' and 'poisson'.
   * __Default:__ false (Friedman's least-squares trees).
   */
  readonly newtonTrees?: boolean;
  /**
   * Called after every round with its number, the training and watched losses and the best round so far
   * (src/learn/ensemble/progress.ts). Never changes the model. __Default:__ none.
   */
  readonly onRound?: RoundCallback;
}

export const boostingKeys = [
  'loss', 'rounds', 'learningRate', 'stepDecay', 'rowFraction', 'seed', 'watch', 'patience', 'huberQuantile',
  'quantileLevel', 'classWeights', 'newtonTrees', 'onRound', ...memberTreeKeys,
] as const;

/** Losses whose leaf rule is a Newton step with a non-constant hessian (where `newtonTrees` matters). */
const newtonLosses: readonly LossName[] = ['logistic', 'multiclass', 'poisson', 'squared'];

export interface BoostingSettings {
  readonly loss: LossName;
  readonly rounds: number;
  readonly learningRate: number;
  readonly stepDecay: number;
  readonly rowFraction: number;
  readonly seed: number;
  readonly patience: number;
  readonly huberQuantile: number;
  readonly quantileLevel: number;
  readonly newtonTrees: boolean;
  readonly tree: MemberTree;
  readonly onRound: RoundCallback | null;
}

/**
 * Validate boosting options for `target` and fill in defaults.
 * @example
 * resolveBoostingOptions({ rounds: 50 }, data.target);
 */
export function resolveBoostingOptions(o: BoostingOptions, target: Target): BoostingSettings {
  checkKnown(o, boostingKeys);
  const patience = wholeNumber('patience', o.patience ?? Infinity, 1, true);
  if (patience !== Infinity && !o.watch) throw errors.badOption('patience', patience, 'a watched set (option watch) to stop on');
  const loss = oneOf('loss', o.loss ?? defaultLossName(target), lossNames);
  const newtonTrees = o.newtonTrees ?? false;
  if (typeof newtonTrees !== 'boolean') throw errors.badOption('newtonTrees', newtonTrees, 'true or false');
  if (newtonTrees && !newtonLosses.includes(loss)) {
    throw errors.badOption('newtonTrees', true, `a loss with a second derivative (${newtonLosses.map((l) => `'${l}'`).join(', ')}), not '${loss}'`);
  }
  return {
    loss,
    rounds: wholeNumber('rounds', o.rounds ?? 100, 0),
    learningRate: numberIn('learningRate', o.learningRate ?? 0.1, 0, 1, true),
    stepDecay: numberIn('stepDecay', o.stepDecay ?? 0, 0, Number.MAX_VALUE),
    rowFraction: numberIn('rowFraction', o.rowFraction ?? 1, 0, 1, true),
    seed: wholeNumber('seed', o.seed ?? 0, -(2 ** 31)),
    patience,
    huberQuantile: numberIn('huberQuantile', o.huberQuantile ?? 0.9, 0, 1, true),
    quantileLevel: numberIn('quantileLevel', o.quantileLevel ?? 0.5, 0, 1, true),
    newtonTrees,
    onRound: callbackOption<RoundCallback>('onRound', o.onRound),
    tree: resolveMemberTree(o, { criterion: 'gini', depthLimit: 3, leafRows: 1 }),
  };
}
