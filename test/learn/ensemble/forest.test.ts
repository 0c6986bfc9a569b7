import { describe, expect, it } from 'vitest';
import { fitForest, defaultFeaturesPerSplit } from '../../../src/learn/ensemble/forest.js';
import { fitBagging } from '../../../src/learn/ensemble/bagging.js';
import { predictForest } from '../../../src/learn/ensemble/predict-forest.js';
import { growForestMember } from '../../../src/learn/ensemble/forest-member.js';
import { resolveMemberTree } from '../../../src/learn/ensemble/options.js';
import { takeDataset } from '../../../src/table/dataset.js';
import { classTarget, datasetOf, foldsOf, frameOf, friedman1, numberTarget, penguins } from './fixtures.js';

describe('fitForest(data, options)', () => {
  it('defaults featuresPerSplit to ⌊√p⌋ for classes and max(1, ⌊p/3⌋) for numbers (Breiman 2001; common practice)', () => {
    expect(defaultFeaturesPerSplit(6, 'class')).toBe(2);
    expect(defaultFeaturesPerSplit(16, 'class')).toBe(4);
    expect(defaultFeaturesPerSplit(10, 'number')).toBe(3);
    expect(defaultFeaturesPerSplit(2, 'number')).toBe(1);
    const m = fitForest(friedman1(60, 1), { size: 2 });
    expect(m.settings.featuresPerSplit).toBe(3);
  });

  it('Penguins (vega-datasets; Gorman et al. 2014): 5-fold cross-validated accuracy >= 0.95', () => {
    // Species is well separated by beak and flipper measurements; published analyses report near-perfect
    // classification (Horst, Hill & Gorman 2020). 0.95 leaves room for the 2 rows with no measurements.
    const data = penguins();
    if (data.target.kind !== 'class') throw new Error('class target expected');
    const codes = data.target.codes;
    const folds = foldsOf(data.features.nRows, 5, 3);
    let right = 0;
    for (const test of folds) {
      const inTest = new Set(test);
      const train = takeDataset(data, Array.from({ length: data.features.nRows }, (_, i) => i).filter((i) => !inTest.has(i)));
      const model = fitForest(train, { size: 50, seed: 1 });
      const pred = predictForest(model, takeDataset(data, test).features);
      test.forEach((row, j) => { if (pred.value[j] === codes[row]) right++; });
    }
    const acc = right / data.features.nRows;
    console.info(`[forest] penguins 5-fold accuracy = ${acc.toFixed(4)}`);
    expect(acc).toBeGreaterThanOrEqual(0.95);
  });

  it('out-of-bag error is recorded per size and falls as trees are added (Friedman #1)', () => {
    const model = fitForest(friedman1(300, 5), { size: 40, seed: 2 });
    expect(model.oobCurve.map((p) => p.size)).toEqual(Array.from({ length: 40 }, (_, i) => i + 1));
    const first = model.oobCurve[4].error, last = model.oobCurve[39].error;
    expect(last).toBeLessThan(first);
    // irrelevant inputs x6..x10 (Friedman 1991 design) rank below the strong inputs x1, x2, x4. Fully grown
    // trees still split noise near the leaves, so noise gets some gain: each noise input stays under 0.1
    // (bound: common practice, measured ≈ 0.05–0.08 here).
    const imp = new Map(model.importance.map((r) => [r.feature, r.value]));
    const noise = ['x6', 'x7', 'x8', 'x9', 'x10'].map((f) => imp.get(f) ?? 0);
    console.info(`[forest] friedman1 importance ${model.importance.map((r) => `${r.feature}=${r.value.toFixed(3)}`).join(' ')}`);
    for (const v of noise) {
      expect(v).toBeLessThan(0.1);
      for (const f of ['x1', 'x2', 'x4']) expect(v).toBeLessThan(imp.get(f) ?? 0);
    }
    expect(model.importance.reduce((a, r) => a + r.value, 0)).toBeCloseTo(1, 12);
  });

  it('is deterministic under a seed (same model JSON twice) and trees depend only on (seed, t)', () => {
    const data = friedman1(80, 9);
    const a = fitForest(data, { size: 5, seed: 4 }), b = fitForest(data, { size: 5, seed: 4 });
    expect(JSON.stringify(a)).toBe(JSON.stringify(b));
    const plan = { tree: resolveMemberTree({}, { criterion: 'gini', depthLimit: Infinity, leafRows: 5 }), featuresPerSplit: 3 };
    const t = data.target.kind === 'number' ? data.target.values : new Float64Array(0);
    const member = growForestMember({ frame: data.features, response: { kind: 'value', values: t, leaf: 'mean' }, weights: new Float64Array(80).fill(1) }, plan, 4, 3);
    expect(Array.from(member.tree.value)).toEqual(Array.from(a.trees[3].value));
    expect(JSON.stringify(fitForest(data, { size: 5, seed: 5 }))).not.toBe(JSON.stringify(a));
  });

  it("combine: 'vote' gives vote shares as probabilities", () => {
    const data = datasetOf(frameOf({ x: [1, 2, 3, 4, 5, 6, 7, 8] }), classTarget('c', ['a', 'a', 'a', 'a', 'b', 'b', 'b', 'b']));
    const m = fitForest(data, { size: 7, combine: 'vote', seed: 1 });
    const pred = predictForest(m, frameOf({ x: [1, 8] }));
    for (const v of pred.proba) expect(Math.round(v * 7)).toBeCloseTo(v * 7, 9);
    expect(Array.from(pred.value)).toEqual([0, 1]);
  });
});

describe('degenerate inputs: fitForest and fitBagging', () => {
  it('empty table → error', () => {
    const data = datasetOf(frameOf({ x: [] as number[] }), numberTarget('y', []));
    expect(() => fitForest(data)).toThrow(/No rows to fit a random forest/);
    expect(() => fitBagging(data)).toThrow(/No rows/);
  });
  it('one row → every tree is a single leaf predicting it', () => {
    const m = fitForest(datasetOf(frameOf({ x: [3] }), numberTarget('y', [7])), { size: 3 });
    expect(Array.from(predictForest(m, frameOf({ x: [0, 9] })).value)).toEqual([7, 7]);
  });
  it('one class present (of two labels) → predicts it with probability 1; one label only → error', () => {
    const f = frameOf({ x: [1, 2, 3] });
    const m = fitBagging(datasetOf(f, classTarget('c', ['a', 'a', 'a'], ['a', 'b'])), { size: 3 });
    expect(Array.from(predictForest(m, f).proba)).toEqual([1, 0, 1, 0, 1, 0]);
    expect(() => fitBagging(datasetOf(f, classTarget('c', ['a', 'a', 'a'])))).toThrow(/one class/);
  });
  it('constant target → constant prediction; all-missing feature and NaN values are routed, not fatal', () => {
    const f = frameOf({ x: [1, null, 3, 4], z: [null, null, null, null] });
    const m = fitForest(datasetOf(f, numberTarget('y', [2, 2, 2, 2])), { size: 4 });
    expect(Array.from(predictForest(m, f).value)).toEqual([2, 2, 2, 2]);
    const m2 = fitForest(datasetOf(f, numberTarget('y', [1, 5, null, 8])), { size: 4, leafRows: 1 });
    expect(predictForest(m2, f).value.every(Number.isFinite)).toBe(true);
  });
  it('bad options are named', () => {
    const d = friedman1(10, 1);
    expect(() => fitForest(d, { size: 0 })).toThrow(/Option size = 0/);
    expect(() => fitForest(d, { featuresPerSplit: 1.5 })).toThrow(/featuresPerSplit/);
    expect(() => fitForest(d, { treez: 3 } as never)).toThrow(/Unknown option "treez"/);
  });
});
