/**
 * The shared core of bagging and random forests (Breiman, L. (1996) "Bagging predictors", Machine
 * Learning 24:123–140; Breiman, L. (2001) "Random forests", Machine Learning 45:5–32): members grown on
 * bootstrap samples (counts as row weights), combined in index order, with out-of-bag error per size.
 * Members are grown by `runTreeJobs` (src/learn/parallel/tree-jobs.ts) on `workers` threads; each
 * depends only on (seed, index) and the out-of-bag sums are added in index order, so the model is the
 * same whatever the number of workers.
 */
import type { Dataset } from '../../table/frame.js';
import type { FlatTree } from '../flat-tree.js';
import type { Response } from '../grow-task.js';
import { binnedForGrowth } from '../hist/hist-build.js';
import { runTreeJobs } from '../parallel/tree-jobs.js';
import { toShared } from '../parallel/share.js';
import { forestJobSpec, type ForestJobInput } from './forest-job.js';
import type { MemberData, MemberPlan } from './forest-member.js';
import { ensembleHeader } from './header.js';
import { impurityImportance } from './importance.js';
import type { ForestModel } from './models.js';
import { OobTally } from './oob.js';
import { memberTreeRecord } from './options.js';
import { applyClassWeights, prepareData } from './prepare.js';
import type { TreeCallback } from './progress.js';
import { treeWorkers } from './worker-count.js';

/** Resolved settings of a bagged-tree fit. */
export interface BaggedTreeSettings {
  readonly size: number;
  readonly seed: number;
  readonly combine: 'average' | 'vote';
  readonly plan: MemberPlan;
  readonly classWeights: Readonly<Record<string, number>> | undefined;
  /** Threads (the `workers` option, unchecked). __Default:__ see `treeWorkers`. */
  readonly workers?: unknown;
  /** Progress callback. __Default:__ none. */
  readonly onTree?: TreeCallback | null;
}

/**
 * Fit `settings.size` bootstrap trees on `data`; the grower's `featuresPerSplit` decides bagging (0) or forest.
 * @example
 * const model = fitBaggedTrees('forest', data, settings);
 */
export function fitBaggedTrees(kind: 'bagging' | 'forest', data: Dataset, settings: BaggedTreeSettings): ForestModel {
  const prep = prepareData(data, `fit ${kind === 'forest' ? 'a random forest' : 'bagged trees'}`);
  const workers = treeWorkers(settings.workers, prep.n, settings.size);
  const weights = applyClassWeights(prep, settings.classWeights);
  const t = prep.data.target;
  const response: Response = t.kind === 'class'
    ? { kind: 'class', codes: t.codes, nClasses: t.classes.length, criterion: settings.plan.tree.criterion }
    : { kind: 'value', values: t.values, leaf: 'mean' };
  const memberData: MemberData = { frame: prep.data.features, response, weights };
  const oob = new OobTally(prep.n, prep.nClasses, t.kind === 'class' ? t.codes : t.values, prep.weights, settings.combine === 'vote');
  const trees = growMembers(memberData, settings, workers, (tree, oobLeaf) => {
    const error = oob.addLeaves(tree, oobLeaf);
    settings.onTree?.({ done: oob.curve.length, total: settings.size, oobError: error });
  });
  const record: Record<string, unknown> = {
    size: settings.size, featuresPerSplit: settings.plan.featuresPerSplit, combine: settings.combine,
    ...memberTreeRecord(settings.plan.tree),
  };
  if (settings.classWeights) record.classWeights = { ...settings.classWeights };
  return {
    ...ensembleHeader(kind, prep.data, record, settings.seed),
    kind,
    trees,
    combine: settings.combine,
    oobCurve: oob.curve,
    importance: impurityImportance(trees, prep.data.features.schema.columns),
  };
}

/**
 * Grow every member on `workers` threads, handing each to `add` in index order. With a progress
 * callback the members are grown in batches, so progress is reported while the fit runs.
 */
function growMembers(
  data: MemberData, settings: BaggedTreeSettings, workers: number, add: (tree: FlatTree, oobLeaf: Int32Array) => void,
): FlatTree[] {
  const size = settings.size;
  const binned = settings.plan.tree.engine === 'histogram' ? binnedForGrowth(data.frame) : undefined;
  let input: ForestJobInput = { data, plan: settings.plan, seed: settings.seed, first: 0, ...(binned ? { binned } : {}) };
  // typed arrays go to shared memory once, not once per batch
  if (workers > 1) input = toShared(input);
  const batch = settings.onTree ? (workers > 1 ? Math.max(2 * workers, Math.ceil(size / 25)) : 1) : size;
  const trees: FlatTree[] = [];
  for (let first = 0; first < size; first += batch) {
    const count = Math.min(batch, size - first);
    for (const member of runTreeJobs(count, forestJobSpec({ ...input, first }), workers)) {
      trees.push(member.tree);
      add(member.tree, member.oobLeaf);
    }
  }
  return trees;
}
