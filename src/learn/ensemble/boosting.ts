/**
 * Gradient boosting of trees for any differentiable loss (Friedman, J. (2001) "Greedy function
 * approximation: a gradient boosting machine", Annals of Statistics 29(5):1189–1232, Algorithm 1 with the
 * TreeBoost leaf values of §4): F_0 = the constant loss minimiser; each round takes the pseudo-residuals,
 * fits a least-squares tree to them, replaces its leaf values by the loss's leaf rule, and adds the tree
 * times the step η_m. Optional row subsampling per round (Friedman, J. (2002) "Stochastic gradient
 * boosting", CSDA 38(4):367–378) and early stopping on a watched set.
 */
import { errors } from '../../errors.js';
import type { Dataset } from '../../table/frame.js';
import { derive } from '../../util/rng.js';
import { leafOf, type FlatTree } from '../flat-tree.js';
import { resolveBoostingOptions, type BoostingOptions } from './boosting-options.js';
import { growEnsembleTree } from './engine.js';
import { ensembleHeader } from './header.js';
import { impurityImportance } from './importance.js';
import { refreshInnerValues } from './inner-values.js';
import { createLeafScratch, setLeafValues } from './leaf-values.js';
import { pickLoss } from './loss/pick.js';
import type { BoostingModel } from './models.js';
import { memberTreeRecord } from './options.js';
import { applyClassWeights, prepareData } from './prepare.js';
import { drawSubsampleMask } from './subsample.js';
import { addTreeValues } from './tree-sum.js';
import { watchSetOf } from './watch-set.js';
import { rowSourceOf } from '../tree/row-source.js';

export type { BoostingOptions } from './boosting-options.js';

/**
 * Fit a gradient-boosted tree model.
 * @example
 * const gb = fitBoosting(train, { loss: 'huber', rounds: 300, learningRate: 0.05, watch: holdout, patience: 20 });
 * gb.bestRound;        // round with the lowest watched loss
 * gb.watchLoss;        // for a learning curve
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
  const src = rowSourceOf(frame);
  const watch = options.watch ? watchSetOf(options.watch, frame.schema.columns, target) : null;

  const initial = loss.initial(y, w);
  const F = new Float64Array(n * K), Fw = new Float64Array(watch ? watch.n * K : 0);
  for (let i = 0; i < n; i++) F.set(initial, i * K);
  if (watch) for (let i = 0; i < watch.n; i++) Fw.set(initial, i * K);
  const trainLoss = [loss.value(y, F, w)];
  const watchLoss = watch ? [loss.value(watch.y, Fw, watch.weights)] : [];

  const r = new Float64Array(n), roundW = new Float64Array(n), scratch = createLeafScratch(n);
  const trees: FlatTree[] = [], steps: number[] = [];
  let best = 0, bestLoss = watch ? watchLoss[0] : Infinity;
  for (let m = 0; m < s.rounds; m++) {
    const step = s.learningRate / (1 + s.stepDecay * m);
    const mask = s.rowFraction < 1 ? drawSubsampleMask(n, s.rowFraction, derive(s.seed, m)) : null;
    for (let i = 0; i < n; i++) roundW[i] = mask && !mask[i] ? 0 : w[i];
    loss.startRound(y, F, roundW);
    for (let k = 0; k < K; k++) {
      loss.residuals(y, F, k, r);
      const { tree, leafOfRow } = growEnsembleTree({
        frame, weights: roundW, response: { kind: 'value', values: r, leaf: 'mean' },
        settings: s.tree.grow, rng: derive(s.seed, m, k, 1),
      }, s.tree.engine);
      setLeafValues(tree, leafOfRow, loss, y, F, roundW, k, r, step, scratch);
      refreshInnerValues(tree);
      // update scores: rows in this round's sample by their leaf, the others by routing
      const v = tree.value;
      for (let i = 0; i < n; i++) {
        const l = leafOfRow[i] >= 0 ? leafOfRow[i] : leafOf(tree, src, i);
        F[i * K + k] += v[l];
      }
      if (watch) addTreeValues(tree, watch.src, watch.n, Fw, K, k);
      trees.push(tree);
    }
    steps.push(step);
    trainLoss.push(loss.value(y, F, w));
    if (watch) {
      const wl = loss.value(watch.y, Fw, watch.weights);
      watchLoss.push(wl);
      if (wl < bestLoss - 1e-12 * Math.abs(bestLoss)) { bestLoss = wl; best = m + 1; }
      else if (m + 1 - best >= s.patience) break;
    } else best = m + 1;
  }
  const roundsKept = s.patience === Infinity ? steps.length : best;
  const kept = trees.slice(0, roundsKept * K);
  const record: Record<string, unknown> = {
    loss: s.loss, rounds: s.rounds, learningRate: s.learningRate, stepDecay: s.stepDecay, rowFraction: s.rowFraction,
    patience: s.patience, huberQuantile: s.huberQuantile, quantileLevel: s.quantileLevel, ...memberTreeRecord(s.tree),
  };
  if (options.classWeights) record.classWeights = { ...options.classWeights };
  return {
    ...ensembleHeader('boosting', prep.data, record, s.seed),
    kind: 'boosting', loss: s.loss, nOutputs: K, initial: Array.from(initial), trees: kept,
    steps: steps.slice(0, roundsKept), trainLoss, watchLoss, bestRound: best, roundsKept,
    importance: impurityImportance(kept, frame.schema.columns),
  };
}

