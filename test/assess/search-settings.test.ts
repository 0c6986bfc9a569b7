import { describe, expect, it } from 'vitest';
import { intRange, logRange } from '../../src/assess/setting-ranges.js';
import { searchGrid, searchRandom } from '../../src/assess/search-settings.js';
import { splitFolds } from '../../src/assess/splits/k-fold.js';
import { fitTree } from '../../src/learn/tree/fit-tree.js';
import { expectClose } from './close.js';
import { fitMean, friedman1, predictMean, regressionData } from './fixtures.js';

const y = [10, 12, 9, 11, 10, 13, 8, 11, 10, 12];
const data = regressionData({ x: y.map((_, i) => i) }, y);
const split = splitFolds(10, { k: 5, seed: 3 });

describe('searchGrid(data, fit, space, options)', () => {
  const fit = (train: typeof data, s: Record<string, unknown>) => fitMean(train, s.scale as number);

  it('one row per setting × fold with the setting as columns; picks the best mean (hand check)', () => {
    const r = searchGrid(data, fit, { scale: [0.5, 1, 1.5], tag: ['a'] }, { split, predict: predictMean, metric: 'rmse' });
    expect(r.table).toHaveLength(15);
    expect(Object.keys(r.table[0]).sort()).toEqual(['fitMs', 'fold', 'scale', 'score', 'setting', 'tag']);
    // recompute each setting's mean from the table and choose the smallest rmse independently
    const means = [0, 1, 2].map((s) => r.table.filter((t) => t.setting === s).reduce((a, t) => a + t.score, 0) / 5);
    const bestIndex = means.indexOf(Math.min(...means));
    expect(r.best.setting).toBe(bestIndex);
    expect(r.best.values).toEqual({ scale: 1, tag: 'a' });
    expectClose(r.best.mean, means[bestIndex]);
    expect(r.summary.map((s) => s.rank)).toEqual([2, 1, 3].map((_, i) => [...means].sort((a, b) => a - b).indexOf(means[i]) + 1));
    expect(r.higherIsBetter).toBe(false);
  });

  it('higher-is-better metrics choose the largest mean', () => {
    const r = searchGrid(data, fit, { scale: [0.5, 1, 2] }, { split: splitFolds(10, { k: 2, seed: 1 }), predict: predictMean, metric: 'rSquared' });
    expect(r.best.values.scale).toBe(1);
    expect(r.higherIsBetter).toBe(true);
  });

  it('intRange expands to every integer; progress counts every fit', () => {
    const calls: [number, number][] = [];
    const r = searchGrid(data, (t, s) => fitMean(t, (s.k as number) / 4), { k: intRange(2, 6) },
      { split, predict: predictMean, onProgress: (done, total) => calls.push([done, total]) });
    expect(r.summary.map((s) => s.k)).toEqual([2, 3, 4, 5, 6]);
    expect(calls).toHaveLength(25);
    expect(calls[24]).toEqual([25, 25]);
    expect(r.best.values.k).toBe(4);
  });

  it('one-standard-error choice: the least complex setting within one se of the best', () => {
    const r = searchGrid(data, fit, { scale: [0.9, 0.95, 1, 1.05] }, { split, predict: predictMean, complexity: (s) => s.scale as number });
    const best = r.summary.find((s) => s.setting === r.best.setting);
    if (!best) throw new Error('best setting missing from summary');
    const near = r.summary.filter((s) => s.mean <= best.mean + best.se);
    const simplest = near.reduce((a, b) => ((a.scale as number) <= (b.scale as number) ? a : b));
    expect(r.withinOneSe?.setting).toBe(simplest.setting);
    expect(r.withinOneSe?.values.scale).toBeLessThanOrEqual(best.scale as number);
    expect(searchGrid(data, fit, { scale: [1] }, { split, predict: predictMean }).withinOneSe).toBeNull();
  });

  it('one-standard-error choice by hand (the setting is the constant prediction c)', () => {
    // fold 0 tests y = (0, 0), fold 1 tests y = (0, 4); rmse fold 0 = c, fold 1 = sqrt((c² + (c − 4)²) / 2)
    // c = 0: scores 0 and sqrt 8 → mean 1.4142, sd 2, se sqrt 2 (best)
    // c = 1: 1 and sqrt 5 → mean 1.618;  c = 2: 2 and 2 → mean 2, inside best + se = 2.828
    const d = regressionData({ x: [0, 1, 2, 3] }, [0, 0, 0, 4]);
    const folds = [
      { fold: 0, train: Int32Array.of(2, 3), test: Int32Array.of(0, 1) },
      { fold: 1, train: Int32Array.of(0, 1), test: Int32Array.of(2, 3) },
    ];
    const r = searchGrid(d, (_t, s) => ({ mean: s.c as number }), { c: [0, 1, 2] },
      { split: folds, predict: predictMean, complexity: (s) => 2 - (s.c as number) });
    expect(r.best.values.c).toBe(0);
    expectClose(r.best.mean, Math.SQRT2);
    expectClose(r.best.se, Math.SQRT2);
    expect(r.withinOneSe?.values.c).toBe(2);
    expectClose(r.withinOneSe?.mean ?? NaN, 2);
  });

  it('with the tree learner on Friedman #1 (Friedman 1991), a deeper tree beats a stump', () => {
    const d = friedman1(300, 4);
    const r = searchGrid(d, (t, s) => fitTree(t, { depthLimit: s.depth as number, leafRows: 5 }), { depth: [1, 6] }, { seed: 2, metric: 'rmse' });
    expect(r.best.values.depth).toBe(6);
    // noise variance 1, so no model's rmse can go far below 1 (CHECKS.md, Friedman #1)
    expect(r.best.mean).toBeGreaterThan(0.9);
  });

  it('rejects log ranges in a grid, empty lists, reserved names and an empty space', () => {
    expect(() => searchGrid(data, fit, { rate: logRange(0.01, 1) }, { predict: predictMean })).toThrow(/log ranges are for searchRandom/);
    expect(() => searchGrid(data, fit, { scale: [] }, { predict: predictMean })).toThrow(/at least one value/);
    expect(() => searchGrid(data, fit, { score: [1] }, { predict: predictMean })).toThrow(/setting name other than/);
    expect(() => searchGrid(data, fit, {}, { predict: predictMean })).toThrow(/at least one setting/);
    expect(() => intRange(3, 1)).toThrow(/low <= high/);
    expect(() => logRange(0, 1)).toThrow(/0 < low/);
  });
});

describe('searchRandom(data, fit, space, options)', () => {
  it('draws within ranges, deterministic under a seed; log draws spread over magnitudes', () => {
    const space = { rate: logRange(0.001, 10), n: intRange(1, 3), kind: ['a', 'b'] };
    const go = (seed: number) => searchRandom(data, (t) => fitMean(t), space, { draws: 40, seed, split, predict: predictMean });
    const r = go(7);
    expect(r.summary).toHaveLength(40);
    for (const s of r.summary) {
      expect(s.rate as number).toBeGreaterThanOrEqual(0.001);
      expect(s.rate as number).toBeLessThanOrEqual(10);
      expect([1, 2, 3]).toContain(s.n);
      expect(['a', 'b']).toContain(s.kind);
    }
    // log-uniform over 4 decades: about a quarter of draws below 0.01 (40 draws, loose bounds)
    const small = r.summary.filter((s) => (s.rate as number) < 0.01).length;
    expect(small).toBeGreaterThan(2);
    expect(small).toBeLessThan(20);
    expect(go(7).summary.map((s) => s.rate)).toEqual(r.summary.map((s) => s.rate));
    expect(go(8).summary.map((s) => s.rate)).not.toEqual(r.summary.map((s) => s.rate));
  });
  it('rejects a bad draw count', () => {
    expect(() => searchRandom(data, (t) => fitMean(t), { a: [1] }, { draws: 0, predict: predictMean })).toThrow(/draws/);
  });
});
