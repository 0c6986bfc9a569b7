/**
 * importanceByPermutation. Known truth: in Friedman #1 (Friedman 1991, Annals of Statistics 19(1)) only
 * x1..x5 enter y; x6..x10 are irrelevant, so shuffling them cannot hurt a model beyond noise (the ranking
 * check asked for by the task).
 */
import { describe, expect, it } from 'vitest';
import { importanceByPermutation } from '../../src/explain/permutation-importance.js';
import { studentQuantile } from '../../src/explain/student-t.js';
import { splitHoldout } from '../../src/assess/splits/holdout.js';
import { fitBoosting } from '../../src/learn/ensemble/boosting.js';
import { fitForest } from '../../src/learn/ensemble/forest.js';
import { fitTree } from '../../src/learn/tree/fit-tree.js';
import { takeDataset } from '../../src/table/dataset.js';
import { friedman1, orchard } from './fixtures.js';

describe('importanceByPermutation(model, data) on Friedman #1 (n = 2,000, seeded)', () => {
  const data = friedman1(2000, 77);
  const [fold] = splitHoldout(data.features.nRows, { testFraction: 0.3, seed: 1 });
  const model = fitBoosting(takeDataset(data, fold.train), { rounds: 200, learningRate: 0.1, depthLimit: 3, seed: 1 });

  it('ranks every one of x6..x10 below every one of x1..x5 (rmse on the held-out rows)', () => {
    const imp = importanceByPermutation(model, data, { rows: fold.test, repeats: 5, seed: 3 });
    console.log(imp.rows.map((r) => `${r.feature} ${r.value.toFixed(3)} [${r.low.toFixed(3)}, ${r.high.toFixed(3)}]`).join('; '));
    expect(imp.metric).toBe('rmse');
    const rank = imp.rows.map((r) => r.feature);
    const worstRelevant = Math.max(...['x1', 'x2', 'x3', 'x4', 'x5'].map((f) => rank.indexOf(f)));
    const bestIrrelevant = Math.min(...['x6', 'x7', 'x8', 'x9', 'x10'].map((f) => rank.indexOf(f)));
    expect(worstRelevant).toBeLessThan(bestIrrelevant);
    // near zero: |value| < 0.1 against x1..x5 above 1 (bound: common practice)
    for (const r of imp.rows) if (['x6', 'x7', 'x8', 'x9', 'x10'].includes(r.feature)) expect(Math.abs(r.value)).toBeLessThan(0.1);
  });

  it('the student interval is mean ± t(r−1, 0.975)·sd/√r', () => {
    const imp = importanceByPermutation(model, data, { rows: fold.test, repeats: 4, features: ['x1'] });
    const r = imp.rows[0];
    const half = (studentQuantile(0.95, 3) * r.sd) / 2;
    expect(r.high - r.value).toBeCloseTo(half, 12);
    expect(r.value - r.low).toBeCloseTo(half, 12);
    expect(r.sd).toBeGreaterThan(0);
  });
});

describe('importanceByPermutation(model, data): definition, options, bad input', () => {
  const data = orchard(240, 12, 'class');
  const model = fitForest(data, { size: 10, seed: 4, depthLimit: 6 });

  it('same seed, same result; a feature the model never splits on gets exactly 0', () => {
    const tree = fitTree(data, { depthLimit: 1 }); // one split: every other feature is unused
    const a = importanceByPermutation(tree, data, { repeats: 3, seed: 9, metric: 'logLoss' });
    const b = importanceByPermutation(tree, data, { repeats: 3, seed: 9, metric: 'logLoss' });
    expect(a).toEqual(b);
    const used = tree.features[tree.tree.feature[0]].name;
    for (const r of a.rows) if (r.feature !== used) { expect(r.value).toBe(0); expect(r.low).toBe(0); expect(r.high).toBe(0); }
    expect(a.rows[0].feature).toBe(used);
  });

  it('groups shuffle features together; percentile intervals bracket the repeats', () => {
    const imp = importanceByPermutation(model, data, { groups: { storage: ['storage_hours', 'humidity'], fruit: ['variety', 'bruised'] }, repeats: 6, interval: 'percentile' });
    expect(imp.rows.map((r) => r.feature).sort()).toEqual(['fruit', 'storage']);
    for (const r of imp.rows) expect(r.low).toBeLessThanOrEqual(r.high);
    expect(imp.interval).toMatch(/percentile/);
  });

  it('one repeat: the interval collapses to the value', () => {
    const imp = importanceByPermutation(model, data, { repeats: 1, features: ['storage_hours'] });
    expect(imp.rows[0].low).toBe(imp.rows[0].value);
  });

  it('leaves out rows with a missing target', () => {
    const codes = Int32Array.from((data.target as { codes: Int32Array }).codes);
    codes[0] = -1;
    const d2 = { ...data, target: { ...data.target, codes } } as typeof data;
    const imp = importanceByPermutation(model, d2, { repeats: 1, features: ['variety'] });
    expect(Number.isFinite(imp.baseline)).toBe(true);
  });

  it('bad input: unknown metric or one for the other task, bad repeats, unknown feature, empty rows', () => {
    expect(() => importanceByPermutation(model, data, { metric: 'rmse' })).toThrow(/does not apply/);
    expect(() => importanceByPermutation(model, data, { metric: 'nope' })).toThrow(/Unknown metric/);
    expect(() => importanceByPermutation(model, data, { repeats: 0 })).toThrow(/repeats/);
    expect(() => importanceByPermutation(model, data, { features: ['colour'] })).toThrow(/Unknown column/);
    expect(() => importanceByPermutation(model, data, { rows: [] })).toThrow(/empty/);
  });
});
