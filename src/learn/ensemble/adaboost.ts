/**
 * AdaBoost with trees: two classes as Algorithm 10.1 of Hastie, Tibshirani & Friedman (2009), ESL 2nd
 * ed.; K classes as SAMME (Zhu, Zou, Rosset & Hastie 2009, "Multi-class AdaBoost") — the same algorithm
 * with α = log((1 − err)/err) + log(K − 1), which is Algorithm 10.1 when K = 2.
 *
 * Each round grows a small tree on the current row weights (weighted impurity; or, with
 * `sampling: 'resample'`, on a weighted bootstrap drawn from the weights) and classifies by its most
 * probable class. Stop rules: a round with err = 0 is kept (err floored at 1e−10, so α ≈ 23 + log(K − 1))
 * and ends the fit — reweighting would be undefined; a round with err >= 1 − 1/K is no better than
 * guessing: it is discarded and ends the fit (Zhu et al. 2009 require err < (K − 1)/K).
 */
import type { Dataset } from '../../table/frame.js';
import { derive } from '../../util/rng.js';
import { leafOf, type FlatTree } from '../flat-tree.js';
import {
  isNoBetterThanGuessing, sammeStepWeight, updateRowWeights, weightedError,
} from './adaboost-weights.js';
import { growEnsembleTree } from './engine.js';
import { ensembleHeader } from './header.js';
import { impurityImportance } from './importance.js';
import type { AdaBoostModel, AdaBoostRound } from './models.js';
import { checkKnown, memberTreeKeys, memberTreeRecord, oneOf, resolveMemberTree, wholeNumber, type MemberTreeOptions } from './options.js';
import { applyClassWeights, prepareData } from './prepare.js';
import { callbackOption, type RoundCallback } from './progress.js';
import { rowSourceOf } from '../tree/row-source.js';
import { argmaxAt } from './tree-sum.js';
import { drawWeightedCounts } from './weighted-draw.js';
import { watchSetOf, type WatchSet } from './watch-set.js';
import { errors } from '../../errors.js';

export interface AdaBoostOptions extends MemberTreeOptions {
  /** Maximum rounds. __Default:__ 100. */
  readonly rounds?: number;
  /** Fit each tree on the weighted rows ('weights') or on a sample drawn by weight ('resample'). __Default:__ 'weights'. */
  readonly sampling?: 'weights' | 'resample';
  /** Seed for 'resample'. __Default:__ 0. */
  readonly seed?: number;
  /** Held-out rows scored after every round (error kept per round). __Default:__ none. */
  readonly watch?: Dataset;
  /** Weight per class label (multiplies sample weights). __Default:__ none. */
  readonly classWeights?: Readonly<Record<string, number>>;
  /** __Default:__ 1 (stumps). */
  readonly depthLimit?: number;
  /** __Default:__ 'gini'. */
  readonly criterion?: MemberTreeOptions['criterion'];
  /**
   * Called after every kept round (src/learn/ensemble/progress.ts): `trainLoss` and `watchLoss` are the
   * weighted training and watched errors, `bestRound` the round with the lowest watched error so far.
   * When a stop rule discards a round, the last report repeats the round before it with `last` set.
   * Never changes the model. __Default:__ none.
   */
  readonly onRound?: RoundCallback;
}

export const adaBoostKeys = ['rounds', 'sampling', 'seed', 'watch', 'classWeights', 'onRound', ...memberTreeKeys] as const;

/**
 * Fit AdaBoost (two-class Algorithm 10.1, or SAMME for more classes).
 * @example
 * const ada = fitAdaBoost(data, { rounds: 200, depthLimit: 2 });
 * ada.rounds.map((r) => r.trainError); // training error after each round
 */
export function fitAdaBoost(data: Dataset, options: AdaBoostOptions = {}): AdaBoostModel {
  checkKnown(options, adaBoostKeys);
  if (data.target.kind !== 'class') throw errors.badTarget(data.target.name, 'AdaBoost needs a class target');
  const rounds = wholeNumber('rounds', options.rounds ?? 100, 1);
  const sampling = oneOf('sampling', options.sampling ?? 'weights', ['weights', 'resample']);
  const seed = wholeNumber('seed', options.seed ?? 0, -(2 ** 31));
  const member = resolveMemberTree(options, { criterion: 'gini', depthLimit: 1, leafRows: 1 });
  const onRound = callbackOption<RoundCallback>('onRound', options.onRound);
  const prep = prepareData(data, 'fit AdaBoost');
  const target = prep.data.target;
  if (target.kind !== 'class') throw errors.badTarget(target.name, 'AdaBoost needs a class target');
  const K = prep.nClasses, n = prep.n, y = target.codes;
  const sw = applyClassWeights(prep, options.classWeights);
  const watch: WatchSet | null = options.watch ? watchSetOf(options.watch, prep.data.features.schema.columns, target) : null;
  const src = rowSourceOf(prep.data.features);

  let total = 0;
  for (let i = 0; i < n; i++) total += sw[i];
  const w = Float64Array.from(sw, (v) => v / total);
  const prior = Array.from({ length: K }, (_, k) => { let s = 0; for (let i = 0; i < n; i++) if (y[i] === k) s += w[i]; return s; });
  const votes = new Float64Array(n * K), watchVotes = new Float64Array(watch ? watch.n * K : 0);
  const miss = new Uint8Array(n), growW = new Float64Array(n), guess = new Int32Array(n);
  const trees: FlatTree[] = [], stepWeights: number[] = [], log: AdaBoostRound[] = [];
  let stopReason: AdaBoostModel['stopReason'] = 'rounds';
  for (let m = 0; m < rounds; m++) {
    // the grower sees weights on a row scale (sum = n) so leafRows/leafWeight keep their meaning
    const fitW = sampling === 'resample' ? drawWeightedCounts(w, derive(seed, m)) : w;
    let fs = 0;
    for (let i = 0; i < n; i++) fs += fitW[i];
    for (let i = 0; i < n; i++) growW[i] = (fitW[i] * n) / fs;
    const { tree, leafOfRow } = growEnsembleTree({
      frame: prep.data.features, weights: growW,
      response: { kind: 'class', codes: y, nClasses: K, criterion: member.criterion },
      settings: member.grow, rng: derive(seed, m, 1),
    }, member.engine);
    // rows the tree was grown on: their leaf from the grower; rows left out (weight 0): routed
    for (let i = 0; i < n; i++) {
      const leaf = leafOfRow[i] >= 0 ? leafOfRow[i] : leafOf(tree, src, i);
      guess[i] = argmaxAt(tree.value, leaf * K, K);
      miss[i] = guess[i] !== y[i] ? 1 : 0;
    }
    const err = weightedError(w, miss);
    if (isNoBetterThanGuessing(err, K)) {
      stopReason = 'guessing';
      const prev = log.at(-1);
      if (onRound && prev) onRound({ round: prev.round, total: rounds, trainLoss: prev.trainError, watchLoss: prev.watchError, bestRound: bestOf(log), last: true });
      break;
    }
    const alpha = sammeStepWeight(err, K);
    trees.push(tree);
    stepWeights.push(alpha);
    for (let i = 0; i < n; i++) votes[i * K + guess[i]] += alpha;
    let watchError = NaN;
    if (watch) {
      for (let i = 0; i < watch.n; i++) watchVotes[i * K + argmaxAt(tree.value, leafOf(tree, watch.src, i) * K, K)] += alpha;
      watchError = voteError(watchVotes, watch.y, watch.weights, K);
    }
    const entry: AdaBoostRound = { round: m + 1, weightedError: err, stepWeight: alpha, trainError: voteError(votes, y, sw, K), watchError };
    log.push(entry);
    onRound?.({ round: m + 1, total: rounds, trainLoss: entry.trainError, watchLoss: watchError, bestRound: bestOf(log), last: err <= 0 || m + 1 === rounds });
    if (err <= 0) { stopReason = 'perfect'; break; }
    updateRowWeights(w, miss, alpha);
  }
  const record: Record<string, unknown> = { rounds, sampling, ...memberTreeRecord(member) };
  if (options.classWeights) record.classWeights = { ...options.classWeights };
  return {
    ...ensembleHeader('adaboost', prep.data, record, seed),
    kind: 'adaboost', trees, stepWeights, rounds: log, stopReason, prior,
    importance: impurityImportance(trees, prep.data.features.schema.columns),
  };
}

/** Round with the lowest watched error so far (the earliest on ties), or the latest round without a watched set. */
function bestOf(log: readonly AdaBoostRound[]): number {
  let best = log.length, low = Infinity;
  for (const r of log) if (r.watchError < low) { low = r.watchError; best = r.round; }
  return best;
}

/** Weighted share of rows whose top-voted class is wrong. */
function voteError(votes: Float64Array, y: ArrayLike<number>, w: Float64Array, K: number): number {
  let bad = 0, all = 0;
  for (let i = 0; i < w.length; i++) {
    all += w[i];
    if (argmaxAt(votes, i * K, K) !== y[i]) bad += w[i];
  }
  return all > 0 ? bad / all : NaN;
}
