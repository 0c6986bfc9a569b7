import { describe, expect, it } from 'vitest';
import { fitStack } from '../../../src/learn/ensemble/stacking.js';
import { fitForest } from '../../../src/learn/ensemble/forest.js';
import { fitBoosting } from '../../../src/learn/ensemble/boosting.js';
import { assignFolds } from '../../../src/learn/ensemble/folds.js';
import { fitTree } from '../../../src/learn/tree/fit-tree.js';
import { predictFrame } from '../../../src/learn/predict.js';
import { takeDataset } from '../../../src/table/dataset.js';
import { createRng } from '../../../src/util/rng.js';
import { classTarget, datasetOf, frameOf, friedman1, numberTarget, penguins } from './fixtures.js';

const accuracy = (pred: Float64Array, codes: Int32Array) => pred.reduce((a, v, i) => a + (v === codes[i] ? 1 : 0), 0) / codes.length;

describe('fitStack(data, learners, options)', () => {
  it('Penguins (vega-datasets; Gorman et al. 2014), holdout: the stack beats or matches its weakest member', () => {
    // Wolpert 1992 / Breiman 1996: the combiner learns from out-of-fold predictions, so it should not do
    // worse than the worst member it can put zero weight on.
    const data = penguins();
    const n = data.features.nRows, idx = Array.from({ length: n }, (_, i) => i);
    const train = takeDataset(data, idx.filter((i) => i % 3 !== 0)), test = takeDataset(data, idx.filter((i) => i % 3 === 0));
    if (test.target.kind !== 'class') throw new Error('class target expected');
    const codes = test.target.codes;
    const learners = [
      { name: 'stump', fit: (d: typeof data) => fitTree(d, { depthLimit: 1 }) },
      { name: 'forest', fit: (d: typeof data) => fitForest(d, { size: 30, seed: 1 }) },
      { name: 'boosted', fit: (d: typeof data) => fitBoosting(d, { rounds: 20, depthLimit: 2, learningRate: 0.3 }) },
    ];
    const stack = fitStack(train, learners, { folds: 5, seed: 2 });
    const accs = learners.map((l) => accuracy(predictFrame(l.fit(train), test.features).value, codes));
    const accStack = accuracy(predictFrame(stack, test.features).value, codes);
    console.info(`[stack] penguins holdout accuracy: members ${accs.map((a) => a.toFixed(4)).join(', ')}; stack ${accStack.toFixed(4)}`);
    expect(accStack).toBeGreaterThanOrEqual(Math.min(...accs));
    expect(stack.memberScores.map((s) => s.name)).toEqual(['stump', 'forest', 'boosted']);
    expect(stack.memberScores[0].score).toBeLessThan(stack.memberScores[1].score); // the stump is the weak one
  }, 60_000);

  it('Friedman #1 regression with a pass-through feature: stack MSE <= weakest member MSE', () => {
    const train = friedman1(300, 21), test = friedman1(1000, 22);
    const yt = test.target.kind === 'number' ? test.target.values : new Float64Array(0);
    const mse = (p: Float64Array) => p.reduce((a, v, i) => a + (v - yt[i]) ** 2, 0) / yt.length;
    const learners = [
      { name: 'shallow', fit: (d: typeof train) => fitTree(d, { depthLimit: 2 }) },
      { name: 'boosted', fit: (d: typeof train) => fitBoosting(d, { rounds: 60, depthLimit: 2, learningRate: 0.2 }) },
    ];
    const stack = fitStack(train, learners, { passThrough: ['x4'] });
    const errs = learners.map((l) => mse(predictFrame(l.fit(train), test.features).value));
    const errStack = mse(predictFrame(stack, test.features).value);
    console.info(`[stack] friedman1 test MSE: members ${errs.map((e) => e.toFixed(3)).join(', ')}; stack ${errStack.toFixed(3)}`);
    expect(errStack).toBeLessThanOrEqual(Math.max(...errs));
  }, 60_000);

  it('is deterministic under a seed', () => {
    const d = friedman1(60, 4);
    const learners = [{ name: 't', fit: (x: typeof d) => fitTree(x, { depthLimit: 2 }) }];
    expect(JSON.stringify(fitStack(d, learners, { seed: 3 }))).toBe(JSON.stringify(fitStack(d, learners, { seed: 3 })));
  });
});

describe('assignFolds(n, k, rng, codes)', () => {
  it('stratifies: each fold keeps the class mix', () => {
    const codes = Int32Array.from({ length: 30 }, (_, i) => (i < 20 ? 0 : 1));
    const fold = assignFolds(30, 5, createRng(1), codes);
    for (let f = 0; f < 5; f++) {
      const rows = [...fold.keys()].filter((i) => fold[i] === f);
      expect(rows.length).toBe(6);
      expect(rows.filter((i) => codes[i] === 1).length).toBe(2);
    }
  });
});

describe('degenerate inputs: fitStack', () => {
  const learners = [{ name: 't', fit: (x: ReturnType<typeof friedman1>) => fitTree(x, { depthLimit: 1 }) }];
  it('empty → error; fewer rows than folds → error; no learners or duplicate names → error', () => {
    expect(() => fitStack(datasetOf(frameOf({ x: [] as number[] }), numberTarget('y', [])), learners)).toThrow(/No rows/);
    expect(() => fitStack(datasetOf(frameOf({ x: [1, 2] }), numberTarget('y', [1, 2])), learners)).toThrow(/folds/);
    expect(() => fitStack(friedman1(20, 1), [])).toThrow(/learners/);
    expect(() => fitStack(friedman1(20, 1), [...learners, ...learners])).toThrow(/distinct names/);
  });
  it('constant target → constant predictions; categorical pass-through → error', () => {
    const f = frameOf({ x: [1, 2, 3, 4, 5, 6], c: ['a', 'b', 'a', 'b', 'a', 'b'] });
    const s = fitStack(datasetOf(f, numberTarget('y', [3, 3, 3, 3, 3, 3])), learners, { folds: 3 });
    expect(Array.from(predictFrame(s, f).value)).toEqual([3, 3, 3, 3, 3, 3].map((v) => expect.closeTo(v, 9)));
    expect(() => fitStack(datasetOf(f, numberTarget('y', [1, 2, 3, 4, 5, 6])), learners, { folds: 3, passThrough: ['c'] })).toThrow(/passThrough/);
  });
  it('one class present of two labels → predicts it', () => {
    const f = frameOf({ x: [1, 2, 3, 4] });
    const s = fitStack(datasetOf(f, classTarget('y', ['b', 'b', 'b', 'b'], ['a', 'b'])), [{ name: 't', fit: (x) => fitTree(x, {}) }], { folds: 2 });
    expect(Array.from(predictFrame(s, f).value)).toEqual([1, 1, 1, 1]);
  });
});
