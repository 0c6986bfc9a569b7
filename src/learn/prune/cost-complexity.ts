/**
 * Cost-complexity pruning with α chosen on held-out rows or by k-fold cross-validation (Breiman,
 * Friedman, Olshen & Stone 1984, Classification and Regression Trees, ch. 3, §3.3–3.4).
 *
 * Held-out: each subtree T_k of the weakest-link sequence is scored on the held-out rows.
 * Cross-validation: the rows are split into `folds` seeded random folds; on each fold's training part
 * a tree is grown with the model's own settings and its own α sequence computed; the fold's held-out
 * rows are scored at the geometric midpoints α'_k = sqrt(α_k α_{k+1}) of the main sequence (the last
 * step at α = ∞, the root alone), and errors are pooled over all rows (§3.4.2).
 * Choice: `'oneSE'` (the default, §3.4.3): the smallest tree whose error is within one standard error
 * of the minimum; `'minimum'`: the smallest error (ties: the smaller tree).
 */
import { errors } from '../../errors.js';
import { takeDataset } from '../../table/dataset.js';
import type { Dataset } from '../../table/frame.js';
import { derive, shuffleInPlace } from '../../util/rng.js';
import { fitTree } from '../tree/fit-tree.js';
import { TREE_OPTION_NAMES, type TreeOptions } from '../tree/tree-options.js';
import type { TreeModel } from '../tree-model.js';
import { collapseTree } from './collapse.js';
import { costComplexityPath, type ComplexityPath } from './complexity-path.js';
import { nodeLosses } from './node-losses.js';
import { StepErrors } from './step-errors.js';

export interface CostComplexityOptions {
  /** Rows held out from training to score each subtree; without them, cross-validation. __Default:__ none. */
  readonly heldOut?: Dataset;
  /** Number of cross-validation folds (when `heldOut` is not given). __Default:__ 10. */
  readonly folds?: number;
  /** How α is chosen: `'oneSE'` or `'minimum'`. __Default:__ `'oneSE'`. */
  readonly rule?: 'oneSE' | 'minimum';
  /** Seed for the fold assignment. __Default:__ the model's seed. */
  readonly seed?: number;
}

/** One subtree of the sequence with its sizes and errors. */
export interface ComplexityRow {
  readonly step: number;
  readonly alpha: number;
  readonly leaves: number;
  readonly nodes: number;
  readonly trainingRisk: number;
  /** Held-out or cross-validated error: error rate (classification) or mean squared error. */
  readonly error: number;
  readonly standardError: number;
  readonly chosen: boolean;
}

export interface CostComplexityResult {
  readonly model: TreeModel;
  readonly alpha: number;
  readonly table: ComplexityRow[];
  readonly evaluation: 'heldOut' | 'crossValidation';
  readonly rule: 'oneSE' | 'minimum';
}

/**
 * `model` pruned to the subtree of its sequence in force at `alpha`.
 * @example
 * const small = pruneAtAlpha(model, costComplexityPath(model, train), 0.01);
 */
export function pruneAtAlpha(model: TreeModel, path: ComplexityPath, alpha: number): TreeModel {
  const collapse = Array.from(path.collapseAt, (a) => a <= alpha);
  return { ...model, tree: collapseTree(model.tree, collapse) };
}

const KNOWN = ['heldOut', 'folds', 'rule', 'seed'];

/**
 * Prune `model` (grown on `train`) by cost-complexity, choosing α on held-out rows or by
 * cross-validation; returns the pruned model and one table row per subtree of the sequence.
 * @example
 * const { model: pruned, table, alpha } = pruneCostComplexity(model, train, { folds: 5 });
 */
export function pruneCostComplexity(model: TreeModel, train: Dataset, options: CostComplexityOptions = {}): CostComplexityResult {
  for (const key of Object.keys(options)) if (!KNOWN.includes(key)) throw errors.unknownOption(key, KNOWN);
  const rule = options.rule ?? 'oneSE';
  if (rule !== 'oneSE' && rule !== 'minimum') throw errors.badOption('rule', rule, "'oneSE' or 'minimum'");
  const folds = options.folds ?? 10;
  if (!Number.isInteger(folds) || folds < 2) throw errors.badOption('folds', folds, 'an integer >= 2');
  const seed = options.seed ?? model.seed;
  if (!Number.isInteger(seed)) throw errors.badOption('seed', seed, 'an integer');

  const path = costComplexityPath(model, train);
  const alphas = path.steps.map((s) => s.alpha);
  const acc = new StepErrors(alphas.length);
  if (options.heldOut) {
    acc.add(nodeLosses(model, options.heldOut), path.collapseAt, alphas);
  } else {
    const n = train.features.nRows;
    if (folds > n) throw errors.badOption('folds', folds, `at most the number of rows (${n})`);
    const mids = alphas.map((a, k) => (k + 1 < alphas.length ? Math.sqrt(a * alphas[k + 1]) : Infinity));
    const order = shuffleInPlace(derive(seed, 0x636370), Array.from({ length: n }, (_, i) => i));
    const settings: Record<string, unknown> = {};
    for (const k of TREE_OPTION_NAMES) if (model.settings[k] !== undefined) settings[k] = model.settings[k];
    for (let f = 0; f < folds; f++) {
      const test = order.filter((_, i) => i % folds === f).sort((a, b) => a - b);
      const fit = order.filter((_, i) => i % folds !== f).sort((a, b) => a - b);
      const foldTrain = takeDataset(train, fit);
      const foldModel = fitTree(foldTrain, settings as TreeOptions);
      const foldPath = costComplexityPath(foldModel, foldTrain);
      acc.add(nodeLosses(foldModel, takeDataset(train, test)), foldPath.collapseAt, mids);
    }
  }
  const err = acc.errors(), se = acc.standardErrors();
  let best = 0;
  for (let k = 1; k < err.length; k++) if (err[k] <= err[best]) best = k;
  let chosen = best;
  if (rule === 'oneSE') {
    const limit = err[best] + (Number.isFinite(se[best]) ? se[best] : 0);
    for (let k = err.length - 1; k > best; k--) if (err[k] <= limit) { chosen = k; break; }
  }
  const alpha = alphas[chosen];
  const table = path.steps.map((s, k) => ({ step: k, ...s, error: err[k], standardError: se[k], chosen: k === chosen }));
  const pruned = pruneAtAlpha(model, path, alpha);
  return {
    model: {
      ...pruned,
      settings: {
        ...model.settings,
        pruning: { method: 'costComplexity', alpha, rule, evaluation: options.heldOut ? 'heldOut' : 'crossValidation', folds: options.heldOut ? 0 : folds },
      },
    },
    alpha, table, evaluation: options.heldOut ? 'heldOut' : 'crossValidation', rule,
  };
}
