import { describe, expect, it } from 'vitest';
import { bagLearner } from '../../../src/learn/ensemble/bag-learner.js';
import { fitBagging } from '../../../src/learn/ensemble/bagging.js';
import { predictForest } from '../../../src/learn/ensemble/predict-forest.js';
import { fitTree } from '../../../src/learn/tree/fit-tree.js';
import { predictFrame } from '../../../src/learn/predict.js';
import type { TreeModel } from '../../../src/learn/tree-model.js';
import { datasetOf, frameOf, friedman1, numberTarget } from './fixtures.js';

const treeLearner = { fit: (d: Parameters<typeof fitTree>[0]) => fitTree(d, { depthLimit: 4 }), predict: (m: TreeModel, f: Parameters<typeof predictFrame>[1]) => predictFrame(m, f) };

describe('bagLearner(data, learner, options)', () => {
  it('bagging reduces the test error of an unstable learner (Breiman 1996, "Bagging predictors": bagging lowers the error of regression trees on Friedman #1; from memory)', () => {
    const train = friedman1(300, 31), test = friedman1(2000, 32);
    const yt = test.target.kind === 'number' ? test.target.values : new Float64Array(0);
    const mse = (p: Float64Array) => p.reduce((a, v, i) => a + (v - yt[i]) ** 2, 0) / yt.length;
    const single = mse(treeLearner.predict(treeLearner.fit(train), test.features).value);
    const bag = bagLearner(train, treeLearner, { size: 25, seed: 3 });
    const bagged = mse(bag.predict(test.features).value);
    console.info(`[bag] friedman1 test MSE: one depth-4 tree ${single.toFixed(3)}, 25 bagged ${bagged.toFixed(3)}`);
    expect(bagged).toBeLessThan(single);
    expect(bag.members.length).toBe(25);
    expect(bag.oobCurve.length).toBe(25);
    expect(bag.oobCurve[24].error).toBeLessThan(bag.oobCurve[0].error);
  });

  it('members see bootstrap counts as weights: the same trees as native tree bagging on the same seed', () => {
    // native bagging grows on all rows with weight = count; the generic form fits on the in-bag rows with
    // weight = count. With one feature the exact grower then picks the same splits (common practice check).
    const d = datasetOf(frameOf({ x: [1, 2, 3, 4, 5, 6, 7, 8] }), numberTarget('y', [1, 1, 2, 3, 5, 8, 13, 21]));
    const generic = bagLearner(d, { fit: (x) => fitTree(x, { leafRows: 1 }), predict: (m: TreeModel, f) => predictFrame(m, f) }, { size: 5, seed: 9 });
    const native = fitBagging(d, { size: 5, seed: 9, engine: 'exact', categorical: 'multiway' });
    const f = frameOf({ x: [0, 1.5, 3.5, 5.5, 7.5, 9] });
    const a = generic.predict(f).value, b = predictForest(native, f).value;
    for (let i = 0; i < a.length; i++) expect(a[i]).toBeCloseTo(b[i], 9);
  });

  it('empty data → error; bad size → error', () => {
    expect(() => bagLearner(datasetOf(frameOf({ x: [] as number[] }), numberTarget('y', [])), treeLearner)).toThrow(/No rows/);
    expect(() => bagLearner(friedman1(10, 1), treeLearner, { size: 0 })).toThrow(/size/);
  });
});
