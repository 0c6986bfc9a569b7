/**
 * Gradient boosting of trees for any differentiable loss (Friedman, J. (2001) "Greedy function
 * approximation: a gradient boosting machine", Annals of Statistics 29(5):1189–1232, Algorithm 1 with the
 * TreeBoost leaf values of §4): F_0 = the constant loss minimiser; each round takes the pseudo-residuals,
 * fits a least-squares tree to them, replaces its leaf values by the loss's leaf rule, and adds the tree
 * times the step η_m. Optional row subsampling per round (Friedman, J. (2002) "Stochastic gradient
 * boosting", CSDA 38(4):367–378), Newton trees (newton-response.ts) and early stopping on a watched set.
 * The round loop itself is in boost-rounds.ts.
 */
import { errors } from '../../errors.js';
import type { Dataset } from '../../table/frame.js';
import { resolveBoostingOptions, type BoostingOptions } from './boosting-options.js';
import { runBoostingRounds } from './boost-rounds.js';
import { ensembleHeader } from './header.js';
import { impurityImportance } from './importance.js';
import { pickLoss } from './loss/pick.js';
import type { BoostingModel } from './models.js';
import { memberTreeRecord } from './options.js';
import { applyClassWeights, prepareData } from './prepare.js';
import { watchSetOf } from './watch-set.js';

export type { BoostingOptions } from './boosting-options.js';

/**
 * Fit a gradient-boosted tree model.
 * @example
 * const gb = fitBoosting(train, { loss: 'huber', rounds: 300, learningRate: 0.05, watch: holdout, patience: 20 });
 * gb.bestRound;        // round with the lowest watched loss
 * gb.watchLoss;        // for a learning curve
 * fitBoosting(train, { rounds: 500, onRound: (p) => console.log(`${p.round}/${p.total}: ${p.trainLoss}`) });
 */
export function fitBoosting(data: Dataset, options: BoostingOptions = {}): BoostingModel {
  const s = resolveBoostingOptions(options, data.target);
  const prep = prepareData(data, 'fit a boosted model');
  const target = prep.data.target;
  const loss = pickLoss(s.loss, target, { huberQuantile: s.huberQuantile, quantileLevel: s.quantileLevel });
  const n = prep.n, K = loss.nOutputs;
  const y = target.kind === 'class' ? Float64Array.from(target.codes) : target.values;
  if (s.loss === 'poisson') for (let i = 0; i < n; i++) if (y[i] < 0) throw errors.badValue(target.name, i, y[i], 'a count >= 0 for the poisson loss');
  const w = applyClassWeights(prep, options.classWeights);
  const frame = prep.data.features;
  const watch = options.watch ? watchSetOf(options.watch, frame.schema.columns, target) : null;
  const initial = loss.initial(y, w);
  const run = runBoostingRounds({ loss, y, w, frame, watch, initial, settings: s });

  const roundsKept = s.patience === Infinity ? run.steps.length : run.best;
  const kept = run.trees.slice(0, roundsKept * K);
  const record: Record<string, unknown> = {
    loss: s.loss, rounds: s.rounds, learningRate: s.learningRate, stepDecay: s.stepDecay, rowFraction: s.rowFraction,
    patience: s.patience, huberQuantile: s.huberQuantile, quantileLevel: s.quantileLevel, ...memberTreeRecord(s.tree),
  };
  if (s.newtonTrees) record.newtonTrees = true;
  if (options.classWeights) record.classWeights = { ...options.classWeights };
  return {
    ...ensembleHeader('boosting', prep.data, record, s.seed),
    kind: 'boosting', loss: s.loss, nOutputs: K, initial: Array.from(initial), trees: kept,
    steps: run.steps.slice(0, roundsKept), trainLoss: run.trainLoss, watchLoss: run.watchLoss, bestRound: run.best, roundsKept,
    importance: impurityImportance(kept, frame.schema.columns),
  };
}
