import { describe, expect, it } from 'vitest';
import { fitAdaBoost } from '../../../src/learn/ensemble/adaboost.js';
import { predictAdaBoost } from '../../../src/learn/ensemble/predict-adaboost.js';
import { takeDataset } from '../../../src/table/dataset.js';
import type { RoundInfo } from '../../../src/learn/ensemble/progress.js';
import { classTarget, datasetOf, foldsOf, frameOf, numberTarget, penguins } from './fixtures.js';

describe('fitAdaBoost(data, options)', () => {
  it('two classes follow ESL Algorithm 10.1 on a hand example (stumps, Gini)', () => {
    // x = 1..5, y = a a b b a; w_i = 1/5.
    // Round 1: the Gini-best stump is x <= 2.5 (a | b): it misses row 5 → err = 0.2, α = log 4 = 1.386294;
    //          w ← [1, 1, 1, 1, 4]/8 = [0.125, 0.125, 0.125, 0.125, 0.5].
    // Round 2: weighted Gini: x <= 4.5 scores 0.25 (x <= 2.5: 0.333, x <= 3.5: 0.367, x <= 1.5: 0.357);
    //          left leaf a/b tie → a (lowest code), right a: misses rows 3, 4 → err = 0.25, α = log 3 = 1.098612.
    // Vote after two rounds: row 5 gets b (log 4) over a (log 3) → training error 1/5.
    const data = datasetOf(frameOf({ x: [1, 2, 3, 4, 5] }), classTarget('y', ['a', 'a', 'b', 'b', 'a']));
    const m = fitAdaBoost(data, { rounds: 2 });
    expect(m.rounds[0].weightedError).toBeCloseTo(0.2, 12);
    expect(m.rounds[0].stepWeight).toBeCloseTo(1.386294, 6);
    expect(m.trees[0].threshold[0]).toBeCloseTo(2.5, 12);
    expect(m.rounds[1].weightedError).toBeCloseTo(0.25, 12);
    expect(m.rounds[1].stepWeight).toBeCloseTo(1.098612, 6);
    expect(m.trees[1].threshold[0]).toBeCloseTo(4.5, 12);
    expect(m.rounds[1].trainError).toBeCloseTo(0.2, 12);
    expect(Array.from(predictAdaBoost(m, data.features).value)).toEqual([0, 0, 1, 1, 1]);
  });

  it('K classes use the SAMME weight α = log((1 − err)/err) + log(K − 1) (Zhu et al. 2009)', () => {
    const labels = ['a', 'a', 'b', 'b', 'c', 'c', 'a', 'b', 'c'];
    const data = datasetOf(frameOf({ x: [1, 2, 3, 4, 5, 6, 7, 8, 9] }), classTarget('y', labels));
    const m = fitAdaBoost(data, { rounds: 5 });
    for (const r of m.rounds) expect(r.stepWeight).toBeCloseTo(Math.log((1 - r.weightedError) / r.weightedError) + Math.log(2), 12);
    expect(m.rounds.length).toBeGreaterThan(1);
  });

  it('Penguins (vega-datasets; Gorman et al. 2014): SAMME with depth-2 trees, 5-fold CV accuracy >= 0.95', () => {
    const data = penguins();
    if (data.target.kind !== 'class') throw new Error('class target expected');
    const codes = data.target.codes, n = data.features.nRows;
    let right = 0;
    for (const test of foldsOf(n, 5, 3)) {
      const inTest = new Set(test);
      const train = takeDataset(data, Array.from({ length: n }, (_, i) => i).filter((i) => !inTest.has(i)));
      const pred = predictAdaBoost(fitAdaBoost(train, { rounds: 60, depthLimit: 2 }), takeDataset(data, test).features);
      test.forEach((row, j) => { if (pred.value[j] === codes[row]) right++; });
    }
    console.info(`[adaboost] penguins 5-fold accuracy = ${(right / n).toFixed(4)}`);
    expect(right / n).toBeGreaterThanOrEqual(0.95);
  });

  it('keeps training and watched-set error per round; resampling is seeded', () => {
    const data = penguins();
    const n = data.features.nRows;
    const idx = Array.from({ length: n }, (_, i) => i);
    const train = takeDataset(data, idx.filter((i) => i % 3 !== 0)), hold = takeDataset(data, idx.filter((i) => i % 3 === 0));
    const m = fitAdaBoost(train, { rounds: 20, watch: hold, sampling: 'resample', seed: 5 });
    expect(m.rounds.every((r) => Number.isFinite(r.trainError) && Number.isFinite(r.watchError))).toBe(true);
    expect(JSON.stringify(fitAdaBoost(train, { rounds: 20, sampling: 'resample', seed: 5 }).stepWeights))
      .toBe(JSON.stringify(m.stepWeights));
  });
});

describe('degenerate inputs: fitAdaBoost', () => {
  it('empty → error; number target → error; one label → error', () => {
    expect(() => fitAdaBoost(datasetOf(frameOf({ x: [] as number[] }), classTarget('y', [], ['a', 'b'])))).toThrow(/No rows/);
    expect(() => fitAdaBoost(datasetOf(frameOf({ x: [1] }), numberTarget('y', [1])))).toThrow(/class target/);
    expect(() => fitAdaBoost(datasetOf(frameOf({ x: [1] }), classTarget('y', ['a'])))).toThrow(/one class/);
  });
  it('one row / one class present: a perfect first round ends the fit (err = 0, α finite)', () => {
    const m = fitAdaBoost(datasetOf(frameOf({ x: [1] }), classTarget('y', ['b'], ['a', 'b'])));
    expect(m.stopReason).toBe('perfect');
    expect(m.trees.length).toBe(1);
    expect(Number.isFinite(m.stepWeights[0])).toBe(true);
    expect(Array.from(predictAdaBoost(m, frameOf({ x: [5] })).value)).toEqual([1]);
  });
  it('a feature with no signal: the first stump is no better than guessing → no rounds, prior prediction', () => {
    const f = frameOf({ z: [null, null, null, null] });
    const m = fitAdaBoost(datasetOf(f, classTarget('y', ['a', 'b', 'a', 'b'])));
    expect(m.stopReason).toBe('guessing');
    expect(m.trees.length).toBe(0);
    expect(Array.from(predictAdaBoost(m, f).proba)).toEqual([0.5, 0.5, 0.5, 0.5, 0.5, 0.5, 0.5, 0.5]);
  });
  it('NaN feature values and missing targets: rows with a missing target are dropped', () => {
    const f = frameOf({ x: [1, NaN, 3, 4, 5, 6] });
    const m = fitAdaBoost(datasetOf(f, classTarget('y', ['a', 'a', null, 'b', 'b', 'b'])), { rounds: 3 });
    expect(predictAdaBoost(m, f).value.every((v) => v === 0 || v === 1)).toBe(true);
  });
});

describe('fitAdaBoost(data, { onRound })', () => {
  it('reports each kept round with its training and watched error and the best round so far; the model is unchanged', () => {
    const data = penguins();
    const n = data.features.nRows;
    const idx = Array.from({ length: n }, (_, i) => i);
    const train = takeDataset(data, idx.filter((i) => i % 3 !== 0)), hold = takeDataset(data, idx.filter((i) => i % 3 === 0));
    const o = { rounds: 15, watch: hold, sampling: 'resample' as const, seed: 5, depthLimit: 2 };
    const seen: RoundInfo[] = [];
    const m = fitAdaBoost(train, { ...o, onRound: (info) => seen.push(info) });
    expect(JSON.stringify(m)).toBe(JSON.stringify(fitAdaBoost(train, o)));
    expect(seen.length).toBe(m.rounds.length);
    seen.forEach((info, j) => {
      const upTo = m.rounds.slice(0, j + 1).map((r) => r.watchError);
      expect([info.round, info.total, info.trainLoss, info.watchLoss]).toEqual([j + 1, 15, m.rounds[j].trainError, m.rounds[j].watchError]);
      expect(info.bestRound).toBe(upTo.indexOf(Math.min(...upTo)) + 1);
      expect(info.last).toBe(j === seen.length - 1);
    });
  });
  it('a perfect first round is the last report; a discarded round repeats the one before with last set; none when no round is kept', () => {
    const seen: RoundInfo[] = [];
    fitAdaBoost(datasetOf(frameOf({ x: [1] }), classTarget('y', ['b'], ['a', 'b'])), { onRound: (i) => seen.push(i) });
    expect(seen.map((i) => [i.round, i.last, Number.isNaN(i.watchLoss)])).toEqual([[1, true, true]]);
    // x = 1 1 1 2 2 2, y = a b b a b a. Round 1: the stump votes b | a and misses rows 1 and 5 → err = 1/3,
    // α = log 2, w ∝ 2 1 1 1 2 1. Round 2: each side weighs a and b equally (2 : 2), both leaves say a
    // (ties: lowest code) → err = 1/2: no better than guessing, discarded; the last report repeats round 1.
    const again: RoundInfo[] = [];
    const m = fitAdaBoost(datasetOf(frameOf({ x: [1, 1, 1, 2, 2, 2] }), classTarget('y', ['a', 'b', 'b', 'a', 'b', 'a'])), { rounds: 10, onRound: (i) => again.push(i) });
    expect(m.stopReason).toBe('guessing');
    expect(again.map((i) => [i.round, i.trainLoss, i.last])).toEqual([[1, expect.closeTo(1 / 3, 12), false], [1, expect.closeTo(1 / 3, 12), true]]);
    const none: RoundInfo[] = [];
    fitAdaBoost(datasetOf(frameOf({ z: [null, null, null, null] }), classTarget('y', ['a', 'b', 'a', 'b'])), { onRound: (i) => none.push(i) });
    expect(none).toEqual([]);
  });
});
