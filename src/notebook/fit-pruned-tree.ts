/**
 * A tree grown and then pruned in one call, so that the fit magic can prune from its settings:
 * reduced-error pruning on held-out rows (`pruneReducedError`) or cost-complexity pruning with α chosen
 * on held-out rows or by cross-validation (`pruneCostComplexity`).
 */
import { errors } from '../errors.js';
import { pruneCostComplexity } from '../learn/prune/cost-complexity.js';
import { pruneReducedError } from '../learn/prune/reduced-error.js';
import { fitTree } from '../learn/tree/fit-tree.js';
import type { TreeOptions } from '../learn/tree/tree-options.js';
import type { TreeModel } from '../learn/tree-model.js';
import type { Dataset } from '../table/frame.js';
import { isDataset } from './is-dataset.js';

export interface PrunedTreeOptions extends TreeOptions {
  /**
   * Pruning method: `'reducedError'` (needs `pruneOn`) or `'costComplexity'`; the spellings
   * `'reduced-error'` and `'cost-complexity'` are accepted too. __Default:__ `'costComplexity'` when
   * `pruneFolds` or `pruneRule` is given, else `'reducedError'`.
   */
  readonly prune?: string;
  /** Held-out rows (not used in training) that judge each pruning step. __Default:__ none. */
  readonly pruneOn?: Dataset;
  /** Cost-complexity without `pruneOn`: cross-validation folds. __Default:__ 10 (as `pruneCostComplexity`). */
  readonly pruneFolds?: number;
  /** Cost-complexity: `'oneSE'` or `'minimum'`. __Default:__ `'oneSE'` (as `pruneCostComplexity`). */
  readonly pruneRule?: 'oneSE' | 'minimum';
}

const methods: Readonly<Record<string, 'reducedError' | 'costComplexity'>> = {
  reducederror: 'reducedError',
  costcomplexity: 'costComplexity',
};

/**
 * Grow a tree with the `TreeOptions` in `options`, then prune it as the pruning options say. The model's
 * `settings.pruning` records the method (as the pruning functions write it).
 * @example
 * const pruned = fitPrunedTree(train, { criterion: 'gini', prune: 'reduced-error', pruneOn: validation });
 * const cc = fitPrunedTree(train, { prune: 'cost-complexity', pruneFolds: 5 });
 */
export function fitPrunedTree(data: Dataset, options: PrunedTreeOptions = {}): TreeModel {
  const { prune, pruneOn, pruneFolds, pruneRule, ...grow } = options;
  const costly = pruneFolds !== undefined || pruneRule !== undefined;
  const method = prune === undefined ? (costly ? 'costComplexity' : 'reducedError')
    : methods[String(prune).replace(/[-_\s]/g, '').toLowerCase()];
  if (method === undefined) throw errors.badOption('prune', prune, "'reduced-error' or 'cost-complexity'");
  if (pruneOn !== undefined && !isDataset(pruneOn)) throw errors.badOption('pruneOn', pruneOn, 'held-out rows (a table or Dataset)');
  const model = fitTree(data, grow);
  if (method === 'reducedError') {
    if (costly) throw errors.badOption(pruneFolds !== undefined ? 'pruneFolds' : 'pruneRule', pruneFolds ?? pruneRule, 'no value with reduced-error pruning (it uses pruneOn only)');
    if (pruneOn === undefined) throw errors.badOption('pruneOn', pruneOn, 'held-out rows for reduced-error pruning');
    return pruneReducedError(model, pruneOn).model;
  }
  if (pruneOn !== undefined && pruneFolds !== undefined) throw errors.badOption('pruneFolds', pruneFolds, 'no value when pruneOn is given (held-out rows replace cross-validation)');
  return pruneCostComplexity(model, data, {
    ...(pruneOn !== undefined ? { heldOut: pruneOn } : {}),
    ...(pruneFolds !== undefined ? { folds: pruneFolds } : {}),
    ...(pruneRule !== undefined ? { rule: pruneRule } : {}),
  }).model;
}
