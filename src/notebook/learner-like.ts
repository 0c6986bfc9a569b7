/**
 * A learner that fits again like an already fitted model: the same kind, the same recorded settings and
 * seed. Stacking from a notebook names earlier models (`members: shallow, forest`) and refits each one in
 * every fold through this.
 */
import { errors } from '../errors.js';
import { adaBoostKeys, fitAdaBoost } from '../learn/ensemble/adaboost.js';
import { baggingKeys, fitBagging } from '../learn/ensemble/bagging.js';
import { fitBoosting } from '../learn/ensemble/boosting.js';
import { boostingKeys } from '../learn/ensemble/boosting-options.js';
import { fitForest, forestKeys } from '../learn/ensemble/forest.js';
import type { StackLearner } from '../learn/ensemble/stacking.js';
import type { ModelHeader } from '../learn/model.js';
import { fitTree } from '../learn/tree/fit-tree.js';
import { TREE_OPTION_NAMES } from '../learn/tree/tree-options.js';
import type { Dataset } from '../table/frame.js';
import { fitPrunedTree } from './fit-pruned-tree.js';

type Loose = Record<string, unknown>;

function pick(settings: Readonly<Loose>, keys: readonly string[], extra: Loose = {}): Loose {
  const out: Loose = {};
  for (const k of keys) if (settings[k] !== undefined) out[k] = settings[k];
  return { ...out, ...extra };
}

function treeFit(model: ModelHeader, name: string): (d: Dataset) => ModelHeader {
  const grow = pick(model.settings, TREE_OPTION_NAMES);
  const pruning = model.settings.pruning as Loose | undefined;
  if (pruning === undefined) return (d) => fitTree(d, grow);
  if (pruning.method === 'costComplexity' && pruning.evaluation === 'crossValidation') {
    const how = { prune: 'costComplexity', pruneFolds: pruning.folds as number, pruneRule: pruning.rule as 'oneSE' | 'minimum' };
    return (d) => fitPrunedTree(d, { ...grow, ...how });
  }
  throw errors.notSupported(`Refitting tree ${JSON.stringify(name)} inside a stack's folds: it was pruned on held-out rows, which each fold does not have (prune it by cross-validation, or pass a learner)`);
}

/**
 * A stack member named `name` that fits like `model`. Boosting stopped early refits the rounds it kept;
 * held-out rows a model watched are not used again. A stack cannot be a member.
 * @example
 * const stack = fitStack(train, [learnerLike(forest, 'forest'), learnerLike(boosted, 'boosted')]);
 */
export function learnerLike(model: ModelHeader, name: string): StackLearner {
  const s = model.settings;
  const seed = { seed: model.seed };
  switch (model.kind) {
    case 'tree':
      return { name, fit: treeFit(model, name) };
    case 'forest':
      return { name, fit: (d) => fitForest(d, pick(s, forestKeys, seed)) };
    case 'bagging':
      return { name, fit: (d) => fitBagging(d, pick(s, baggingKeys, seed)) };
    case 'adaboost':
      return { name, fit: (d) => fitAdaBoost(d, pick(s, adaBoostKeys.filter((k) => k !== 'watch'), seed)) };
    case 'boosting': {
      const early = typeof s.patience === 'number' && Number.isFinite(s.patience);
      const keys = boostingKeys.filter((k) => k !== 'watch' && k !== 'patience');
      const rounds = early ? (model as unknown as { roundsKept: number }).roundsKept : s.rounds;
      return { name, fit: (d) => fitBoosting(d, pick(s, keys, { ...seed, rounds })) };
    }
    case 'stack':
      throw errors.notSupported(`A stack (${JSON.stringify(name)}) as a member of a stack`);
  }
}
