/**
 * Every tree model coppice explains or exports, written as one additive form:
 *
 *   output(x) = base + Σ_members values_m(leaf_m(x))
 *
 * where each member is a FlatTree whose per-node value vectors (`values`, `width` numbers per node) are
 * added into outputs `at .. at + width − 1`. What "output" means for each model kind:
 * - 'tree': the leaf value — class probabilities, or the predicted number.
 * - 'bagging' / 'forest': the members' mean — of leaf probabilities ('average'), of one-hot votes for each
 *   member's most probable class ('vote'), or of leaf numbers (regression).
 * - 'adaboost': each class's share of the α-weighted vote, Σ_m α_m I(G_m(x) = k) / Σ_m α_m; with no kept
 *   round the training class shares (base only).
 * - 'boosting': the raw score (margin) F(x) = F_0 + Σ trees, each tree's leaves already holding the step
 *   (learning rate) times the fitted value — before the link: log-odds of the second class ('logistic'),
 *   K class scores before the softmax ('multiclass'), log of the mean ('poisson'), the value otherwise.
 * Stacks are not additive in their trees and are refused.
 */
import { errors } from '../errors.js';
import { LEAF, type FlatTree } from '../learn/flat-tree.js';
import type { ModelHeader } from '../learn/model.js';
import type { AdaBoostModel, BoostingModel, ForestModel } from '../learn/ensemble/models.js';
import type { TreeModel } from '../learn/tree-model.js';
import type { ColumnSchema } from '../table/frame.js';

/** One tree of the additive form. */
export interface AdditiveMember {
  readonly tree: FlatTree;
  /** Per-node contribution vectors, `width` numbers per node (node n at n·width). */
  readonly values: Float64Array;
  readonly width: number;
  /** First output the member adds into. */
  readonly at: number;
}

/** How raw outputs become predictions. */
export type OutputLink = 'identity' | 'logistic' | 'softmax' | 'exp';

export interface AdditiveModel {
  readonly kind: ModelHeader['kind'];
  readonly task: ModelHeader['task'];
  readonly features: readonly ColumnSchema[];
  /** Number of outputs: K class probabilities or scores, 1 for a number or a binary margin. */
  readonly nOutputs: number;
  /** Names of the outputs (class labels, or the target name). */
  readonly outputNames: readonly string[];
  /** What an output is, in words (for chart titles). */
  readonly outputMeaning: string;
  readonly base: Float64Array;
  readonly members: readonly AdditiveMember[];
  /** Link from raw outputs to the model's predictions. */
  readonly link: OutputLink;
}

function argmax(v: Float64Array, o: number, k: number): number {
  let best = 0;
  for (let j = 1; j < k; j++) if (v[o + j] > v[o + best]) best = j;
  return best;
}

/** Per-node values scaled by `scale`; with `vote`, a one-hot of each node's most probable class instead. */
function memberValues(tree: FlatTree, scale: number, vote: boolean): Float64Array {
  const k = tree.nOutputs;
  const out = new Float64Array(tree.nNodes * k);
  for (let n = 0; n < tree.nNodes; n++) {
    if (vote) out[n * k + argmax(tree.value, n * k, k)] = scale;
    else for (let j = 0; j < k; j++) out[n * k + j] = scale * tree.value[n * k + j];
  }
  return out;
}

function classNames(model: ModelHeader): string[] {
  return [...(model.target.classes ?? [])];
}

function forestForm(m: ForestModel): Omit<AdditiveModel, 'kind' | 'task' | 'features'> {
  const size = m.trees.length;
  if (size === 0) throw errors.notSupported('explaining a forest with no trees');
  const vote = m.task === 'classification' && m.combine === 'vote';
  const K = m.task === 'classification' ? classNames(m).length : 1;
  return {
    nOutputs: K,
    outputNames: m.task === 'classification' ? classNames(m) : [m.target.name],
    outputMeaning: m.task === 'regression' ? 'mean of the trees' : vote ? 'share of tree votes' : 'mean class probability',
    base: new Float64Array(K),
    members: m.trees.map((tree) => ({ tree, values: memberValues(tree, 1 / size, vote), width: tree.nOutputs, at: 0 })),
    link: 'identity',
  };
}

function adaboostForm(m: AdaBoostModel): Omit<AdditiveModel, 'kind' | 'task' | 'features'> {
  const K = classNames(m).length;
  const sum = m.stepWeights.reduce((a, b) => a + b, 0);
  const kept = m.trees.length > 0 && sum > 0;
  return {
    nOutputs: K,
    outputNames: classNames(m),
    outputMeaning: 'share of the weighted vote',
    base: kept ? new Float64Array(K) : Float64Array.from(m.prior),
    members: kept ? m.trees.map((tree, t) => ({ tree, values: memberValues(tree, m.stepWeights[t] / sum, true), width: tree.nOutputs, at: 0 })) : [],
    link: 'identity',
  };
}

function boostingForm(m: BoostingModel): Omit<AdditiveModel, 'kind' | 'task' | 'features'> {
  const K = m.nOutputs;
  const used = m.trees.slice(0, m.roundsKept * K);
  const link: OutputLink = m.loss === 'logistic' ? 'logistic' : m.loss === 'multiclass' ? 'softmax' : m.loss === 'poisson' ? 'exp' : 'identity';
  const names = m.loss === 'logistic' ? [classNames(m)[1] ?? 'positive'] : m.task === 'classification' ? classNames(m) : [m.target.name];
  const meaning = m.loss === 'logistic' ? 'log-odds (raw score)' : m.loss === 'multiclass' ? 'class score before softmax' : m.loss === 'poisson' ? 'log of the mean (raw score)' : 'raw score';
  return {
    nOutputs: K,
    outputNames: names,
    outputMeaning: meaning,
    base: Float64Array.from(m.initial),
    members: used.map((tree, t) => ({ tree, values: memberValues(tree, 1, false), width: tree.nOutputs, at: K === tree.nOutputs ? 0 : t % K })),
    link,
  };
}

/**
 * The additive form of a tree, forest, bagging, AdaBoost or boosting model (see the file comment for
 * what the output means for each kind). Throws for a stack or an unknown kind.
 * @example
 * const form = additiveModelOf(forest);
 * form.members.length; // number of trees
 */
export function additiveModelOf(model: ModelHeader): AdditiveModel {
  let body: Omit<AdditiveModel, 'kind' | 'task' | 'features'>;
  switch (model.kind) {
    case 'tree': {
      const t = (model as TreeModel).tree;
      const cls = model.task === 'classification';
      body = {
        nOutputs: t.nOutputs,
        outputNames: cls ? classNames(model) : [model.target.name],
        outputMeaning: cls ? 'class probability' : 'predicted value',
        base: new Float64Array(t.nOutputs),
        members: [{ tree: t, values: memberValues(t, 1, false), width: t.nOutputs, at: 0 }],
        link: 'identity',
      };
      break;
    }
    case 'bagging': case 'forest': body = forestForm(model as ForestModel); break;
    case 'adaboost': body = adaboostForm(model as AdaBoostModel); break;
    case 'boosting': body = boostingForm(model as BoostingModel); break;
    default: throw errors.notSupported(`explaining a model of kind ${JSON.stringify(model.kind)} by its trees`);
  }
  for (const m of body.members) {
    if (m.at + m.width > body.nOutputs) throw errors.badModel(`a tree has ${m.width} outputs; the model has ${body.nOutputs}`);
    if (m.tree.nNodes === 0 || (m.tree.kind[0] !== LEAF && m.tree.nNodes < 3)) throw errors.badModel('a tree has no nodes or a split without children');
  }
  return { kind: model.kind, task: model.task, features: model.features, ...body };
}
