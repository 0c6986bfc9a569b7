/**
 * dependenceOn / dependenceOnPair. Known truth: Friedman #1 (Friedman, J. (1991) "Multivariate adaptive
 * regression splines", Annals of Statistics 19(1):1–67), y = 10 sin(π x1 x2) + 20 (x3 − 0.5)² + 10 x4 +
 * 5 x5 + ε. Because y is additive in x3 and in x4, the partial dependence (Friedman 2001, §8.2) of a good
 * model on x4 is 10·x4 + const and on x3 is 20 (x3 − 0.5)² + const. Bounds asked for by the task:
 * slope within 10 ± 1.5 with R² > 0.95 for x4; correlation > 0.95 for x3.
 */
import { describe, expect, it } from 'vitest';
import { dependenceOn } from '../../src/explain/dependence.js';
import { dependenceOnPair } from '../../src/explain/dependence-pair.js';
import { fitBoosting } from '../../src/learn/ensemble/boosting.js';
import { fitTree } from '../../src/learn/tree/fit-tree.js';
import { predictFrame } from '../../src/learn/predict.js';
import { friedman1, orchard, VARIETIES } from './fixtures.js';

function lineFit(x: number[], y: number[]): { slope: number; r2: number; r: number } {
  const n = x.length;
  const mx = x.reduce((a, b) => a + b, 0) / n, my = y.reduce((a, b) => a + b, 0) / n;
  let sxy = 0, sxx = 0, syy = 0;
  for (let i = 0; i < n; i++) { sxy += (x[i] - mx) * (y[i] - my); sxx += (x[i] - mx) ** 2; syy += (y[i] - my) ** 2; }
  const r = sxy / Math.sqrt(sxx * syy);
  return { slope: sxy / sxx, r2: r * r, r };
}

describe('dependenceOn(model, frame, feature) on Friedman #1 (n = 2,000, seeded)', () => {
  const data = friedman1(2000, 2024);
  const model = fitBoosting(data, { rounds: 300, learningRate: 0.1, depthLimit: 3, seed: 1 });

  it('x4: close to a line of slope 10 (slope within ±1.5, R² > 0.95)', () => {
    const pd = dependenceOn(model, data.features, 'x4', { curveRows: 0 });
    const fit = lineFit(pd.points.map((p) => p.value as number), pd.points.map((p) => p.average));
    console.log(`PD x4: slope ${fit.slope.toFixed(3)}, R² ${fit.r2.toFixed(4)}`);
    expect(pd.points.length).toBe(20);
    expect(Math.abs(fit.slope - 10)).toBeLessThan(1.5);
    expect(fit.r2).toBeGreaterThan(0.95);
  });

  it('x3: close to 20 (x3 − 0.5)² up to a constant (correlation > 0.95)', () => {
    const pd = dependenceOn(model, data.features, 'x3', { curveRows: 0 });
    const truth = pd.points.map((p) => 20 * ((p.value as number) - 0.5) ** 2);
    const fit = lineFit(truth, pd.points.map((p) => p.average));
    console.log(`PD x3: correlation with 20(x3-0.5)^2 ${fit.r.toFixed(4)}`);
    expect(fit.r).toBeGreaterThan(0.95);
  });

  it('x7 (irrelevant): nearly flat, range under 1, the noise sd (bound: common practice)', () => {
    const pd = dependenceOn(model, data.features, 'x7', { curveRows: 0 });
    const avg = pd.points.map((p) => p.average);
    expect(Math.max(...avg) - Math.min(...avg)).toBeLessThan(1);
  });
});

describe('dependenceOn(model, frame, feature): definition and shapes', () => {
  const data = orchard(200, 8, 'class');
  const model = fitTree(data, { depthLimit: 4 });

  it('the average is the mean of the ICE curves when every row is kept (Goldstein et al. 2015, eq. 1 vs Friedman 2001 eq. 40)', () => {
    const pd = dependenceOn(model, data.features, 'storage_hours', { curveRows: 1000, gridSize: 7, output: 'spoiled' });
    expect(pd.points.length).toBe(7);
    expect(pd.curves.length).toBe(7 * 200);
    for (const p of pd.points) {
      const at = pd.curves.filter((c) => c.value === p.value).map((c) => c.prediction);
      expect(p.average).toBeCloseTo(at.reduce((a, b) => a + b, 0) / at.length, 12);
    }
    expect(pd.output).toBe('P(condition = spoiled)');
  });

  it('an ICE value is the prediction of that row with the feature set to the grid value', () => {
    const pd = dependenceOn(model, data.features, 'variety', { curveRows: 5, seed: 3 });
    expect(pd.kind).toBe('categorical');
    expect(pd.points.map((p) => p.value)).toEqual(VARIETIES);
    const c = pd.curves[7];
    const f = data.features;
    const codes = Int32Array.from((f.columns[1] as { codes: Int32Array }).codes);
    codes[c.row] = VARIETIES.indexOf(c.value as string);
    const edited = { ...f, columns: f.columns.map((col, j) => (j === 1 ? { ...col, codes } : col)) } as typeof f;
    const p = predictFrame(model, edited);
    expect(c.prediction).toBe(p.proba[c.row * 3 + 0]); // default class for 3 classes: the first
  });

  it('numeric grid: every distinct value when there are few; explicit grid honoured', () => {
    const pd = dependenceOn(model, data.features, 'bruised', { curveRows: 0 });
    expect(pd.points.map((p) => p.value)).toEqual([0, 1]);
    const pd2 = dependenceOn(model, data.features, 'storage_hours', { grid: [10, 20], curveRows: 0 });
    expect(pd2.points.map((p) => p.value)).toEqual([10, 20]);
  });

  it('bad input: unknown feature, unknown class, all-missing column, empty frame', () => {
    expect(() => dependenceOn(model, data.features, 'colour')).toThrow(/Unknown column "colour"/);
    expect(() => dependenceOn(model, data.features, 'bruised', { output: 'rotten' })).toThrow(/output/);
    const f = data.features;
    const blank = { ...f, columns: f.columns.map((c, j) => (j === 3 ? { ...c, values: new Float64Array(f.nRows).fill(NaN) } : c)) } as typeof f;
    expect(() => dependenceOn(model, blank, 'humidity')).toThrow(/no values to build a grid/);
    const empty = { ...f, nRows: 0, columns: f.columns.map((c) => (c.kind === 'categorical' ? { ...c, codes: new Int32Array(0) } : { ...c, values: new Float64Array(0) })) } as typeof f;
    expect(() => dependenceOn(model, empty, 'humidity')).toThrow(/empty/);
  });
});

describe('dependenceOnPair(model, frame, x, y)', () => {
  it('gives grid × grid cells, and on an additive model x-differences do not depend on y', () => {
    const data = friedman1(400, 5);
    const model = fitBoosting(data, { rounds: 60, depthLimit: 1, seed: 2 }); // stumps: additive in the features
    const pd = dependenceOnPair(model, data.features, 'x4', 'x3', { gridSize: 4 });
    expect(pd.cells.length).toBe(16);
    const at = (a: number, b: number): number => pd.cells[b * 4 + a].average;
    for (let b = 1; b < 4; b++) expect(at(3, b) - at(0, b)).toBeCloseTo(at(3, 0) - at(0, 0), 9);
  });

  it('rejects the same feature twice', () => {
    const data = friedman1(50, 5);
    const model = fitTree(data, { depthLimit: 2 });
    expect(() => dependenceOnPair(model, data.features, 'x1', 'x1')).toThrow(/two different features/);
  });
});
