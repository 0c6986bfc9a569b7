/**
 * The ensemble model kinds: 'bagging', 'forest', 'adaboost', 'boosting', 'stack'. Each extends the
 * common `ModelHeader` (src/learn/model.ts) and keeps its trees as `FlatTree`s.
 */
import type { FlatTree } from '../flat-tree.js';
import type { ModelHeader } from '../model.js';
import type { ImpurityImportanceRow } from './importance.js';
import type { LossName } from './loss/loss.js';
import type { OobPoint } from './oob.js';
import type { LogisticCombiner } from './logistic-combiner.js';
import type { RidgeCombiner } from './ridge-combiner.js';

/** Bagged trees ('bagging': every feature at every split) or a random forest ('forest'). */
export interface ForestModel extends ModelHeader {
  readonly kind: 'bagging' | 'forest';
  /** Members in index order; classification leaves hold class probabilities. */
  readonly trees: readonly FlatTree[];
  /** How members are combined for classes: mean of leaf probabilities, or majority vote. */
  readonly combine: 'average' | 'vote';
  /** Out-of-bag error after each member. */
  readonly oobCurve: readonly OobPoint[];
  readonly importance: readonly ImpurityImportanceRow[];
}

/** One AdaBoost round. */
export interface AdaBoostRound {
  readonly round: number;
  /** Weighted error of this round's classifier on the training rows. */
  readonly weightedError: number;
  /** Its weight α in the vote. */
  readonly stepWeight: number;
  /** Error (weighted by sample weights) of the ensemble of rounds 1..round on the training rows. */
  readonly trainError: number;
  /** Same on the watched set (NaN without one). */
  readonly watchError: number;
}

export interface AdaBoostModel extends ModelHeader {
  readonly kind: 'adaboost';
  /** Round classifiers (leaf values: class probabilities; each votes for its most probable class). */
  readonly trees: readonly FlatTree[];
  /** α of each kept round. */
  readonly stepWeights: readonly number[];
  readonly rounds: readonly AdaBoostRound[];
  /** Why the fit ended: all rounds run, a perfect round (err = 0), or a round no better than guessing. */
  readonly stopReason: 'rounds' | 'perfect' | 'guessing';
  /** Weighted class shares: the prediction when no round was kept. */
  readonly prior: readonly number[];
  readonly importance: readonly ImpurityImportanceRow[];
}

export interface BoostingModel extends ModelHeader {
  readonly kind: 'boosting';
  readonly loss: LossName;
  /** Scores per row: K for multiclass, else 1. */
  readonly nOutputs: number;
  /** Constant initial model F_0, one value per output. */
  readonly initial: readonly number[];
  /** Trees in round-major order: round m, output k is `trees[m·nOutputs + k]`; leaf values include the step. */
  readonly trees: readonly FlatTree[];
  /** Step (learning rate) used at each round. */
  readonly steps: readonly number[];
  /** Training loss after each round (entry 0 is F_0's). */
  readonly trainLoss: readonly number[];
  /** Watched-set loss after each round (entry 0 is F_0's); empty without a watched set. */
  readonly watchLoss: readonly number[];
  /** Round with the lowest watched loss (0 = F_0 alone), or the last round without a watched set. */
  readonly bestRound: number;
  /** Rounds kept in `trees` (early stopping truncates to `bestRound`). */
  readonly roundsKept: number;
  readonly importance: readonly ImpurityImportanceRow[];
}

/** A base learner of a stack, fitted on every row. */
export interface StackMemberModel {
  readonly name: string;
  /** Any coppice model (serialised through the model-file registry). */
  readonly model: ModelHeader;
}

export interface StackModel extends ModelHeader {
  readonly kind: 'stack';
  readonly members: readonly StackMemberModel[];
  /** Combiner inputs are the members' outputs (K probabilities, or 1 value each), then `passThrough` features. */
  readonly combiner: LogisticCombiner | RidgeCombiner;
  /** Numeric features passed to the combiner as they are. */
  readonly passThrough: readonly string[];
  /** Number of folds the combiner's inputs came from. */
  readonly folds: number;
  /** Out-of-fold score of each member: weighted accuracy (classes) or mean squared error (numbers). */
  readonly memberScores: readonly { readonly name: string; readonly score: number }[];
}

export type EnsembleModel = ForestModel | AdaBoostModel | BoostingModel | StackModel;
