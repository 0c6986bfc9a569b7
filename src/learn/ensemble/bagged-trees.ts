/**
 * The shared core of bagging and random forests (Breiman, L. (1996) "Bagging predictors", Machine
 * Learning 24:123–140; Breiman, L. (2001) "Random forests", Machine Learning 45:5–32): members grown on
 * bootstrap samples (counts as row weights), combined in index order, with out-of-bag error per size.
 */
import type { Dataset } from '../../table/frame.js';
import type { FlatTree } from '../flat-tree.js';
import type { Response } from '../grow-task.js';
import { growForestMember, type MemberPlan } from './forest-member.js';
import { ensembleHeader } from './header.js';
import { impurityImportance } from './importance.js';
import type { ForestModel } from './models.js';
import { OobTally } from './oob.js';
import { memberTreeRecord } from './options.js';
import { applyClassWeights, prepareData } from './prepare.js';
import { rowSourceOf } from '../tree/row-source.js';

/** Resolved settings of a bagged-tree fit. */
export interface BaggedTreeSettings {
  readonly size: number;
  readonly seed: number;
  readonly combine: 'average' | 'vote';
  readonly plan: MemberPlan;
  readonly classWeights: Readonly<Record<string, number>> | undefined;
}

/**
 * Fit `settings.size` bootstrap trees on `data`; the grower's `featuresPerSplit` decides bagging (0) or forest.
 * @example
 * const model = fitBaggedTrees('forest', data, settings);
 */
export function fitBaggedTrees(kind: 'bagging' | 'forest', data: Dataset, settings: BaggedTreeSettings): ForestModel {
  const prep = prepareData(data, `fit ${kind === 'forest' ? 'a random forest' : 'bagged trees'}`);
  const weights = applyClassWeights(prep, settings.classWeights);
  const t = prep.data.target;
  const response: Response = t.kind === 'class'
    ? { kind: 'class', codes: t.codes, nClasses: t.classes.length, criterion: settings.plan.tree.criterion }
    : { kind: 'value', values: t.values, leaf: 'mean' };
  const memberData = { frame: prep.data.features, response, weights };
  const src = rowSourceOf(prep.data.features);
  const oob = new OobTally(prep.n, prep.nClasses, t.kind === 'class' ? t.codes : t.values, prep.weights, settings.combine === 'vote');
  const trees: FlatTree[] = [];
  for (let m = 0; m < settings.size; m++) {
    const { tree, counts } = growForestMember(memberData, settings.plan, settings.seed, m);
    trees.push(tree);
    oob.addTree(tree, src, counts);
  }
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
