import { describe, expect, it } from 'vitest';
import { modelFromJSON, modelToJSON } from '../../../src/learn/model-file.js';
import { predictFrame } from '../../../src/learn/predict.js';
import { fitForest } from '../../../src/learn/ensemble/forest.js';
import { fitBagging } from '../../../src/learn/ensemble/bagging.js';
import { fitAdaBoost } from '../../../src/learn/ensemble/adaboost.js';
import { fitBoosting } from '../../../src/learn/ensemble/boosting.js';
import { fitStack } from '../../../src/learn/ensemble/stacking.js';
import { fitTree } from '../../../src/learn/tree/fit-tree.js';
import type { ModelHeader } from '../../../src/learn/model.js';
import { takeDataset } from '../../../src/table/dataset.js';
import { friedman1, penguins } from './fixtures.js';

const roundTrip = (m: ModelHeader) => modelFromJSON(JSON.parse(JSON.stringify(modelToJSON(m, { created: '2020-01-01T00:00:00.000Z' }))));

describe('model file codecs (bagging, forest, adaboost, boosting, stack)', () => {
  const peng = penguins();
  const small = takeDataset(peng, Array.from({ length: 120 }, (_, i) => i * 2 + 1));
  const fried = friedman1(120, 3);
  const cases: [string, () => ModelHeader, typeof peng][] = [
    ['forest', () => fitForest(small, { size: 5, seed: 1 }), small],
    ['bagging', () => fitBagging(fried, { size: 4, seed: 2 }), fried],
    ['adaboost', () => fitAdaBoost(small, { rounds: 5, depthLimit: 2 }), small],
    ['boosting multiclass', () => fitBoosting(small, { rounds: 4 }), small],
    ['boosting huber with watched set', () => fitBoosting(fried, { rounds: 6, loss: 'huber', watch: friedman1(40, 4), patience: 3 }), fried],
    ['stack', () => fitStack(small, [{ name: 'tree', fit: (d) => fitTree(d, { depthLimit: 2 }) }, { name: 'forest', fit: (d) => fitForest(d, { size: 3 }) }], { folds: 3 }), small],
  ];
  for (const [name, fit, data] of cases) {
    it(`${name}: JSON round trip gives identical predictions and the same JSON`, () => {
      const m = fit();
      const back = roundTrip(m);
      expect(back.kind).toBe(m.kind);
      const a = predictFrame(m, data.features), b = predictFrame(back, data.features);
      expect(Array.from(b.value)).toEqual(Array.from(a.value));
      expect(Array.from(b.proba)).toEqual(Array.from(a.proba));
      expect(JSON.stringify(modelToJSON(back, { created: 'x' }))).toBe(JSON.stringify(modelToJSON(m, { created: 'x' })));
    });
  }

  it('rejects a corrupted body, naming the field', () => {
    const json = modelToJSON(fitBoosting(fried, { rounds: 2 }), { created: 'x' }) as { body: { roundsKept: number; loss: string } };
    expect(() => modelFromJSON({ ...json, body: { ...json.body, roundsKept: 5 } })).toThrow(/body.trees should hold 5 trees/);
    expect(() => modelFromJSON({ ...json, body: { ...json.body, loss: 'hinge' } })).toThrow(/body.loss/);
    const f = modelToJSON(fitForest(fried, { size: 2 }), { created: 'x' }) as { body: { combine: string } };
    expect(() => modelFromJSON({ ...f, body: { ...f.body, combine: 'median' } })).toThrow(/body.combine/);
  });
});
