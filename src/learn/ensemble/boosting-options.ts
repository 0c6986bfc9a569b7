/**
 * Options of `fitBoosting`: names, defaults and validation.
 */
import type { Dataset, Target } from '../../table/frame.js';
import { errors } from '../../errors.js';
import type { LossName } from './loss/loss.js';
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
}

export const boostingKeys = [
  'loss', 'rounds', 'learningRate', 'stepDecay', 'rowFraction', 'seed', 'watch', 'patience', 'huberQuantile',
  'quantileLevel', 'classWeights', ...memberTreeKeys,
] as const;

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
  readonly tree: MemberTree;
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
  return {
    loss: oneOf('loss', o.loss ?? defaultLossName(target), lossNames),
    rounds: wholeNumber('rounds', o.rounds ?? 100, 0),
    learningRate: numberIn('learningRate', o.learningRate ?? 0.1, 0, 1, true),
    stepDecay: numberIn('stepDecay', o.stepDecay ?? 0, 0, Number.MAX_VALUE),
    rowFraction: numberIn('rowFraction', o.rowFraction ?? 1, 0, 1, true),
    seed: wholeNumber('seed', o.seed ?? 0, -(2 ** 31)),
    patience,
    huberQuantile: numberIn('huberQuantile', o.huberQuantile ?? 0.9, 0, 1, true),
    quantileLevel: numberIn('quantileLevel', o.quantileLevel ?? 0.5, 0, 1, true),
    tree: resolveMemberTree(o, { criterion: 'gini', depthLimit: 3, leafRows: 1 }),
  };
}
