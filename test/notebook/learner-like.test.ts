/**
 * learnerLike / stackLearners / fitStackWith: refitting a fitted model's learner. The check is
 * self-consistency — the learner refitted on the model's own training rows reproduces the model
 * (same settings, same seed, same trees) — on the Palmer penguins data (vega-datasets penguins.json;
 * Gorman, Williams & Fraser 2014).
 */
import { describe, expect, it } from 'vitest';
import { learnerLike } from '../../src/notebook/learner-like.js';
import { fitStackWith, stackLearners } from '../../src/notebook/stack-members.js';
import { fitPrunedTree } from '../../src/notebook/fit-pruned-tree.js';
import { fitTree } from '../../src/learn/tree/fit-tree.js';
import { fitForest } from '../../src/learn/ensemble/forest.js';
import { fitBagging } from '../../src/learn/ensemble/bagging.js';
import { fitAdaBoost } from '../../src/learn/ensemble/adaboost.js';
import { fitBoosting } from '../../src/learn/ensemble/boosting.js';
import { predictFrame } from '../../src/learn/predict.js';
import { takeDataset } from '../../src/table/dataset.js';
import type { ModelHeader } from '../../src/learn/model.js';
import type { BoostingModel } from '../../src/learn/ensemble/models.js';
import { penguinsData } from '../learn/tree/open-data.js';

const data = penguinsData();
const train = takeDataset(data, Array.from({ length: data.features.nRows }, (_, i) => i).filter((i) => i % 3 !== 0));
const held = takeDataset(data, Array.from({ length: data.features.nRows }, (_, i) => i).filter((i) => i % 3 === 0));

function same(a: ModelHeader, b: ModelHeader): void {
  expect(b.kind).toBe(a.kind);
  expect(b.settings).toEqual(a.settings);
  expect(b.seed).toBe(a.seed);
  expect(Array.from(predictFrame(b, held.features).proba)).toEqual(Array.from(predictFrame(a, held.features).proba));
}

describe('learnerLike(model, name)', () => {
  it('refits a tree, forest, bagging, AdaBoost and boosting model identically', () => {
    const models: ModelHeader[] = [
      fitTree(train, { depthLimit: 3, criterion: 'gini', seed: 2 }),
      fitForest(train, { size: 5, seed: 9, featuresPerSplit: 2, classWeights: { Adelie: 2, Chinstrap: 1, Gentoo: 1 } }),
      fitBagging(train, { size: 4, seed: 3, combine: 'vote' }),
      fitAdaBoost(train, { rounds: 5, sampling: 'resample', seed: 4, watch: held }),
      fitBoosting(train, { rounds: 6, learningRate: 0.2, rowFraction: 0.7, seed: 5 }),
    ];
    for (const m of models) same(m, learnerLike(m, m.kind).fit(train));
  });

  it('refits a boosting model stopped early with the rounds it kept', () => {
    const m = fitBoosting(train, { rounds: 60, learningRate: 0.9, watch: held, patience: 2 });
    expect(m.roundsKept).toBeLessThan(60); // stopped early: the check below is not a plain refit
    const again = learnerLike(m, 'early').fit(train) as BoostingModel;
    expect(again.trees.length).toBe(m.trees.length);
    expect(again.settings).toMatchObject({ rounds: m.roundsKept });
    expect(Array.from(predictFrame(again, held.features).proba)).toEqual(Array.from(predictFrame(m, held.features).proba));
  });

  it('repeats cross-validated cost-complexity pruning, and refuses pruning on held-out rows', () => {
    const cv = fitPrunedTree(train, { prune: 'cost-complexity', pruneFolds: 4 });
    same(cv, learnerLike(cv, 'cv').fit(train));
    const re = fitPrunedTree(train, { prune: 'reduced-error', pruneOn: held });
    expect(() => learnerLike(re, 're')).toThrow('Refitting tree "re" inside a stack\'s folds: it was pruned on held-out rows');
  });

  it('refuses a stack as a member', () => {
    const stack = fitStackWith(train, { members: { t: fitTree(train, { depthLimit: 1 }) }, folds: 2 });
    expect(() => learnerLike(stack, 's')).toThrow('A stack ("s") as a member of a stack is not supported.');
  });
});

describe('stackLearners(members)', () => {
  it('reads models, learners and lists of learners, in order', () => {
    const t = fitTree(train, { depthLimit: 1 });
    const stump = { name: 'stump', fit: (d: typeof train) => fitTree(d, { depthLimit: 1 }) };
    expect(stackLearners({ t, stump, more: [stump] }).map((l) => l.name)).toEqual(['t', 'stump', 'stump']);
    expect(stackLearners([stump]).map((l) => l.name)).toEqual(['stump']);
  });

  it('names a member that is neither', () => {
    expect(() => stackLearners({ x: 3 as never })).toThrow('Option members.x = 3 is invalid: expected a fitted model or a learner { name, fit }.');
  });
});

describe('fitStackWith(data, options)', () => {
  it('equals fitStack with the same learners', () => {
    const t = fitTree(train, { depthLimit: 2 });
    const f = fitForest(train, { size: 3, seed: 1 });
    const s = fitStackWith(train, { members: { t, f }, folds: 3, seed: 7 });
    expect(s.members.map((m) => m.name)).toEqual(['t', 'f']);
    same(s.members[0].model, t);
    same(s.members[1].model, f);
  });

  it('needs members', () => {
    expect(() => fitStackWith(train, { folds: 3 })).toThrow('Option members = undefined is invalid: expected fitted models or learners to stack.');
  });
});
