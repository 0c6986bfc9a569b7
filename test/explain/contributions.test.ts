/**
 * contributionsOf: expected value + Σ contributions = the model's raw output for every row (the local
 * accuracy property, Lundberg, Erion & Lee 2018, arXiv:1802.03888, §2, Property 1), checked against each
 * learner's own prediction code (`rawOutputsOf`), for every model kind.
 */
import { describe, expect, it } from 'vitest';
import { contributionsOf, type Contributions } from '../../src/explain/contributions.js';
import { rawOutputsOf } from '../../src/explain/predict-model.js';
import { fitAdaBoost } from '../../src/learn/ensemble/adaboost.js';
import { fitBagging } from '../../src/learn/ensemble/bagging.js';
import { fitBoosting } from '../../src/learn/ensemble/boosting.js';
import { fitForest } from '../../src/learn/ensemble/forest.js';
import type { ModelHeader } from '../../src/learn/model.js';
import { fitTree } from '../../src/learn/tree/fit-tree.js';
import type { Frame } from '../../src/table/frame.js';
import { friedman1, orchard } from './fixtures.js';

/** Local accuracy tolerance asked for by the task: 1e-9 absolute. */
const TOL = 1e-9;

/** Largest |expected + Σφ − raw| over rows and outputs, with raw from the learner's own predictor. */
function additivityGap(model: ModelHeader, frame: Frame): { gap: number; c: Contributions } {
  const c = contributionsOf(model, frame);
  const raw = rawOutputsOf(model, frame);
  const K = c.outputNames.length, p = c.features.length;
  let gap = 0;
  for (let i = 0; i < frame.nRows; i++) {
    for (let k = 0; k < K; k++) {
      let s = c.expected[k];
      for (let j = 0; j < p; j++) s += c.values[k][i * p + j];
      gap = Math.max(gap, Math.abs(s - raw[i * K + k]), Math.abs(c.outputs[k][i] - raw[i * K + k]));
    }
  }
  return { gap, c };
}

const cls = orchard(300, 3, 'class');
const bin = orchard(300, 4, 'binary');
const num = orchard(300, 5, 'number');
const fr = friedman1(300, 9);

describe('contributionsOf(model, frame): expected + Σ contributions = raw output within 1e-9 for every row', () => {
  const cases: [string, () => ModelHeader, Frame][] = [
    ['tree, 3 classes, multiway', () => fitTree(cls, { depthLimit: 6 }), cls.features],
    ['tree, regression, subset splits', () => fitTree(num, { depthLimit: 8, categorical: 'subset' }), num.features],
    ['forest, regression (Friedman #1)', () => fitForest(fr, { size: 20, depthLimit: 8, seed: 1 }), fr.features],
    ['forest, 3 classes, average', () => fitForest(cls, { size: 15, depthLimit: 7, seed: 2 }), cls.features],
    ['forest, 3 classes, vote', () => fitForest(cls, { size: 15, depthLimit: 7, seed: 2, combine: 'vote' }), cls.features],
    ['bagging, regression', () => fitBagging(num, { size: 10, depthLimit: 6, seed: 3 }), num.features],
    ['boosting, squared (Friedman #1)', () => fitBoosting(fr, { rounds: 40, learningRate: 0.1, depthLimit: 3, seed: 4 }), fr.features],
    ['boosting, logistic margin', () => fitBoosting(bin, { rounds: 30, depthLimit: 3, seed: 5 }), bin.features],
    ['boosting, multiclass scores', () => fitBoosting(cls, { rounds: 20, depthLimit: 3, seed: 6 }), cls.features],
    ['boosting, poisson log-mean', () => fitBoosting(num, { loss: 'poisson', rounds: 20, depthLimit: 3, seed: 7 }), num.features],
    ['adaboost, weighted vote shares', () => fitAdaBoost(cls, { rounds: 15, depthLimit: 2 }), cls.features],
  ];
  for (const [name, fit, frame] of cases) {
    it(name, () => {
      const { gap, c } = additivityGap(fit(), frame);
      expect(gap).toBeLessThan(TOL);
      // not vacuous: some contribution is sizeable
      expect(Math.max(...c.values.map((v) => Math.max(...Array.from(v, Math.abs))))).toBeGreaterThan(1e-3);
    });
  }

  it('a constant target gives a single leaf: contributions 0 and expected = that value', () => {
    const flat = { ...num, target: { kind: 'number' as const, name: 'shelf_days', values: new Float64Array(num.features.nRows).fill(7) } };
    const c = contributionsOf(fitTree(flat), num.features, { rows: [0, 1] });
    expect(c.expected[0]).toBe(7);
    expect(Array.from(c.values[0]).every((v) => v === 0)).toBe(true);
  });

  it('a category unseen in training is explained like a missing one (both follow the missing-value child)', () => {
    const model = fitForest(cls, { size: 5, seed: 8, depthLimit: 5 });
    const f = cls.features;
    const v = f.columns[1] as { codes: Int32Array; categories: readonly string[] };
    const codes = Int32Array.from([v.categories.length, -1]); // 'Gala' (appended), then missing
    const two = {
      nRows: 2,
      columns: f.columns.map((c, j) => (j === 1 ? { ...v, name: 'variety', kind: 'categorical' as const, codes, categories: [...v.categories, 'Gala'] }
        : c.kind === 'categorical' ? { ...c, codes: Int32Array.from([c.codes[0], c.codes[0]]) } : { ...c, values: Float64Array.from([c.values[0], c.values[0]]) })),
      schema: f.schema,
    };
    const c = contributionsOf(model, two);
    for (let k = 0; k < 3; k++) expect(Array.from(c.values[k].slice(0, 4))).toEqual(Array.from(c.values[k].slice(4, 8)));
  });

  it('explains only the rows asked for, in order', () => {
    const model = fitTree(num, { depthLimit: 3 });
    const all = contributionsOf(model, num.features);
    const some = contributionsOf(model, num.features, { rows: [5, 2] });
    expect(Array.from(some.values[0].slice(0, 4))).toEqual(Array.from(all.values[0].slice(20, 24)));
    expect(Array.from(some.values[0].slice(4, 8))).toEqual(Array.from(all.values[0].slice(8, 12)));
  });

  it('rejects a row number outside the frame and a frame that does not match the model', () => {
    const model = fitTree(num, { depthLimit: 3 });
    expect(() => contributionsOf(model, num.features, { rows: [300] })).toThrow(/rows/);
    expect(() => contributionsOf(model, fr.features)).toThrow(/does not match the model/);
  });

  it('an empty frame gives empty contributions', () => {
    const model = fitTree(num, { depthLimit: 3 });
    const c = contributionsOf(model, num.features, { rows: [] });
    expect(c.values[0].length).toBe(0);
  });
});
