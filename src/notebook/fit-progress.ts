/**
 * Feeding a fit's progress display from the learner's own progress callback (`onRound` for boosting and
 * AdaBoost, `onTree` for bagging and forests; src/learn/ensemble/progress.ts): round or tree of total,
 * the current training and watched score, the best round so far, out-of-bag error.
 */
import { adaBoostKeys } from '../learn/ensemble/adaboost.js';
import { baggingKeys } from '../learn/ensemble/bagging.js';
import { boostingKeys } from '../learn/ensemble/boosting-options.js';
import { forestKeys } from '../learn/ensemble/forest.js';
import type { RoundInfo, TreeInfo } from '../learn/ensemble/progress.js';
import type { LearnerRule } from './magic-learners.js';
import type { Progress } from './progress.js';

/** The options each learner function validates against: a callback is passed only where it is accepted. */
const acceptedOptions: Readonly<Record<string, readonly string[]>> = {
  fitBoosting: boostingKeys, fitAdaBoost: adaBoostKeys, fitForest: forestKeys, fitBagging: baggingKeys,
};

type Scores = Record<string, number>;

/**
 * The scores shown for one `onRound` report (`score`: the learner's training measure, loss or error).
 * @example
 * roundScores({ round: 3, total: 10, trainLoss: 0.5, watchLoss: 0.6, bestRound: 2, last: false }, 'loss');
 * // { 'training loss': 0.5, 'watched loss': 0.6, 'best round': 2 }
 */
export function roundScores(info: RoundInfo, score: 'loss' | 'error'): Scores {
  const out: Scores = { [`training ${score}`]: info.trainLoss };
  if (!Number.isNaN(info.watchLoss)) {
    out[`watched ${score}`] = info.watchLoss;
    out['best round'] = info.bestRound;
  }
  return out;
}

/**
 * The scores shown for one `onTree` report (none while no row has been out of bag).
 * @example
 * treeScores({ done: 4, total: 5, oobError: 0.25 }); // { 'out-of-bag error': 0.25 }
 */
export function treeScores(info: TreeInfo): Scores {
  return Number.isNaN(info.oobError) ? {} : { 'out-of-bag error': info.oobError };
}

/**
 * The options that make learner `rule` report to `progress` (none when it has no callback, or does not
 * accept it yet). A callback already in `given` is kept and called first.
 * @example
 * const extra = progressOptions(learnerTable.boosting, progress, options);
 * fitBoosting(data, { ...options, ...extra });
 */
export function progressOptions(rule: LearnerRule | undefined, progress: Progress, given: Readonly<Record<string, unknown>> = {}): Record<string, unknown> {
  const p = rule?.progress;
  if (!p || !(acceptedOptions[rule.fn] ?? []).includes(p.option)) return {};
  const own = typeof given[p.option] === 'function' ? given[p.option] as (info: unknown) => void : null;
  const report = p.option === 'onRound'
    ? (info: RoundInfo) => progress.step(info.round, roundScores(info, p.score), info.total)
    : (info: TreeInfo) => progress.step(info.done, treeScores(info), info.total);
  return {
    [p.option]: (info: RoundInfo & TreeInfo) => {
      own?.(info);
      report(info);
    },
  };
}
